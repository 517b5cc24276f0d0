/**
 * Parameters for the theory overlay of one file: a simulated voltammogram (our own simulator)
 * with the values the analysis fitted — E°′ from this file's E½, D, k° (Nicholson) or k_s and Γ
 * (Laviron) and α from the file's scan-rate series — and the cell values n, A, C, T of that series. The same
 * potential window, start, vertex and scan rate as the measured first cycle. When a needed value
 * was not determined, the overlay is refused with the reason rather than drawn from a guess.
 */
import type { SeriesCouple } from '../core/analysis/seriesTypes';
import type { CvSimulationInput } from '../core/simulation/simulationTypes';
import { displayScale } from './display';
import { cellOfFile } from '../run/seriesCell';
import { celsiusToKelvin, formatFixed, millimolarToMolPerCm3 } from '../core/units';
import type { HalfwaveState } from './types';

export type TheoryPlan = { ok: true; params: Partial<CvSimulationInput>; description: string } | { ok: false; reason: string };

function seriesCoupleOf(state: HalfwaveState, fileId: string): { couple: SeriesCouple; eHalfV: number } | null {
  const file = state.files[fileId];
  const entry = file ? state.series[file.group] : undefined;
  for (const couple of entry?.result?.analysis.couples ?? []) {
    const point = couple.points.find((p) => p.fileName === file?.fileName);
    const eHalfV = point?.eHalfV ?? couple.eHalfV;
    if (point && eHalfV !== null) return { couple, eHalfV };
  }
  return null;
}

function sweepOf(potentialV: Float64Array, start: number, end: number, firstDirection: 'positive' | 'negative') {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = start; i < end; i++) {
    const v = potentialV[i] as number;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return { startV: potentialV[start] as number, switchV: firstDirection === 'negative' ? lo : hi };
}

export function planTheory(state: HalfwaveState, fileId: string): TheoryPlan {
  const m = state.files[fileId]?.measurement;
  const run = state.results[fileId]?.run;
  // The overlay is simulated on the recording scale (the plot shifts it like the data): the
  // analysed potential (iR-corrected, on the display scale) is taken back by the file's offset.
  const offsetV = run?.reference.offsetV ?? 0;
  const potentialV = run?.analysedPotentialV ? run.analysedPotentialV.map((e) => e - offsetV) : m?.potentialV;
  const cycle = m?.cycles[0];
  const first = m?.segments[0];
  if (!m || !potentialV || !cycle || !first) return { ok: false, reason: 'the file is not read yet' };
  if (!m.scanRateVPerS) return { ok: false, reason: 'the file has no scan rate' };
  const found = seriesCoupleOf(state, fileId);
  if (!found) return { ok: false, reason: 'no couple of this file was followed through its scan-rate series' };
  const { couple, eHalfV: eHalfShownV } = found;
  const eHalfV = eHalfShownV - offsetV;
  const c = cellOfFile(state, fileId);
  const { startV, switchV } = sweepOf(potentialV, cycle.start, cycle.end, first.direction);
  const alpha = couple.alpha ?? c.alpha ?? couple.diffusion?.alphaUsed ?? 0.5;
  const scale = displayScale(state.settings, c);
  const e0Text = `E°′ ${formatFixed(eHalfShownV, 4)} V vs ${scale.name}`;
  const common: Partial<CvSimulationInput> = {
    formalPotentialV: eHalfV, alpha, electronCount: c.electronCount, areaCm2: c.areaCm2, temperatureK: celsiusToKelvin(c.temperatureC),
    scanRateVPerS: m.scanRateVPerS, startV, switchV, cycles: 1, stepV: Math.min(0.001, Math.abs(switchV - startV) / 200),
    doubleLayerFPerCm2: 0, uncompensatedOhm: 0,
  };
  if (couple.regime === 'surface') {
    const gamma = couple.surface?.coverageFromChargeMolPerCm2 ?? couple.surface?.coverageFromSlopeMolPerCm2 ?? null;
    if (gamma === null) return { ok: false, reason: 'the surface coverage Γ was not determined' };
    const ks = couple.surface?.ksPerS ?? Infinity;
    return {
      ok: true,
      params: { ...common, mechanism: 'surface', coverageMolPerCm2: gamma, surfaceRatePerS: ks },
      description: `adsorbed couple: ${e0Text}, Γ ${gamma.toExponential(2)} mol/cm², k_s ${Number.isFinite(ks) ? `${ks.toPrecision(3)} s⁻¹` : 'fast (Nernstian)'}, α ${alpha.toFixed(2)}`,
    };
  }
  const d = couple.diffusion?.diffusionCm2PerS ?? couple.rateConstant?.diffusionOxCm2PerS ?? null;
  if (d === null) return { ok: false, reason: 'D was not determined (enter area and concentration)' };
  const k0 = couple.kineticClass === 'reversible' ? Infinity : couple.rateConstant?.k0CmPerS ?? couple.rateConstant?.lowerBoundCmPerS ?? null;
  if (k0 === null) return { ok: false, reason: 'k° was not determined for this couple' };
  const conc = millimolarToMolPerCm3(c.concentrationMM);
  // The species present in the bulk is the one the first sweep converts.
  const oxidisedInBulk = first.direction === 'negative';
  return {
    ok: true,
    params: {
      ...common, mechanism: 'E', k0CmPerS: k0, diffusionOCm2PerS: d, diffusionRCm2PerS: d,
      concentrationOMolPerCm3: oxidisedInBulk ? conc : 0, concentrationRMolPerCm3: oxidisedInBulk ? 0 : conc,
    },
    description: `E mechanism: ${e0Text}, D ${d.toExponential(2)} cm²/s, k° ${Number.isFinite(k0) ? `${k0.toExponential(2)} cm/s` : 'fast (Nernstian)'}, α ${alpha.toFixed(2)}, ${c.concentrationMM} mM`,
  };
}
