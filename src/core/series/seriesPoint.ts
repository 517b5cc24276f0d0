/**
 * One voltammogram's contribution to a couple followed across a scan-rate series, and the words
 * the series uses for its transport regime and electron-transfer reading. Potentials in V,
 * currents as positive magnitudes (A), charges in C, scan rate in V/s.
 */
import type { CoupleResult, ElectronTransferReading, VerdictCategory } from '../couples/coupleTypes';

/** One file's contribution to a series couple. */
export interface SeriesPoint extends Pick<CoupleResult, 'epaV' | 'epcV' | 'eHalfV' | 'deltaEpV' | 'ipaA' | 'ipcA' | 'anodicChargeC' | 'cathodicChargeC'> {
  fileIndex: number;
  fileName: string;
  scanRateVPerS: number;
  cycle: number;
  /** Height of the first-sweep peak (A). */
  forwardIpA: number | null;
  /** |Ep − Ep/2| of the forward peak (V). */
  forwardHalfPeakWidthV: number | null;
  /** Charge under the forward peak (C). */
  forwardChargeC: number | null;
  verdict: VerdictCategory;
  /** Nicholson (1966) ratio and the switch potential (V) of the file's couple; added later. */
  nicholsonRatio?: number | null;
  switchPotentialV?: number | null;
  /** Reversible ΔEp expected at this file's switching potential (V); added later. */
  reversibleDeltaEpV?: number | null;
  /** i(Epa) − i(Epc), the signed total currents at the two peaks (A): ohmic ΔEp = this × Ru; added later. */
  peakCurrentSpanA?: number | null;
}

/** Transport regime and kinetic class the series settles on for a couple. */
export type SeriesRegime = 'diffusion' | 'surface';
export type SeriesKineticClass = ElectronTransferReading | 'inconclusive';

