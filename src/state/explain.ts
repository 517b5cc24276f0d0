/**
 * What each derived number of a series couple is: the formula used, its published source (the
 * same sources core/analysis/runMethods.ts prints in the results sheet), and the inputs with the
 * values this series used (from the series result: its resolved cell in core units and the
 * couple's fits). The screen shows these on hover or focus beside D, k°, α, Γ, k_s, k_f and Cd.
 */
import type { RunSeriesResult } from '../core/analysis/runTypes';
import type { SeriesCouple } from '../core/analysis/seriesTypes';
import { describeCapacitance } from '../core/series/doubleLayerCapacitance';

export type ExplainedKey = 'D' | 'k0' | 'alpha' | 'gamma' | 'ks' | 'kf' | 'Cd';

export interface Explanation {
  key: ExplainedKey;
  /** Name as shown, e.g. "D". */
  name: string;
  formula: string;
  source: string;
  /** [input, value with unit]. */
  inputs: [string, string][];
  note: string | null;
}

const g = (v: number | null | undefined, digits = 4) => (v === null || v === undefined || !Number.isFinite(v) ? '—' : String(Number(v.toPrecision(digits))));
const e = (v: number | null | undefined, digits = 3) => (v === null || v === undefined || !Number.isFinite(v) ? '—' : v.toExponential(digits - 1));

function cellInputs(s: RunSeriesResult, fields: ('n' | 'A' | 'C' | 'T')[]): [string, string][] {
  const c = s.cell;
  const all: Record<string, [string, string]> = {
    n: ['n (electrons)', g(c.electronCount)],
    A: ['A (electrode area)', c.areaCm2 === null ? 'not given' : `${g(c.areaCm2)} cm²`],
    C: ['C (bulk concentration)', c.concentrationMolPerCm3 === null ? 'not given' : `${g(c.concentrationMolPerCm3 * 1e6)} mM`],
    T: ['T', `${g(c.temperatureK, 5)} K`],
  };
  return fields.map((f) => all[f] as [string, string]);
}

function diffusion(s: RunSeriesResult, c: SeriesCouple): Explanation | null {
  const d = c.diffusion;
  if (!d) return null;
  const f = c.forwardFit;
  const irreversible = d.form === 'irreversible';
  const slope = f ? `${g(f.slope * 1e6)} µA (V/s)^-½${f.slopeInterval ? `, 95 % interval ${g(f.slopeInterval[0] * 1e6)}…${g(f.slopeInterval[1] * 1e6)}` : ''} (${f.pointCount} scan rates)` : '—';
  return {
    key: 'D', name: 'D',
    formula: irreversible
      ? 'ip = 0.4958·nFAC·(αnₐFvD/RT)^½, so D = (RT/αnₐF)·(slope/0.4958·nFAC)², slope of |ip| against v^½'
      : 'ip = 0.4463·nFAC·(nFvD/RT)^½ (Randles–Ševčík), so D = (RT/nF)·(slope/0.4463·nFAC)², slope of |ip| against v^½',
    source: 'Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §6.2 and §6.3; Nicholson & Shain, Anal. Chem. 36, 706 (1964)',
    inputs: [['slope', slope], ...cellInputs(s, ['n', 'A', 'C', 'T']), ...(irreversible ? [['α', `${g(d.alphaUsed, 3)} (${d.alphaSource ?? 'default'})`] as [string, string]] : [])],
    note: [d.intervalCm2PerS ? `The 95 % interval of D comes from the ends of the slope's interval only; the uncertainty of A and C is not in it.` : null, d.note].filter(Boolean).join(' ') || null,
  };
}

function rate(s: RunSeriesResult, c: SeriesCouple): Explanation | null {
  const k = c.rateConstant;
  if (!k || (k.k0CmPerS === null && k.lowerBoundCmPerS === null)) return null;
  const used = k.perFile.filter((p) => p.k0CmPerS !== null);
  return {
    key: 'k0', name: 'k°',
    formula: 'ψ = (D_O/D_R)^(α/2)·k°/(πD_O·nFv/RT)^½, ψ read from n·ΔEp; k° is the median over the files (beyond 212 mV: the irreversible peak-separation form)',
    source: "Nicholson, Anal. Chem. 37, 1351 (1965), Table I; Lavagnini et al., Electroanalysis 16, 505 (2004)",
    inputs: [
      ['files used', `${used.length} of ${k.perFile.length}`],
      ['ΔEp per file', c.points.map((p) => (p.deltaEpV === null ? '—' : `${g(p.deltaEpV * 1000, 3)} mV at ${g(p.scanRateVPerS, 3)} V/s`)).join('; ')],
      ['D used', `${e(k.diffusionOxCm2PerS)} cm²/s (${k.diffusionSource ?? 'not known'})`],
      ...cellInputs(s, ['n', 'T']),
    ],
    note: k.k0CmPerS === null ? 'Every ΔEp lies below the table: only a lower bound of k° can be given. Ohmic drop left uncorrected makes ΔEp wider and k° too small.' : 'Ohmic drop left uncorrected (Ru) widens ΔEp and makes k° too small.',
  };
}

