/**
 * Speed and accuracy of the CV simulator, measured in one run so that the ratios compare like
 * with like. Target from the issue: one 2,000-point voltammogram at the validated accuracy in
 * well under 50 ms.
 */
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../src/core/constants';
import { simulateCv, type CvSimulationInput, type SimulateCvOptions } from '../src/core/simulation';
import { medianMs } from './timing';
import type { BenchRow } from './types';

const TARGET_MS = 50;
/** ±0.5 V around E°′ in 1 mV steps: 2,001 points. */
const WINDOW = { startV: 0.5, switchV: -0.5, stepV: 0.001 };

const CASES: { name: string; input: Partial<CvSimulationInput> }[] = [
  { name: 'E reversible', input: { ...WINDOW, k0CmPerS: Infinity } },
  { name: 'E quasi-reversible + Ru 100 Ω + Cdl 20 µF/cm²', input: { ...WINDOW, k0CmPerS: 0.005, uncompensatedOhm: 100, doubleLayerFPerCm2: 20e-6 } },
  { name: 'EC, kf = 10 /s', input: { ...WINDOW, mechanism: 'EC', k0CmPerS: Infinity, followUpRatePerS: 10 } },
  { name: 'surface, ks = 100 /s', input: { ...WINDOW, mechanism: 'surface', surfaceRatePerS: 100 } },
];

function cathodicPeakA(input: Partial<CvSimulationInput>, options: SimulateCvOptions = {}): number {
  const r = simulateCv(input, options);
  let min = 0;
  for (let i = 0; i < (r.currentA.length + 1) / 2; i++) min = Math.min(min, r.currentA[i] as number);
  return -min;
}

function accuracyRows(): BenchRow[] {
  const f = inverseThermalVoltagePerV(298.15);
  const scale = F * 0.0707 * 1e-6;
  // 0.446295: the exact Nernstian peak function (simulateCv.reversible.test.ts; Nicholson & Shain's 0.4463).
  const reversible = 0.446295 * scale * Math.sqrt(f * 0.1 * 1e-5);
  const irreversible = 0.4958 * scale * Math.sqrt(0.5 * f * 0.1 * 1e-5);
  const rev = cathodicPeakA({ ...WINDOW, k0CmPerS: Infinity });
  const irr = cathodicPeakA({ startV: 0.3, switchV: -1.0, k0CmPerS: 1e-6 });
  return [
    { name: 'accuracy: reversible ip vs 0.446295 (Nicholson–Shain 1964: 0.4463)', value: 100 * (rev / reversible - 1), unit: '%', note: 'default numerics, unrefined peak; test tolerance 0.005 %' },
    { name: 'accuracy: irreversible ip vs 0.4958 (B&F §6.3)', value: 100 * (irr / irreversible - 1), unit: '%', note: 'test tolerance 0.02 %' },
  ];
}

export async function runSimulationBench(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  for (const c of CASES) {
    const points = simulateCv(c.input).currentA.length;
    const ms = medianMs(() => simulateCv(c.input));
    rows.push({ name: `simulate ${c.name}: ${points} points`, value: ms, unit: 'ms', note: 'median of 15 after 3 warm-up runs', ...(c === CASES[0] ? { key: 'simulationMs' } : {}) });
    rows.push({ name: `  ratio to the ${TARGET_MS} ms target`, value: ms / TARGET_MS, unit: '×', note: '< 1 meets the target' });
    rows.push({ name: '  throughput', value: points / ms, unit: 'points/ms' });
  }
  const fine = { ...WINDOW, k0CmPerS: Infinity };
  const fineMs = medianMs(() => simulateCv(fine, { firstSpacingFraction: 0.002, gridExpansion: 1.02, substepsPerPoint: 4 }), 5, 1);
  const defaultMs = medianMs(() => simulateCv(fine), 15, 3);
  rows.push({ name: 'refined grid (h0 0.002, ratio 1.02, 4 steps/point) vs default', value: fineMs / defaultMs, unit: '×', note: `${fineMs.toFixed(1)} ms; both within 0.001 % of the reversible peak` });
  const fitMs = medianMs(() => { for (let k = 0; k < 100; k++) simulateCv({ ...fine, k0CmPerS: 0.001 * (k + 1) }); }, 3, 1);
  rows.push({ name: '100 simulations of 2,001 points (as inside a fit)', value: fitMs, unit: 'ms' });
  return [...rows, ...accuracyRows()];
}
