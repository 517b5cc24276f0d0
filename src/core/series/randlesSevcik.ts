/**
 * Randles–Ševčík peak current of a diffusing couple under a linear sweep (planar, semi-infinite
 * diffusion), and its inverse: D from the slope of ip against v^½.
 * In: electronCount n, areaCm2, concentrationMolPerCm3 (bulk), diffusionCm2PerS, scanRateVPerS,
 *   temperatureK. Out: peak current magnitude in A (sign is left to the caller: anodic positive
 *   under IUPAC), or D in cm²/s.
 * Sources:
 *   reversible:   ip = 0.4463·nFAC·(nFvD/RT)^½ — Bard & Faulkner, Electrochemical Methods, 2nd ed.
 *                 (2001), §6.2; Nicholson & Shain, Anal. Chem. 36, 706 (1964), Table I;
 *                 25 °C form ip = 2.69e5·n^{3/2}·A·C·D^½·v^½ — J. Wang, Analytical
 *                 Electrochemistry, 2nd ed. (2000), eq. 2-1.
 *   irreversible: ip = 0.4958·nFAC·(α·nₐ·FvD/RT)^½ — Bard & Faulkner 2nd ed. §6.3; IUPAC,
 *                 Pure Appl. Chem. 92, 641 (2020) (k′ = 0.496); 25 °C form 2.99e5·n·(α·nₐ)^½·A·C·D^½·v^½.
 * Difference: the 25 °C forms are offered only to reproduce printed examples; they ignore
 *   `temperatureK` and are 0.13 % (reversible) and 0.19 % (irreversible) high against the full forms.
 */
import { assertFiniteInRange } from '../errors';
import { FARADAY_C_PER_MOL, STANDARD_TEMPERATURE_K, inverseThermalVoltagePerV } from '../constants';

/** Maximum of the Nernstian current function π^½·χ(σt) (Nicholson & Shain 1964). */
export const RANDLES_SEVCIK_REVERSIBLE = 0.4463;
/** Maximum of the totally irreversible current function π^½·χ(bt) (Bard & Faulkner §6.3). */
export const RANDLES_SEVCIK_IRREVERSIBLE = 0.4958;

export type RandlesSevcikForm = 'reversible' | 'irreversible';

export interface RandlesSevcikOptions {
  /** Which limiting case. @default 'reversible' */
  form?: RandlesSevcikForm;
  /** Transfer coefficient α (irreversible form only), in (0, 1). @default 0.5 */
  alpha?: number;
  /** Electrons in the rate-determining step nₐ (irreversible form only). @default 1 */
  transferElectronCount?: number;
  /** Temperature in K. @default 298.15 */
  temperatureK?: number;
  /** 'full' uses the dimensionless maximum with F and RT; '25C' the rounded printed constant. @default 'full' */
  constant?: 'full' | '25C';
}

/** Quantities shared by the forward and inverse forms. */
export interface RandlesSevcikCell {
  electronCount: number;
  areaCm2: number;
  concentrationMolPerCm3: number;
}

function checkCell(cell: RandlesSevcikCell): void {
  assertFiniteInRange('electronCount', cell.electronCount, Number.MIN_VALUE);
  assertFiniteInRange('areaCm2', cell.areaCm2, Number.MIN_VALUE);
  assertFiniteInRange('concentrationMolPerCm3', cell.concentrationMolPerCm3, Number.MIN_VALUE);
}

/**
 * ip / (D·v)^½ in A·s/(cm·V^½): the factor that multiplies √(D v). Depends on the cell, the form
 * and the temperature only.
 */
export function randlesSevcikCoefficient(cell: RandlesSevcikCell, options: RandlesSevcikOptions = {}): number {
  checkCell(cell);
  const form = options.form ?? 'reversible';
  const alpha = options.alpha ?? 0.5;
  const na = options.transferElectronCount ?? 1;
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('alpha', alpha, Number.MIN_VALUE, 1);
  assertFiniteInRange('transferElectronCount', na, Number.MIN_VALUE);
  assertFiniteInRange('temperatureK', temperatureK, Number.MIN_VALUE);
  const { electronCount: n, areaCm2: a, concentrationMolPerCm3: c } = cell;
  if (options.constant === '25C') {
    return form === 'reversible' ? 2.69e5 * n ** 1.5 * a * c : 2.99e5 * n * Math.sqrt(alpha * na) * a * c;
  }
  const f = inverseThermalVoltagePerV(temperatureK);
  const nFAC = n * FARADAY_C_PER_MOL * a * c;
  return form === 'reversible'
    ? RANDLES_SEVCIK_REVERSIBLE * nFAC * Math.sqrt(n * f)
    : RANDLES_SEVCIK_IRREVERSIBLE * nFAC * Math.sqrt(alpha * na * f);
}

export interface RandlesSevcikInput extends RandlesSevcikCell {
  diffusionCm2PerS: number;
  scanRateVPerS: number;
}

/** Peak current magnitude in A. */
export function randlesSevcikPeakCurrent(input: RandlesSevcikInput, options: RandlesSevcikOptions = {}): number {
  assertFiniteInRange('diffusionCm2PerS', input.diffusionCm2PerS, 0);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, 0);
  return randlesSevcikCoefficient(input, options) * Math.sqrt(input.diffusionCm2PerS * input.scanRateVPerS);
}

/**
 * D in cm²/s from the slope of |ip| (A) against v^½ ((V/s)^½): D = (slope / coefficient)².
 * The slope's sign is ignored (cathodic peaks are negative under IUPAC).
 */
export function randlesSevcikDiffusion(
  slopeAPerSqrtVPerS: number,
  cell: RandlesSevcikCell,
  options: RandlesSevcikOptions = {},
): number {
  assertFiniteInRange('slopeAPerSqrtVPerS', slopeAPerSqrtVPerS);
  const k = randlesSevcikCoefficient(cell, options);
  return (slopeAPerSqrtVPerS / k) ** 2;
}
