/**
 * Vocabulary of redox couples: the couple's metrics (Epa, Epc, E½, ΔEp, ipa, ipc, ratio) and the
 * verdict on it with the numbers behind it. Potentials in V, currents as positive magnitudes (A),
 * charges in C.
 */
import type { PeakDirection } from '../peaks/peakTypes';

/** How fast electron transfer is against the scan: the words the verdict and the series share. */
export type ElectronTransferReading = 'reversible' | 'quasi-reversible' | 'irreversible';

/** Category ids of a couple's verdict (stable strings of the JSON contract and the screen). */
export type VerdictCategory = ElectronTransferReading | 'chemically-coupled' | 'adsorbed' | 'inconclusive';

/** The numbers a verdict was based on (V unless named otherwise). */
export interface VerdictEvidence {
  temperatureK: number;
  electronCount: number;
  deltaEpV: number | null;
  /** 2.218·RT/nF, the large-switching-offset reversible limit. */
  reversibleDeltaEpLimitV: number;
  /** Reversible ΔEp expected for the actual switching offset (Nicholson 1965 table). */
  reversibleDeltaEpAtSwitchV: number | null;
  /** 2.20·RT/nF, reversible |Ep − Ep/2|. */
  reversibleHalfPeakWidthV: number;
  halfPeakWidthsV: { anodic: number | null; cathodic: number | null };
  ratio: number | null;
  /** FWHM of the peaks and the ideal adsorbed value 3.5255·RT/nF. */
  fwhmV: { anodic: number | null; cathodic: number | null };
  adsorbedFwhmV: number;
}

export interface Verdict {
  category: VerdictCategory;
  /** Plain-words label, e.g. "reversible (diffusion, fast electron transfer)". */
  label: string;
  /** Each reason states a measured number against its expectation. */
  reasons: string[];
  evidence: VerdictEvidence;
}

/** Scan-rate evidence from a series, for `refineVerdictWithSeries`. All optional. */
export interface SeriesEvidence {
  /** Slope of log10|ip| vs log10 v (0.5 diffusion, 1 surface). */
  logLogSlope?: number;
  /** dEp/d log10 v of the anodic / cathodic peak (V per decade). */
  epaShiftVPerDecade?: number;
  epcShiftVPerDecade?: number;
  /** R² of ip vs v^½ and of ip vs v. */
  sqrtScanRateR2?: number;
  scanRateR2?: number;
  /** Number of voltammograms in the series. */
  count?: number;
}

export interface CoupleResult {
  /** 0-based position within the cycle, in order of E½ (or of the lone peak's Ep). */
  index: number;
  epaV: number | null;
  epcV: number | null;
  /** (Epa + Epc)/2. */
  eHalfV: number | null;
  /** Epa − Epc. */
  deltaEpV: number | null;
  /** Baseline-corrected peak currents, positive magnitudes (A). */
  ipaA: number | null;
  ipcA: number | null;
  /** Return / forward peak current (ipc/ipa when the first sweep is positive-going). */
  ratio: number | null;
  /** Nicholson (1966) empirical return/forward ratio from the current at the switch. */
  nicholsonRatio: number | null;
  /**
   * Potential of the switch between the couple's forward and return sweeps (V), when its peaks lie
   * on consecutive sweeps. Added later, hence optional; always set by analyzeVoltammogram.
   */
  switchPotentialV?: number | null;
  /** Direction of the forward (first-sweep) peak. */
  forwardDirection: PeakDirection;
  /** Indices into the cycle's `peaks`. */
  anodicPeak: number | null;
  cathodicPeak: number | null;
  /** |Ep − Ep/2| of each peak (V). */
  anodicHalfPeakWidthV: number | null;
  cathodicHalfPeakWidthV: number | null;
  /** Charges under each corrected peak, positive magnitudes (C). */
  anodicChargeC: number | null;
  cathodicChargeC: number | null;
  verdict: Verdict;
}

