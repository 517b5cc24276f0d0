/** Number formatting for tables: fixed decimals per quantity, a dash for missing values. */
export const DASH = '—';

export function fixed(value: number | null | undefined, digits: number, factor = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  const text = (value * factor).toFixed(digits);
  // A value that rounds to zero reads "0.0000", not "-0.0000".
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** Significant figures, for currents and charges whose magnitude varies. */
export function sig(value: number | null | undefined, digits = 4, factor = 1): string {
  return value === null || value === undefined || !Number.isFinite(value) ? DASH : Number((value * factor).toPrecision(digits)).toString();
}

export function bytes(n: number): string {
  if (n < 1024) return `${n} B`;
  if (n < 1024 * 1024) return `${(n / 1024).toFixed(1)} kB`;
  return `${(n / 1024 / 1024).toFixed(1)} MB`;
}

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** Scientific notation for very small or large magnitudes: 6.46 × 10⁻⁶. */
export function sci(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  const a = Math.abs(value);
  if (a === 0 || (a >= 1e-3 && a < 1e4)) return Number(value.toPrecision(digits)).toString();
  const [mant, exp] = value.toExponential(digits - 1).split('e');
  const e = String(Number(exp)).replace(/./g, (ch) => SUPERSCRIPT[ch] ?? ch);
  return `${mant} × 10${e}`;
}
