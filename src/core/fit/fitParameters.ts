/**
 * The free-parameter vector of a fit and its transforms.
 * Internal coordinates u (what Levenberg–Marquardt moves, within box limits): E°′ in units of
 * RT/F; α itself within (0.05, 0.95); R_u in units of 10 Ω (≥ 0); the natural log of k°, D,
 * D_O/D_R, k_f, Γ, k_s and C_dl between search limits. Report coordinates (in which standard errors and correlations are
 * given): E°′ in V, α, R_u in Ω, and the natural log of every other parameter.
 * Source: fitting positive constants on a log scale is common practice (Bates & Watts, Nonlinear
 *   Regression Analysis, Wiley (1988), §3.4 on reparameterisation, from memory); the search
 *   limits are choices of this project. Limits are kept by the iteration (box constraints), not
 *   by a squashing transform, whose flat ends would trap a parameter that touches them.
 */
import { thermalVoltageV } from '../constants';
import { AnalysisError } from '../errors';
import type { CoupleParameter, FitMechanism, FitModelValues, FitParameter, SharedParameter } from './fitTypes';

type Scale = 'potential' | 'log' | 'unit' | 'resistance';

interface Spec {
  scale: Scale;
  /** Search limits in the unit of the name. */
  lo: number;
  hi: number;
  /** Short label used in notes and correlation labels. */
  label: string;
}

/** R_u moves in units of 10 Ω, so that its internal coordinate is of the order of the others. */
const RESISTANCE_SCALE_OHM = 10;

export const PARAMETER_SPECS: Readonly<Record<CoupleParameter | SharedParameter, Spec>> = {
  formalPotentialV: { scale: 'potential', lo: -Infinity, hi: Infinity, label: 'E°′' },
  k0CmPerS: { scale: 'log', lo: 1e-9, hi: 1e2, label: 'k°' },
  alpha: { scale: 'unit', lo: 0.05, hi: 0.95, label: 'α' },
  diffusionOCm2PerS: { scale: 'log', lo: 1e-9, hi: 1e-3, label: 'D_O' },
  diffusionRatio: { scale: 'log', lo: 0.1, hi: 10, label: 'D_O/D_R' },
  followUpRatePerS: { scale: 'log', lo: 1e-7, hi: 1e6, label: 'k_f' },
  coverageMolPerCm2: { scale: 'log', lo: 1e-15, hi: 1e-7, label: 'Γ' },
  surfaceRatePerS: { scale: 'log', lo: 1e-3, hi: 1e7, label: 'k_s' },
  uncompensatedOhm: { scale: 'resistance', lo: 0, hi: 1e6, label: 'R_u' },
  doubleLayerFPerCm2: { scale: 'log', lo: 1e-9, hi: 1e-2, label: 'C_dl' },
};

export const COUPLE_PARAMETERS: Record<FitMechanism, CoupleParameter[]> = {
  E: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'diffusionRatio'],
  EC: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'diffusionRatio', 'followUpRatePerS'],
  surface: ['formalPotentialV', 'alpha', 'coverageMolPerCm2', 'surfaceRatePerS'],
};
const SHARED: SharedParameter[] = ['uncompensatedOhm', 'doubleLayerFPerCm2'];

export const DEFAULT_FREE: Readonly<Record<FitMechanism, FitParameter[]>> = {
  E: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'doubleLayerFPerCm2'],
  EC: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'followUpRatePerS', 'doubleLayerFPerCm2'],
  surface: ['formalPotentialV', 'alpha', 'coverageMolPerCm2', 'surfaceRatePerS', 'doubleLayerFPerCm2'],
};

export interface LayoutEntry {
  parameter: CoupleParameter | SharedParameter;
  couple: number | null;
  spec: Spec;
}

export class ParameterLayout {
  private readonly thermalV: number;

  constructor(readonly entries: readonly LayoutEntry[], private readonly temperatureK: number) {
    this.thermalV = thermalVoltageV(temperatureK);
  }

  /** The free parameters of a model: per couple in couple order, then the shared ones. */
  static build(mechanism: FitMechanism, coupleCount: number, free: readonly FitParameter[], temperatureK: number): ParameterLayout {
    for (const name of free) {
      if (name === 'background' || (SHARED as string[]).includes(name)) continue;
      if (!(COUPLE_PARAMETERS[mechanism] as string[]).includes(name)) {
        throw new AnalysisError('BAD_OPTION', `free: ${name} does not belong to the ${mechanism} mechanism (it has ${COUPLE_PARAMETERS[mechanism].join(', ')})`);
      }
    }
    const entries: LayoutEntry[] = [];
    for (let c = 0; c < coupleCount; c++) {
      for (const parameter of COUPLE_PARAMETERS[mechanism]) if (free.includes(parameter)) entries.push({ parameter, couple: c, spec: PARAMETER_SPECS[parameter] });
    }
    for (const parameter of SHARED) if (free.includes(parameter)) entries.push({ parameter, couple: null, spec: PARAMETER_SPECS[parameter] });
    if (entries.length === 0) throw new AnalysisError('BAD_OPTION', 'free: no parameter of the model is free');
    return new ParameterLayout(entries, temperatureK);
  }

