/**
 * `npx tsx bench/peakVertexScatter.ts [--seeds N] [--skew]`: the measurements behind the window of
 * Ep's parabola (src/core/peaks/peakVertex.ts). Seeded and deterministic; no timings.
 *
 * Default: bias and scatter of Ep and ΔEp from analyzeVoltammogram on this project's simulator,
 * against the published values, for
 *   (a) a Nernstian surface wave (Laviron, J. Electroanal. Chem. 101 (1979) 19: both peaks at E°′,
 *       ΔEp = 0; 1e-10 mol/cm², n = 1),
 *   (b) a reversible diffusion wave (Nicholson & Shain, Anal. Chem. 36 (1964) 706: Epc = E½ −
 *       1.109·RT/nF; ΔEp from Nicholson, Anal. Chem. 37 (1965) 1351, at the switch used),
 *   (c) a totally irreversible wave (Bard & Faulkner 2nd ed. §6.3, eq. 6.3.4: Epc = E°′ −
 *       (RT/αF)[0.780 + ln(D^½/k°) + ln(αFv/RT)^½]; k° = 1e-5 cm/s, α = 0.5),
 * at 1, 2 and 5 mV steps and 0.1 V/s, with seeded Gaussian noise of 0.5–3 % of the published ip.
 * Noise-free rows give the largest |bias| over four phases of the grid under the peak (E°′ moved by
 * 0, 0.23, 0.5 and 0.77 of a step); noisy rows the mean bias and the standard deviation over the
 * seeds (ΔEp of (b) against its own noise-free value).
 *
 * --skew: the residual pull of the skew correction. For each shape, the centroid drift S of the
 * forward peak (peakTopWindow) and how far the vertex moves when its window reaches a share w of
 * the prominence instead of the narrow window; K = move/(S·w²) is the factor peakVertex.ts uses.
 */
import { simulateCv, type CvSimulationInput } from '../src/core/simulation';
import { findSweepSegments } from '../src/core/sweeps/findSweepSegments';
import { seededGaussian } from '../src/core/random/seededGaussian';
import { analyzeVoltammogram } from '../src/core/analysis/analyzeVoltammogram';
import { FARADAY_C_PER_MOL as F, thermalVoltageV } from '../src/core/constants';
import { reversibleDeltaEpAtSwitch } from '../src/core/couples/reversibleDeltaEpAtSwitch';
import { prepareSweepSignals, ownStart, windowForSpan } from '../src/core/peaks/sweepSignals';
import { locatePeaksInSweep } from '../src/core/peaks/locatePeaksInSweep';
import { peakTopWindow, vertexInWindow } from '../src/core/peaks/peakVertex';
import type { Voltammogram } from '../src/core/types';

const u = thermalVoltageV(298.15);
const AREA = 0.0707;
const C = 1e-6;
const D = 1e-5;
const V = 0.1;
const K0_SLOW = 1e-5;
const ALPHA = 0.5;

interface Case {
  key: string;
  input: Partial<CvSimulationInput>;
  /** Published peak current (A), the noise's scale. */
  ipA: number;
  /** Published forward Ep for E°′ = 0 (V). */
  forwardEpV: number;
  forward: 'anodic' | 'cathodic';
  /** Published ΔEp for a forward Ep, or null without a return peak. */
  deltaEpV: ((forwardEpV: number) => number) | null;
}

const CASES: Case[] = [
  {
    key: '(a) Nernstian film', forward: 'anodic', forwardEpV: 0, deltaEpV: () => 0,
    input: { mechanism: 'surface', surfaceRatePerS: Infinity, coverageMolPerCm2: 1e-10, areaCm2: AREA, startV: -0.35, switchV: 0.35 },
    ipA: (F * AREA * 1e-10 * V) / (4 * u),
  },
  {
    key: '(b) reversible', forward: 'cathodic', forwardEpV: -1.109 * u, deltaEpV: (ep) => reversibleDeltaEpAtSwitch(Math.abs(-0.4 - ep)).deltaEpV,
    input: { k0CmPerS: Infinity, startV: 0.4, switchV: -0.4, areaCm2: AREA, concentrationOMolPerCm3: C, diffusionOCm2PerS: D, diffusionRCm2PerS: D },
    ipA: 0.4463 * F * AREA * C * Math.sqrt((D * V) / u),
  },
  {
    key: '(c) irreversible', forward: 'cathodic', deltaEpV: null,
    forwardEpV: -(u / ALPHA) * (0.78 + Math.log(Math.sqrt(D) / K0_SLOW) + 0.5 * Math.log((ALPHA * V) / u)),
    input: { k0CmPerS: K0_SLOW, alpha: ALPHA, startV: 0.1, switchV: -0.8, areaCm2: AREA, concentrationOMolPerCm3: C, diffusionOCm2PerS: D, diffusionRCm2PerS: D },
    ipA: 0.4958 * F * AREA * C * Math.sqrt((D * ALPHA * V) / u),
  },
];

