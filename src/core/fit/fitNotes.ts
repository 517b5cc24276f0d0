/**
 * Identifiability and caveats of a fit in words: one-sided rate constants as bounds, parameters
 * the data do not determine, the R_u–k° trade-off with its correlation, other strong
 * correlations, estimates at the edge of their search range, and whether the fit converged.
 * Thresholds (|ρ| ≥ 0.8 for R_u–k°, |ρ| ≥ 0.95 otherwise) are common practice, no source.
 */
import { PARAMETER_SPECS } from './fitParameters';
import type { FitResult, ParameterEstimate } from './fitTypes';

const UNITS: Record<ParameterEstimate['parameter'], string> = {
  formalPotentialV: 'V', k0CmPerS: 'cm/s', alpha: '', diffusionOCm2PerS: 'cm²/s', diffusionRatio: '', followUpRatePerS: '1/s',
  coverageMolPerCm2: 'mol/cm²', surfaceRatePerS: '1/s', uncompensatedOhm: 'Ω', doubleLayerFPerCm2: 'F/cm²',
};

const WHY_LOWER: Partial<Record<ParameterEstimate['parameter'], string>> = {
  k0CmPerS: 'the waves are reversible at these scan rates, so the data set only a lower limit',
  surfaceRatePerS: 'the film responds reversibly at these scan rates, so the data set only a lower limit',
  followUpRatePerS: 'the return peak is (nearly) gone, so the data set only a lower limit',
};
const WHY_UPPER: Partial<Record<ParameterEstimate['parameter'], string>> = {
  followUpRatePerS: 'no loss of the return peak is seen at these scan rates, so the data set only an upper limit',
  k0CmPerS: 'the data set only an upper limit',
  surfaceRatePerS: 'the data set only an upper limit',
};

export function describe(e: ParameterEstimate, coupleCount: number): string {
  const label = PARAMETER_SPECS[e.parameter].label;
  return e.couple === null || coupleCount === 1 ? label : `${label} (couple ${e.couple + 1})`;
}

const fmt = (x: number) => Number(x.toPrecision(2)).toString();
/** Two significant digits rounded away from what the data exclude: down for a lower bound, up for an upper one. */
const fmtBound = (x: number, side: 'lower' | 'upper') => {
  if (!(x > 0)) return fmt(x);
  const unit = 10 ** (Math.floor(Math.log10(x)) - 1);
  return Number(((side === 'lower' ? Math.floor(x / unit) : Math.ceil(x / unit)) * unit).toPrecision(2)).toString();
};

export function fitNotes(r: Pick<FitResult, 'parameters' | 'correlation' | 'converged' | 'stopReason'>, coupleCount: number): string[] {
  const notes: string[] = [];
  if (!r.converged) notes.push(`the fit did not converge (${r.stopReason}): the values are the best found, not an optimum`);
  for (const e of r.parameters.filter((p) => p.free)) {
    const name = describe(e, coupleCount);
    const unit = UNITS[e.parameter];
    if (e.status === 'lower-bound' && e.reason) notes.push(`${name} is only a lower bound${e.interval?.[0] != null ? ` (> ${fmtBound(e.interval[0], 'lower')} ${unit}, the lower end of its 95 % interval)` : ''}: ${e.reason}`);
    else if (e.status === 'lower-bound' && e.interval?.[0] != null) notes.push(`${name} > ${fmtBound(e.interval[0], 'lower')} ${unit} at 95 %: ${WHY_LOWER[e.parameter] ?? 'the data set only a lower limit'} (profile likelihood)`);
    if (e.status === 'upper-bound' && e.interval?.[1] != null) notes.push(`${name} < ${fmtBound(e.interval[1], 'upper')} ${unit} at 95 %: ${WHY_UPPER[e.parameter] ?? 'the data set only an upper limit'} (profile likelihood)`);
    if (e.status === 'undetermined') notes.push(`${name} is not determined by these data${e.reason ? ` (${e.reason})` : e.parameter === 'alpha' ? ' (α has no effect on a reversible wave)' : ''}`);
    if (e.atSearchLimit && e.status === 'estimate') {
      const spec = PARAMETER_SPECS[e.parameter];
      notes.push(`${name} sits at the edge of its search range (${spec.lo}–${spec.hi}${unit ? ` ${unit}` : ''}): treat it as a limit, not a measurement`);
    }
  }
  notes.push(...correlationNotes(r, coupleCount));
  return notes;
}

function correlationNotes(r: Pick<FitResult, 'parameters' | 'correlation'>, coupleCount: number): string[] {
  // The matrix's rows follow its labels: the fit's free parameters, which a rate held at the
  // reversible limit has left though it is still reported as asked free.
  const label = (p: FitResult['parameters'][number]) => (p.couple === null ? p.parameter : `${p.parameter}[${p.couple + 1}]`);
  const byLabel = new Map(r.parameters.filter((p) => p.free).map((p) => [label(p), p]));
  const free = r.correlation.labels.map((l) => byLabel.get(l)).filter((p) => p !== undefined);
  const { matrix } = r.correlation;
  const out: string[] = [];
  for (let i = 0; i < free.length; i++) {
    for (let j = 0; j < i; j++) {
      const rho = matrix[i]?.[j];
      if (rho == null) continue;
      const a = free[i]!;
      const b = free[j]!;
      const pair = new Set([a.parameter, b.parameter]);
      if (pair.has('uncompensatedOhm') && pair.has('k0CmPerS') && Math.abs(rho) >= 0.8) {
        out.push(`R_u and ${describe(a.parameter === 'k0CmPerS' ? a : b, coupleCount)} trade off (correlation ${rho.toFixed(2)}): both widen ΔEp; scan rates over a wider range separate them (the ohmic drop grows with the current, kinetic broadening with ln v)`);
      } else if (Math.abs(rho) >= 0.95) {
        out.push(`${describe(a, coupleCount)} and ${describe(b, coupleCount)} are strongly correlated (${rho.toFixed(3)}): their individual errors are large, their combination is well determined`);
      }
    }
  }
  return out;
}
