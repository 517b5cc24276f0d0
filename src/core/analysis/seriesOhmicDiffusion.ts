/**
 * D of a diffusing series couple when the user gave Ru: an uncompensated resistance lowers each
 * peak current itself, not only its potential (the interface is swept more slowly than v near the
 * peak), and correcting E − i·Ru afterwards does not give that current back. Each forward |ip| is
 * divided by the deficit ip(Ru)/ip(0) at its file's scan rate, ψ and αc
 * (series/ohmicPeakCurrentRatio.ts, this project's simulator; Nicholson, Anal. Chem. 37, 667
 * (1965) for the ohmic term, from memory) before D is taken (seriesDiffusion.ts). The deficit
 * depends on D through ρ = ip,rev·Ru·nF/RT, so D is iterated: D₀ from the raw peaks, then twice
 * deficits at D and D again (a 5 % deficit moves ρ by 2.5 %, so the second pass changes D by
 * well under 0.1 %).
 * Applies to the reversible and quasi-reversible forms (ψ from ΔEp, Infinity at the reversible
 * end); the irreversible and follow-up forms have no k° here to simulate with, and say so.
 * Limits: the double layer is left out (Ru·Cd·A ≪ RT/(nFv)); the correction is as good as the Ru
 * given; the per-cm² cell of a density series is taken as 1 cm².
 */
import { formatScanRate } from '../units';
import { OHMIC_RHO_MAX, ohmicDropParameter, ohmicPeakCurrentRatio } from '../series';
import type { SeriesPoint } from '../series/seriesPoint';
import { filePsi, seriesDiffusion, type DiffusionInput } from './seriesDiffusion';
import { fitForwardAgainstSqrtScanRate, type ResolvedSeriesOptions } from './seriesFits';
import type { SeriesDiffusion } from './seriesTypes';

const PASSES = 2;

type Result = ReturnType<typeof seriesDiffusion>;

const withNote = (r: Result, text: string): Result => (r.diffusion ? { ...r, diffusion: { ...r.diffusion, note: r.diffusion.note ? `${r.diffusion.note}; ${text}` : text } } : r);

/** Per point the deficit at D (null where the point has no forward peak or no ψ), or null when a ρ lies beyond the working curve. */
function deficits(input: DiffusionInput, o: ResolvedSeriesOptions, cell: Parameters<typeof ohmicDropParameter>[0], dCm2PerS: number): Array<number | null> | null {
  const alphaC = input.transfer.alphaC ?? 0.5;
  const forwardAlpha = input.forward === 'cathodic' ? alphaC : 1 - alphaC;
  const out: Array<number | null> = [];
  for (const p of input.points) {
    const psi = input.kineticClass === 'quasi-reversible' ? filePsi(p, o, forwardAlpha) : Infinity;
    const rho = ohmicDropParameter(cell, p.scanRateVPerS, dCm2PerS, o.ruOhm);
    if (rho > OHMIC_RHO_MAX) return null;
    out.push(p.forwardIpA === null || psi === null ? null : ohmicPeakCurrentRatio(rho, psi, forwardAlpha));
  }
  return out;
}

function describe(points: SeriesPoint[], ratios: Array<number | null>, ruOhm: number, raw: SeriesDiffusion, corrected: SeriesDiffusion): string {
  const used = points.flatMap((p, i) => (ratios[i] == null ? [] : [{ v: p.scanRateVPerS, r: ratios[i] }])).sort((a, b) => b.r - a.r);
  const at = (x: { v: number; r: number }) => `${x.r.toFixed(3)} at ${formatScanRate(x.v)}`;
  const ends = used.length > 1 ? `from ${at(used[0]!)} to ${at(used[used.length - 1]!)}` : used.length ? at(used[0]!) : 'none';
  const change = (corrected.diffusionCm2PerS / raw.diffusionCm2PerS - 1) * 100;
  return `ohmic drop (Ru = ${ruOhm} Ω) lowers each peak current as well: each divided by its simulated ip(Ru)/ip(0), ${ends} (this project's simulator at the file's scan rate, ψ and the series' D, iterated ${PASSES}×; double layer left out), which moves D by ${change >= 0 ? '+' : ''}${change.toFixed(1)} % from the raw peaks`;
}