function alpha(s: RunSeriesResult, c: SeriesCouple): Explanation | null {
  if (c.alpha === null) return null;
  const shift = [c.peakShift.anodic, c.peakShift.cathodic].filter((r) => r !== null).map((r) => `${g((r?.slopeVPerDecade ?? 0) * 1000, 3)} mV/decade`);
  return {
    key: 'alpha', name: 'α',
    formula: '|dEp/dlog v| = (ln 10)·RT/(2αnₐF)', source: 'Wang, Analytical Electrochemistry, 2nd ed. (2000), eq. 2-5',
    inputs: [['Ep against log v', shift.join('; ') || '—'], ['nₐ', g(s.cell.transferElectronCount)], ...cellInputs(s, ['T'])], note: null,
  };
}

function coverage(s: RunSeriesResult, c: SeriesCouple): Explanation | null {
  const sf = c.surface;
  if (!sf || (sf.coverageFromChargeMolPerCm2 === null && sf.coverageFromSlopeMolPerCm2 === null)) return null;
  return {
    key: 'gamma', name: 'Γ',
    formula: 'Q = nFAΓ (from the charge under the forward peak); ip = n²F²AΓv/4RT (from the slope of |ip| against v)',
    source: 'Laviron, J. Electroanal. Chem. 52, 355 (1974)',
    inputs: [
      ['Γ from charge', `${e(sf.coverageFromChargeMolPerCm2)} mol/cm²`], ['Γ from slope', `${e(sf.coverageFromSlopeMolPerCm2)} mol/cm²`],
      ['slope of |ip| against v', sf.fit ? `${g(sf.fit.slope * 1e6)} µA (V/s)^-1` : '—'], ...cellInputs(s, ['n', 'A', 'T']),
    ],
    note: null,
  };
}

function surfaceRate(s: RunSeriesResult, c: SeriesCouple): Explanation | null {
  const f = c.surface;
  if (!f || f.ksPerS === null) return null;
  return {
    key: 'ks', name: 'k_s',
    formula: "m = (RT/nF)·k_s/v from each file's n·ΔEp on Laviron's general working curve (integrated; for n·ΔEp > 200 mV it is log k_s = α log(1−α) + (1−α) log α − log(RT/nFv) − α(1−α)nFΔEp/(2.303RT)); median over the files",
    source: 'Laviron, J. Electroanal. Chem. 101, 19 (1979)',
    inputs: [['files with n·ΔEp ≥ 5 mV', String(f.ksFileCount)], ['αc', f.ksAlphaSource === 'assumed' ? '0.5 assumed (range over 0.3–0.7)' : g(f.lavironAlpha ?? s.cell.alpha ?? 0.5, 3)], ...cellInputs(s, ['n', 'T'])],
    note: f.ksStatus === 'value' ? null : f.ksNote,
  };
}

function followUp(s: RunSeriesResult, c: SeriesCouple): Explanation | null {
  const kf = c.followUp?.rateConstantPerS;
  if (kf === null || kf === undefined) return null;
  return {
    key: 'kf', name: 'k_f',
    formula: 'return/forward ratio (Nicholson 1966) → λ = k_f·RT/(nFv) on the working curve for the file’s n(Eλ − E½); median over the files',
    source: 'Nicholson & Shain, Anal. Chem. 36, 706 (1964); Nicholson, Anal. Chem. 38, 1406 (1966); working curve from this program’s simulator',
    inputs: [['files used', String(c.followUp?.perFile.filter((f) => f.rateConstantPerS !== null).length ?? 0)], ...cellInputs(s, ['n', 'T'])], note: null,
  };
}

/** Cd in words ("= value (95 % …)", "≤ bound", "not determined"), for the series view. */
export function capacitanceText(cd: NonNullable<RunSeriesResult['capacitance']>): string {
  return describeCapacitance(cd);
}

/** The explanation of the series' double-layer capacitance, when it was measured. */
export function explainCapacitance(s: RunSeriesResult): Explanation | null {
  const cd = s.capacitance;
  if (!cd) return null;
  const model = cd.model === 'charging+tail' ? 'gap/2 = A·Cd·v + c·v^½ over the scan rates (the v^½ term a diffusing couple\'s tail)' : cd.model === 'charging' ? 'gap/2 = A·Cd·v over two scan rates' : 'Cd ≤ gap/(2Av) at one scan rate';
  return {
    key: 'Cd', name: 'Cd',
    formula: `forward − reverse current gap = 2·A·Cd·v, each gap the median over ± 10 mV, less a Nernstian film's own current; ${model}`,
    source: 'Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §1.2 and §6.2; film: Laviron, J. Electroanal. Chem. 52 (1974) 355',
    inputs: [['status', cd.status], ['slope of gap/2 against v', cd.fit ? `${e(cd.fit.slope)} A (V/s)^-1, R² ${g(cd.fit.r2, 4)}` : 'one scan rate'], ...cellInputs(s, ['A'])], note: cd.warning,
  };
}

/** Every derived number of the couple that was determined, with its explanation. */
export function explainCouple(s: RunSeriesResult, c: SeriesCouple): Partial<Record<ExplainedKey, Explanation>> {
  const out: Partial<Record<ExplainedKey, Explanation>> = {};
  for (const x of [diffusion(s, c), rate(s, c), alpha(s, c), coverage(s, c), surfaceRate(s, c), followUp(s, c), explainCapacitance(s)]) {
    if (x) out[x.key] = x;
  }
  return out;
}