const STEPS_MV = [1, 2, 5];
const NOISE_PERCENT = [0.5, 1, 2, 3];
const PHASES = [0, 0.23, 0.5, 0.77];

function voltammogram(input: Partial<CvSimulationInput>, noiseA = 0, seed = 1): Voltammogram {
  const r = simulateCv({ ...input, scanRateVPerS: V });
  const currentA = Float64Array.from(r.currentA);
  if (noiseA > 0) {
    const g = seededGaussian(seed);
    for (let k = 0; k < currentA.length; k++) currentA[k]! += noiseA * g();
  }
  const split = findSweepSegments(r.potentialV);
  return { potentialV: r.potentialV, currentA, timeS: r.timeS, segments: split.segments, cycles: split.cycles, scanRateVPerS: V, scanRateSource: 'option' };
}

/** The forward Ep (the largest forward peak) and the ΔEp of the largest couple. */
function measure(v: Voltammogram, c: Case): { epV: number; deltaEpV: number } {
  const cycle = analyzeVoltammogram(v).cycles[0]!;
  const forward = cycle.peaks.filter((p) => p.direction === c.forward && p.onFirstSweep).sort((a, b) => b.heightA - a.heightA)[0];
  const couple = cycle.couples.filter((q) => q.deltaEpV !== null).sort((a, b) => (b.ipaA ?? 0) + (b.ipcA ?? 0) - (a.ipaA ?? 0) - (a.ipcA ?? 0))[0];
  return { epV: forward?.potentialV ?? NaN, deltaEpV: couple?.deltaEpV ?? NaN };
}

function meanSd(xs: number[]): { mean: number; sd: number } {
  const ok = xs.filter(Number.isFinite);
  const mean = ok.reduce((a, b) => a + b, 0) / ok.length;
  return { mean, sd: Math.sqrt(ok.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, ok.length - 1)) };
}

const mv = (x: number) => (Number.isFinite(x) ? (x * 1000).toFixed(2) : '—').padStart(7);

function scatterTable(seeds: number): void {
  console.log(`case                 step  noise | Ep bias    sd | ΔEp bias    sd   (mV; ${seeds} seeds; noise-free: largest |bias| over ${PHASES.length} grid phases)`);
  for (const c of CASES) {
    for (const step of STEPS_MV) {
      const worst = { ep: 0, dEp: 0 };
      let noiseFreeDeltaEpV = NaN;
      for (const phase of PHASES) {
        const shift = (phase * step) / 1000;
        const m = measure(voltammogram({ ...c.input, stepV: step / 1000, formalPotentialV: shift }), c);
        const ep = m.epV - shift - c.forwardEpV;
        const dEp = c.deltaEpV ? m.deltaEpV - c.deltaEpV(m.epV - shift) : NaN;
        if (phase === 0) noiseFreeDeltaEpV = m.deltaEpV;
        if (!(Math.abs(ep) <= Math.abs(worst.ep))) worst.ep = ep;
        if (!(Math.abs(dEp) <= Math.abs(worst.dEp))) worst.dEp = dEp;
      }
      console.log(`${c.key.padEnd(20)} ${String(step).padStart(2)} mV  free  | ${mv(worst.ep)}       | ${mv(worst.dEp)}`);
      for (const pct of NOISE_PERCENT) {
        const ep: number[] = [];
        const dEp: number[] = [];
        for (let s = 1; s <= seeds; s++) {
          const m = measure(voltammogram({ ...c.input, stepV: step / 1000 }, (pct / 100) * c.ipA, 1000 * step + 17 * s + Math.round(10 * pct)), c);
          ep.push(m.epV - c.forwardEpV);
          dEp.push(m.deltaEpV - noiseFreeDeltaEpV);
        }
        const a = meanSd(ep);
        const b = meanSd(dEp);
        console.log(`${''.padEnd(20)} ${String(step).padStart(2)} mV ${pct.toFixed(1).padStart(4)} % | ${mv(a.mean)} ${mv(a.sd)} | ${mv(b.mean)} ${mv(b.sd)}`);
      }
    }
  }
}

