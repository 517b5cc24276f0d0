/**
 * The demo scenario: an invented lab, invented people and an in-house electrode; the "truth"
 * (simulator parameters) of every series. Potentials are on the Ag/AgCl (3 M KCl) scale.
 */
import type { CvSimulationInput } from '../../src/core/simulation';

export type Layout = 'commaHeader' | 'semicolonPreamble' | 'tabMilliBom' | 'spaceCycleNoHeader';

export interface DemoSeries {
  key: string;
  title: string;
  /** What the group wants to learn from this series. */
  question: string;
  layout: Layout;
  scanRatesVPerS: number[];
  /** Simulator input shared by all files of the series (scan rate added per file). */
  truth: Partial<CvSimulationInput>;
  /** Standard deviation of the added white noise, A. */
  noiseA: number;
  /** File name for one scan rate (index i is 1-based run number). */
  fileName: (scanRateVPerS: number, run: number) => string;
  /** Human-readable description of the solution and electrode, written into preambles. */
  sample: string;
  electrode: string;
}

const mVs = (v: number, width: number) => `${String(Math.round(v * 1000)).padStart(width, '0')}mVs`;

export const MASTER_SEED = 20261201;

export const SERIES: DemoSeries[] = [
  {
    key: 'probe',
    title: 'Outer-sphere probe on the new paste (scan-rate series)',
    question: 'Is the paste electrode well behaved? Randles–Ševčík slope → D (or the electroactive area), ΔEp close to the reversible value, ipa/ipc ≈ 1.',
    layout: 'commaHeader',
    scanRatesVPerS: [0.01, 0.025, 0.05, 0.1, 0.25, 0.5],
    truth: {
      mechanism: 'E', formalPotentialV: -0.165, k0CmPerS: 0.3, alpha: 0.5, electronCount: 1,
      diffusionOCm2PerS: 6.8e-6, diffusionRCm2PerS: 6.8e-6, concentrationOMolPerCm3: 1.0e-6, concentrationRMolPerCm3: 0,
      areaCm2: 0.0707, startV: 0.1, switchV: -0.45, cycles: 2, stepV: 0.001,
      doubleLayerFPerCm2: 20e-6, uncompensatedOhm: 120,
    },
    noiseA: 15e-9,
    fileName: (v) => `probe_RuHex_${mVs(v, 3)}.csv`,
    sample: '1.0 mM hexaammineruthenium(III) chloride in 0.1 M KCl, N2 purged',
    electrode: 'CPE-7 carbon paste, 3 mm disk (0.0707 cm2)',
  },
  {
    key: 'quasi',
    title: 'Ferrocenyl amide FcAm-2 (quasi-reversible, scan-rate series)',
    question: 'Standard rate constant k° of the new couple on the paste, by Nicholson’s ψ method over the series.',
    layout: 'semicolonPreamble',
    scanRatesVPerS: [0.05, 0.1, 0.2, 0.5, 1, 2],
    truth: {
      mechanism: 'E', formalPotentialV: 0.31, k0CmPerS: 8e-3, alpha: 0.48, electronCount: 1,
      diffusionOCm2PerS: 5.5e-6, diffusionRCm2PerS: 5.5e-6, concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 0.5e-6,
      areaCm2: 0.0707, startV: 0.0, switchV: 0.65, cycles: 2, stepV: 0.001,
      doubleLayerFPerCm2: 20e-6, uncompensatedOhm: 120,
    },
    noiseA: 10e-9,
    fileName: (_v, run) => `quasi_FcAmide_run${String(run).padStart(2, '0')}.txt`,
    sample: '0.5 mM FcAm-2 (in-house ferrocenyl amide) in 0.1 M phosphate buffer pH 7.0 + 0.1 M KCl',
    electrode: 'CPE-7 carbon paste, 3 mm disk (0.0707 cm2)',
  },
  {
    key: 'ec',
    title: 'Aminophenol AP-3 with a follow-up hydrolysis (EC)',
    question: 'Rate constant of the first-order reaction that consumes the oxidised form, from the return/forward peak ratio against scan rate.',
    layout: 'tabMilliBom',
    scanRatesVPerS: [0.02, 0.05, 0.1, 0.2, 0.5, 1],
    truth: {
      mechanism: 'EC', formalPotentialV: 0.12, k0CmPerS: 0.05, alpha: 0.5, electronCount: 2,
      diffusionOCm2PerS: 6.0e-6, diffusionRCm2PerS: 6.0e-6, concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 1.0e-6,
      areaCm2: 0.0707, startV: -0.15, switchV: 0.4, cycles: 1, stepV: 0.001,
      doubleLayerFPerCm2: 20e-6, uncompensatedOhm: 120, followUpRatePerS: 1.2,
    },
    noiseA: 20e-9,
    fileName: (v) => `ec_aminophenol_${mVs(v, 4)}.tsv`,
    sample: '1.0 mM AP-3 (in-house aminophenol) in 0.1 M phosphate buffer pH 7.0',
    electrode: 'CPE-7 carbon paste, 3 mm disk (0.0707 cm2)',
  },
  {
    key: 'film',
    title: 'Ferrocenyl-thiol monolayer on gold (adsorbed film, scan-rate series)',
    question: 'Surface coverage Γ from the charge, then k_s and α from the peak separation at fast scans (Laviron).',
    layout: 'spaceCycleNoHeader',
    scanRatesVPerS: [0.1, 0.2, 0.5, 1, 2, 5, 10, 20],
    truth: {
      mechanism: 'surface', formalPotentialV: 0.28, alpha: 0.5, electronCount: 1, coverageMolPerCm2: 6e-11, surfaceRatePerS: 25,
      areaCm2: 0.0314, startV: -0.05, switchV: 0.65, cycles: 2, stepV: 0.002,
      doubleLayerFPerCm2: 4e-6, uncompensatedOhm: 60,
    },
    noiseA: 2e-9,
    fileName: (v) => `film_FcSAM_${mVs(v, 5)}.dat`,
    sample: 'mixed monolayer of a ferrocenyl alkanethiol in a diluent thiol, in 0.1 M NaClO4',
    electrode: 'gold disk, 2 mm (0.0314 cm2)',
  },
];
