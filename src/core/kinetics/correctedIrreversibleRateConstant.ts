/**
 * k° and E°′ of a slow diffusing couple (n·ΔEp beyond Nicholson's table) from both peak
 * potentials, with each peak's departure from the totally irreversible peak equation computed by
 * simulation, so that k° rests on the forward peak and E°′ on the return peak.
 * In: epaV, epcV (V), the forward (first-sweep) direction, the switching potential (V, or null),
 *   scanRateVPerS, D_O and D_R (cm²/s); options alpha = αc (cathodic transfer coefficient),
 *   transferElectronCount nₐ, temperatureK. Out: k° (cm/s), E°′ (V), the departures (V) and the
 *   bare two-peak k° for comparison.
 * Source of the peak equation: J. Wang, Analytical Electrochemistry 2nd ed. (2000) eq. 2-5; Bard &
 *   Faulkner 2nd ed. (2001) §6.3 (irreversibleRateConstant.ts). It describes one sweep into a
 *   uniform solution in the totally irreversible limit. The return peak starts from the profile
 *   the forward sweep left, so the bare two-peak solution gives k° 2–12 % high (measured here with
 *   the simulator: +6 % at αc = 0.5, +12 % for an oxidation first with αc = 0.3); near 212 mV the
 *   back reaction still moves both peaks.
 * Method (ours, in the spirit of Nicholson's simulated working curves): start from the two-peak
 *   solution; simulate the file's sweep with that k°, E°′, α and window (src/core/simulation,
 *   validated against 0.4958 and Nicholson's ΔEp table); the simulated peaks minus eq. 2-5 at the
 *   same k° and E°′ are the departures; take them off the measured peaks and solve again, until
 *   ln k° moves by less than 0.001. The forward departure is ~0 for a totally irreversible wave, so
 *   k° is then the forward peak's eq. 2-5 value at that E°′ (forwardPeakRateConstant.ts).
 *   An nₐ-electron step is simulated with n = 1 on a potential axis (and scan rate) stretched by
 *   nₐ, which is the same dimensionless problem.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K } from '../constants';
import { formatScanRate } from '../units';
import type { PeakDirection } from '../peaks/peakTypes';
import { simulateCv } from '../simulation';
import { oneCyclePeaks } from '../simulation/simulatedPeaks';
import { irreversiblePeakPotentials, solveIrreversiblePeaks, type IrreversibleRateConstantInput } from './irreversibleRateConstant';

export interface CorrectedIrreversibleInput extends IrreversibleRateConstantInput {
  forwardDirection: PeakDirection;
  /** Switching potential of the sweep (V); 0.3/nₐ V past the forward peak when null. */
  switchPotentialV: number | null;
}

export interface CorrectedIrreversibleOptions {
  /** αc, the cathodic transfer coefficient, in [0.05, 0.95]. @default 0.5 */
  alpha?: number;
  /** Electrons in the rate-determining step nₐ. @default 1 */
  transferElectronCount?: number;
  /** @default 298.15 */
  temperatureK?: number;
}

export interface CorrectedIrreversibleResult {
  k0CmPerS: number;
  formalPotentialV: number;
  /** Simulated peak minus eq. 2-5, at the final k° and E°′ (V). */
  departureV: { anodic: number; cathodic: number };
  /** k° of the bare two-peak solution of eq. 2-5. */
  twoPeakK0CmPerS: number;
  iterations: number;
}

type Estimate = { k0CmPerS: number; formalPotentialV: number };

/** Simulated Epa and Epc (V) of the file's sweep for a couple with this k° and E°′. */
function simulatedPeaks(input: CorrectedIrreversibleInput, est: Estimate, alpha: number, na: number, temperatureK: number): { epaV: number; epcV: number } {
  const e0 = est.formalPotentialV;
  const stretch = (e: number) => na * (e - e0);
  const cathodic = input.forwardDirection === 'cathodic';
  const forwardPeak = cathodic ? input.epcV : input.epaV;
  const startV = cathodic ? Math.max(stretch(input.epaV), stretch(input.epcV)) + 0.25 : Math.min(stretch(input.epaV), stretch(input.epcV)) - 0.25;
  const switchV = input.switchPotentialV !== null ? stretch(input.switchPotentialV) : stretch(forwardPeak) + (cathodic ? -0.3 : 0.3);
  const r = simulateCv({
    mechanism: 'E', k0CmPerS: est.k0CmPerS, alpha, electronCount: 1, temperatureK, formalPotentialV: 0,
    diffusionOCm2PerS: input.diffusionOxCm2PerS, diffusionRCm2PerS: input.diffusionRedCm2PerS ?? input.diffusionOxCm2PerS,
    concentrationOMolPerCm3: cathodic ? 1e-6 : 0, concentrationRMolPerCm3: cathodic ? 0 : 1e-6,
    scanRateVPerS: na * input.scanRateVPerS, startV, switchV, stepV: 0.001, cycles: 1,
  });
  const p = oneCyclePeaks(r, input.forwardDirection);
  const back = (eSim: number) => e0 + eSim / na;
  return cathodic ? { epcV: back(p.forward.potentialV), epaV: back(p.reverse.potentialV) } : { epaV: back(p.forward.potentialV), epcV: back(p.reverse.potentialV) };
}

export function correctedIrreversibleRateConstant(input: CorrectedIrreversibleInput, options: CorrectedIrreversibleOptions = {}): CorrectedIrreversibleResult {
  const alpha = options.alpha ?? 0.5;
  const na = options.transferElectronCount ?? 1;
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('alpha (αc)', alpha, 0.05, 0.95);
  assertFiniteInRange('transferElectronCount', na, 0.5, 10);
  if (input.switchPotentialV !== null) assertFiniteInRange('switchPotentialV', input.switchPotentialV);
  const eqOptions = { alpha, transferElectronCount: na, temperatureK };
  const first = solveIrreversiblePeaks(input, eqOptions);
  let est: Estimate = first;
  for (let iteration = 1; iteration <= 8; iteration++) {
    const sim = simulatedPeaks(input, est, alpha, na, temperatureK);
    const eq = irreversiblePeakPotentials({ ...input, ...est }, eqOptions);
    const departureV = { anodic: sim.epaV - eq.epaV, cathodic: sim.epcV - eq.epcV };
    const next = solveIrreversiblePeaks({ ...input, epaV: input.epaV - departureV.anodic, epcV: input.epcV - departureV.cathodic }, eqOptions);
    const moved = Math.abs(Math.log(next.k0CmPerS / est.k0CmPerS));
    est = next;
    if (moved < 1e-3) return { ...est, departureV, twoPeakK0CmPerS: first.k0CmPerS, iterations: iteration };
  }
  throw new AnalysisError('NOT_CONVERGED', `the simulated peak departures did not settle for Epa = ${input.epaV.toFixed(4)} V, Epc = ${input.epcV.toFixed(4)} V at ${formatScanRate(input.scanRateVPerS)}`);
}
