/**
 * Rounding a result to what its uncertainty supports: the uncertainty is kept to two significant
 * digits when its leading digit is 1 or 2 and to one otherwise, and the value to the same decimal
 * place. Source: JCGM 100:2008 (GUM) §7.2.6 (uncertainties need at most two significant digits;
 * the value is rounded to match); the 1-or-2 rule for the second digit is the usual convention
 * (e.g. Particle Data Group, Review of Particle Physics, Introduction, "rounding", from memory).
 * In: a value and its standard uncertainty in the same unit. Out: the power of ten to round to.
 */

/** Power of ten of the last digit worth printing for a value with standard uncertainty u (> 0). */
export function roundingExponent(uncertainty: number): number {
  if (!(uncertainty > 0) || !Number.isFinite(uncertainty)) return Number.NaN;
  const lead = Math.floor(Math.log10(uncertainty));
  const leadingDigit = Math.floor(uncertainty / 10 ** lead + 1e-9);
  return leadingDigit <= 2 ? lead - 1 : lead;
}

/** The value rounded to the decimal place its uncertainty supports (the value itself when u is not > 0). */
export function roundToUncertainty(value: number, uncertainty: number): number {
  const e = roundingExponent(uncertainty);
  if (!Number.isFinite(e) || !Number.isFinite(value)) return value;
  const q = 10 ** -e;
  return e < 0 ? Math.round(value * q) / q : Math.round(value / 10 ** e) * 10 ** e;
}

/** Decimal places to print for a value with standard uncertainty u (0 when u ≥ 1, say). */
export function decimalsFor(uncertainty: number): number {
  const e = roundingExponent(uncertainty);
  return Number.isFinite(e) ? Math.max(0, -e) : 0;
}