  /** The same layout without entry `index` (that parameter then keeps its value in the base). */
  without(index: number): ParameterLayout {
    return new ParameterLayout(this.entries.filter((_, i) => i !== index), this.temperatureK);
  }

  get size(): number {
    return this.entries.length;
  }

  valueOf(values: FitModelValues, e: LayoutEntry): number {
    return e.couple === null ? values.shared[e.parameter as SharedParameter] : values.couples[e.couple]![e.parameter as CoupleParameter];
  }

  set(values: FitModelValues, e: LayoutEntry, x: number): void {
    if (e.couple === null) values.shared[e.parameter as SharedParameter] = x;
    else values.couples[e.couple]![e.parameter as CoupleParameter] = x;
  }

  /** Internal coordinate of a value: E°′/(RT/F), α, ln x for the rest. */
  private internalOf(e: LayoutEntry, x: number): number {
    switch (e.spec.scale) {
      case 'potential': return x / this.thermalV;
      case 'resistance': return x / RESISTANCE_SCALE_OHM;
      case 'unit': return x;
      default: return Math.log(Math.max(x, Number.MIN_VALUE));
    }
  }

  /** Internal coordinates of `values`, clamped into the search limits. */
  toInternal(values: FitModelValues): Float64Array {
    const { lower, upper } = this.bounds();
    return Float64Array.from(this.entries, (e, i) => Math.min(Math.max(this.internalOf(e, this.valueOf(values, e)), lower[i]!), upper[i]!));
  }

  /** Search limits in internal coordinates. */
  bounds(): { lower: Float64Array; upper: Float64Array } {
    return {
      lower: Float64Array.from(this.entries, (e) => this.internalOf(e, e.spec.lo)),
      upper: Float64Array.from(this.entries, (e) => this.internalOf(e, e.spec.hi)),
    };
  }

  /** Writes the values for internal coordinates u into a copy of `base`. */
  fromInternal(u: Float64Array, base: FitModelValues): FitModelValues {
    const out = cloneValues(base);
    this.entries.forEach((e, i) => {
      const ui = u[i] as number;
      const { scale } = e.spec;
      this.set(out, e, scale === 'potential' ? ui * this.thermalV : scale === 'resistance' ? ui * RESISTANCE_SCALE_OHM : scale === 'unit' ? ui : Math.exp(ui));
    });
    return out;
  }

  /** Report coordinate: V for E°′, Ω for R_u, α itself, ln x otherwise. */
  toReport(values: FitModelValues, e: LayoutEntry): number {
    const x = this.valueOf(values, e);
    return reportIsLinear(e) ? x : Math.log(x);
  }

  fromReport(values: FitModelValues, e: LayoutEntry, y: number): void {
    this.set(values, e, reportIsLinear(e) ? y : Math.exp(y));
  }

  /** Forward-difference step in report coordinates. */
  reportStep(values: FitModelValues, e: LayoutEntry): number {
    if (e.spec.scale === 'potential') return 1e-5 * this.thermalV;
    if (e.spec.scale === 'resistance') return 1e-5 * Math.max(this.valueOf(values, e), RESISTANCE_SCALE_OHM);
    return 1e-5;
  }

  /** True when the value lies within 0.1 % (of the log range for log-scale parameters) of a search limit. */
  atLimit(values: FitModelValues, e: LayoutEntry): boolean {
    const { lo, hi, scale } = e.spec;
    if (scale === 'potential') return false;
    const x = this.valueOf(values, e);
    if (scale === 'resistance') return x < 1e-3 || x > 0.999 * hi;
    const t = scale === 'log' ? (Math.log(x) - Math.log(lo)) / (Math.log(hi) - Math.log(lo)) : (x - lo) / (hi - lo);
    return t < 0.001 || t > 0.999;
  }

  label(e: LayoutEntry): string {
    return e.couple === null ? e.parameter : `${e.parameter}[${e.couple + 1}]`;
  }
}

export function reportIsLinear(e: LayoutEntry): boolean {
  return e.spec.scale !== 'log';
}

export function cloneValues(v: FitModelValues): FitModelValues {
  return { couples: v.couples.map((c) => ({ ...c })), shared: { ...v.shared } };
}
