/**
 * Starting values of k° and R_u from the peak separations of a scan-rate series:
 *   ΔEp(v) ≈ ΔEp_kin(ψ(v)) + 2·i_p(v)·R_u,  ψ = k°/√(π·D·nFv/RT),
 * with ΔEp_kin from Nicholson's table inverted (R. S. Nicholson, Anal. Chem. 37 (1965) 1351,
 * Table I, α = 0.5), and the ohmic term the drop at both peaks (common practice, no source;
 * against this project's simulator the real widening is 1.05–1.3× this term for 30–400 Ω, so
 * R_u comes out up to ~25 % high). For fixed k° the best R_u ≥ 0 is linear least squares; k° is
 * searched on a grid. This is only a start: over a decade or two of scan rates a Nernstian
 * couple behind R_u and a slower couple without it can have nearly the same ΔEp; the fit to the
 * whole wave (peak heights and shapes) tells them apart.
 * Beyond the table: ψ > 20 approaches the reversible 2.218·RT/nF (linear in 1/ψ); ψ < 0.1
 * widens by 4.6·RT/(αnF)… per decade of ψ (both irreversible peaks move by 2.303·RT/(2αnF) per
 * decade of v, Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001) eq. 6.3.6, from memory).
 * With R_u fixed (a number), k° follows from each ΔEp − 2·i_p·R_u through ψ and the median is taken.
 * In: per voltammogram v (V/s), ΔEp (V), forward peak current (A); D (cm²/s), n, T; R_u or null
 *   when it is to be found (needs two or more scan rates). Out: k° (cm/s) and R_u (Ω), or null
 *   when no ΔEp was measured.
 */
import { inverseThermalVoltagePerV, STANDARD_TEMPERATURE_K } from '../constants';
import { NICHOLSON_TABLE } from '../kinetics/nicholsonPsi';

export interface PeakSeparation {
  scanRateVPerS: number;
  deltaEpV: number;
  forwardPeakA: number;
}

export interface PeakSeparationStartOptions {
  diffusionCm2PerS: number;
  electronCount: number;
  temperatureK: number;
  /** Known R_u, Ω; null to estimate it (two or more scan rates). */
  ruOhm: number | null;
}

/** n·ΔEp at 25 °C (mV) of a quasi-reversible couple with kinetic parameter ψ. */
export function kineticDeltaEpMv(psi: number): number {
  const first = NICHOLSON_TABLE[0]!;
  const last = NICHOLSON_TABLE[NICHOLSON_TABLE.length - 1]!;
  const reversibleMv = 2.218 * 1000 / inverseThermalVoltagePerV(STANDARD_TEMPERATURE_K);
  if (psi >= first.psi) return reversibleMv + (first.nDeltaEpMv - reversibleMv) * (first.psi / psi);
  if (psi <= last.psi) return last.nDeltaEpMv + 2 * 2 * 59.16 * Math.log10(last.psi / psi);
  let k = 0;
  while (NICHOLSON_TABLE[k + 1]!.psi > psi) k++;
  const a = NICHOLSON_TABLE[k]!;
  const b = NICHOLSON_TABLE[k + 1]!;
  const t = Math.log(psi / a.psi) / Math.log(b.psi / a.psi);
  return a.nDeltaEpMv + t * (b.nDeltaEpMv - a.nDeltaEpMv);
}

export function peakSeparationStart(points: PeakSeparation[], o: PeakSeparationStartOptions): { k0CmPerS: number; ruOhm: number } | null {
  const usable = points.filter((p) => Number.isFinite(p.deltaEpV) && p.deltaEpV > 0 && Number.isFinite(p.forwardPeakA));
  if (usable.length === 0) return null;
  const f = o.electronCount * inverseThermalVoltagePerV(o.temperatureK);
  const toMv = (dEpV: number) => o.electronCount * dEpV * 1000 * (STANDARD_TEMPERATURE_K / o.temperatureK);
  const psiOf = (k0: number, v: number) => k0 / Math.sqrt(Math.PI * o.diffusionCm2PerS * f * v);
  const rates = new Set(usable.map((p) => p.scanRateVPerS));
  const known = o.ruOhm ?? (rates.size < 2 ? 0 : null);
  let best = { k0CmPerS: 1, ruOhm: known ?? 0, sse: Infinity };
  for (let lg = -6; lg <= 1.0001; lg += 0.05) {
    const k0 = 10 ** lg;
    const kin = usable.map((p) => kineticDeltaEpMv(psiOf(k0, p.scanRateVPerS)));
    const ohm = usable.map((p) => toMv(2 * p.forwardPeakA));
    const excess = usable.map((p, i) => toMv(p.deltaEpV) - kin[i]!);
    const ru = known ?? Math.max(0, excess.reduce((s, e, i) => s + e * ohm[i]!, 0) / ohm.reduce((s, x) => s + x * x, 0));
    const sse = excess.reduce((s, e, i) => s + (e - ru * ohm[i]!) ** 2, 0);
    if (sse < best.sse * (1 - 1e-9)) best = { k0CmPerS: k0, ruOhm: ru, sse };
  }
  return { k0CmPerS: best.k0CmPerS, ruOhm: best.ruOhm };
}