const film = (ks: number, switchV: number, startV = -0.35): Partial<CvSimulationInput> => ({ mechanism: 'surface', surfaceRatePerS: ks, coverageMolPerCm2: 1e-10, startV, switchV });
const SHAPES: Record<string, Partial<CvSimulationInput>> = {
  'Nernstian film': film(Infinity, 0.35),
  'film k_s 25/s': film(25, 0.35),
  'film k_s 5/s': film(5, 0.45),
  'film k_s 1/s': film(1, 0.55),
  'film k_s 0.1/s': film(0.1, 0.7, -0.2),
  reversible: { k0CmPerS: Infinity, startV: 0.4, switchV: -0.4 },
  'k° 0.01 cm/s': { k0CmPerS: 0.01, startV: 0.4, switchV: -0.5 },
  'irreversible α 0.5': { k0CmPerS: 1e-5, startV: 0.1, switchV: -0.8 },
  'irreversible α 0.3': { k0CmPerS: 1e-5, alpha: 0.3, startV: 0.1, switchV: -1.2 },
  'EC, k_f 10/s': { mechanism: 'EC', k0CmPerS: Infinity, followUpRatePerS: 10, startV: 0.4, switchV: -0.4 },
};
const SHARES = [0.05, 0.1, 0.2, 0.3];

function skewTable(): void {
  console.log(`shape                  S (mV) | ${SHARES.map((w) => `w ${w}: move (mV)   K`).join(' | ')}`);
  for (const [name, input] of Object.entries(SHAPES)) {
    const v = voltammogram({ ...input, stepV: 0.001 });
    const locating = { window: windowForSpan(v.potentialV, v.segments[0]!, 0.015), order: 2 };
    const sig = prepareSweepSignals(v, { window: 5, order: 2 }, () => locating);
    const peaks = locatePeaksInSweep(sig, 0, { windows: null, minProminenceA: 0, locatingWindow: locating.window });
    const peak = peaks.sort((a, b) => b.prominenceA - a.prominenceA)[0]!;
    const s = peak.direction === 'anodic' ? 1 : -1;
    const lo = ownStart(sig.segments, 0);
    const top = { potentialV: sig.potentialV, level: (j: number) => s * sig.locatingA[j]!, raw: (j: number) => s * sig.currentA[j]!, lo, hi: sig.segments[0]!.end };
    let k = peak.index;
    while (k + 1 < top.hi && top.level(k + 1) > top.level(k)) k++;
    while (k - 1 > lo && top.level(k - 1) > top.level(k)) k--;
    const win = peakTopWindow(top, k, peak.prominenceA, 0);
    const narrow = vertexInWindow(top, k, 0.01 * peak.prominenceA)!.potentialV;
    const cells = SHARES.map((w) => {
      const move = Math.abs(vertexInWindow(top, k, w * peak.prominenceA)!.potentialV - narrow);
      const skew = Math.abs(win.skewV!);
      return `${mv(move)} ${(skew > 1e-5 ? (move / (skew * w * w)).toFixed(1) : '—').padStart(5)}`;
    });
    console.log(`${name.padEnd(20)} ${mv(Math.abs(win.skewV!))} | ${cells.join('      | ')}`);
  }
}

const args = process.argv.slice(2);
const seedsAt = args.indexOf('--seeds');
if (args.includes('--skew')) skewTable();
else scatterTable(seedsAt >= 0 ? Number(args[seedsAt + 1]) : 200);