/** D with every file's forward peak divided by its ohmic deficit, D iterated; null when a ρ lies beyond the working curve. */
function corrected(input: DiffusionInput, o: ResolvedSeriesOptions, start: SeriesDiffusion): { result: Result; ratios: Array<number | null> } | null {
  const cell = { electronCount: o.electronCount, areaCm2: o.areaCm2!, concentrationMolPerCm3: o.concentrationMolPerCm3!, temperatureK: o.temperatureK };
  let d = start.diffusionCm2PerS;
  let out: { result: Result; ratios: Array<number | null> } | null = null;
  for (let pass = 0; pass < PASSES; pass++) {
    const r = deficits(input, o, cell, d);
    if (!r) return null;
    const points = input.points.map((p, i) => (p.forwardIpA === null || r[i] == null ? p : { ...p, forwardIpA: p.forwardIpA / r[i] }));
    const result = seriesDiffusion({ ...input, points, fit: fitForwardAgainstSqrtScanRate(points) }, o);
    if (!result.diffusion) return null;
    d = result.diffusion.diffusionCm2PerS;
    out = { result, ratios: r };
  }
  return out;
}

const span = (a: [number, number] | null, b: [number, number] | null): [number, number] | null =>
  a && b ? [Math.min(a[0], b[0]), Math.max(a[1], b[1])] : a ?? b;

/**
 * `ohmicMayWiden`: the ohmic check (ohmicWidening.ts) finds the drop at least half of ΔEp's
 * widening, so the widening left after the iR correction may be ohmic rather than kinetic. A
 * quasi-reversible reading is then weighed against the Nernstian one (ψ = ∞, no K(ψ)): the headline
 * is the Nernstian reading, the range spans both. Without that flag the headline stays kinetic and
 * the range still spans the Nernstian reading (the two cannot be told apart from one concentration).
 */
export function seriesDiffusionWithOhmicDeficit(input: DiffusionInput, o: ResolvedSeriesOptions, ohmicMayWiden = false): Result {
  const raw = seriesDiffusion(input, o);
  const d0 = raw.diffusion;
  if (!(o.ruOhm > 0) || !d0 || o.areaCm2 === null || o.concentrationMolPerCm3 === null) return raw;
  const applies = !input.followUp && d0.status !== 'range-only' && (input.kineticClass === 'reversible' || input.kineticClass === 'quasi-reversible' || input.kineticClass === 'inconclusive');
  if (!applies) return withNote(raw, `the ohmic drop (Ru = ${o.ruOhm} Ω) also lowers each peak current; this form has no k° to simulate that with, so D is biased low by it`);
  const beyond = `the ohmic drop (Ru = ${o.ruOhm} Ω) exceeds ${OHMIC_RHO_MAX} RT/nF at the peak of some file: its lowering of the peak current is not corrected, and D is biased low by it`;
  const head = corrected(input, o, d0);
  if (!head) return withNote(raw, beyond);
  const note = describe(input.points, head.ratios, o.ruOhm, d0, head.result.diffusion!);
  if (input.kineticClass !== 'quasi-reversible') return withNote(head.result, note);
  const nernstInput: DiffusionInput = { ...input, kineticClass: 'reversible' };
  const nernstRaw = seriesDiffusion(nernstInput, o).diffusion;
  const nernst = nernstRaw ? corrected(nernstInput, o, nernstRaw) : null;
  if (!nernst) return withNote(head.result, note);
  const [k, n] = [head.result.diffusion!, nernst.result.diffusion!];
  const rangeCm2PerS = span(k.rangeCm2PerS, n.rangeCm2PerS);
  const both = `D read as all-kinetic (K(ψ)) ${k.diffusionCm2PerS.toExponential(2)} and as Nernstian with all the widening ohmic ${n.diffusionCm2PerS.toExponential(2)} cm²/s; the range spans both`;
  if (!ohmicMayWiden) return withNote({ ...head.result, diffusion: { ...k, rangeCm2PerS } }, `${note}; ${both}`);
  const nernstNote = describe(input.points, nernst.ratios, o.ruOhm, d0, n);
  return { ...nernst.result, diffusion: { ...n, rangeCm2PerS, note: `the drop Ru·Δi is at least half of ΔEp's widening, so the widening left after the iR correction may be ohmic: D in the Nernstian form; ${nernstNote}; ${both}` } };
}
