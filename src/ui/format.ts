/**
 * Number formatting for tables and labels. Numbers never show a binary-float tail: values are
 * rounded to a stated number of decimals or significant digits first. Prefixes are the SI ones
 * (BIPM, The International System of Units, 9th ed. 2019, Table 7). `digitsForNoise` picks the
 * decimals a value deserves from its uncertainty (one or two significant digits in the
 * uncertainty, as the GUM recommends: JCGM 100:2008, §7.2.6).
 */
import { formatFixed } from '../state/display';

export const DASH = '—';

const INTEGER = new Intl.NumberFormat('en');

/** 1234567 → "1,234,567" (one shared formatter: creating one per call is slow). */
export function count(n: number): string {
  return INTEGER.format(n);
}

export function fixed(value: number | null | undefined, digits: number, factor = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  return formatFixed(value * factor, digits);
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

/**
 * Decimals for a value whose standard uncertainty (same unit) is `uncertainty`: the uncertainty
 * keeps two significant digits when it starts with 1 or 2, else one. Clamped to [0, maxDigits].
 */
export function digitsForNoise(uncertainty: number | null | undefined, maxDigits = 6): number | null {
  if (uncertainty === null || uncertainty === undefined || !(uncertainty > 0) || !Number.isFinite(uncertainty)) return null;
  const exponent = Math.floor(Math.log10(uncertainty));
  const lead = uncertainty / 10 ** exponent;
  const digits = -exponent + (lead < 3 ? 1 : 0);
  return Math.min(maxDigits, Math.max(0, digits));
}

/**
 * Significant digits for a value given with a 95 % interval: as many as the interval's half-width
 * supports (its own rule, `digitsForNoise`), never fewer than `least`, so a narrow interval no
 * longer reads "1.00 to 1.00"; at most `most`.
 */
export function digitsForInterval(value: number | null | undefined, interval: readonly [number, number] | null | undefined, least = 3, most = 6): number {
  if (value === null || value === undefined || !Number.isFinite(value) || value === 0 || !interval) return least;
  const half = Math.abs(interval[1] - interval[0]) / 2;
  if (!(half > 0) || !Number.isFinite(half)) return least;
  // digitsForNoise counts decimals of a number near 1; scale the half-width to the value's leading digit.
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  const decimals = digitsForNoise(half / 10 ** exponent, most) ?? 0;
  return Math.min(most, Math.max(least, decimals + 1));
}

/** Most significant digits a value is printed with beside its interval. */
const INTERVAL_DIGITS = 5;

/**
 * A value and its 95 % interval in words, each with the digits the interval supports: "1.002 ×
 * 10⁻⁵" and "9.98 × 10⁻⁶ to 1.006 × 10⁻⁵". An interval too narrow for five digits to tell its
 * ends apart (noise-free data) is given as its relative half-width instead: "±0.0004 %".
 */
export function valueWithInterval(value: number, interval: readonly [number, number] | null | undefined): { value: string; interval: string | null } {
  if (!interval) return { value: sci(value, 3), interval: null };
  const digits = digitsForInterval(value, interval, 3, INTERVAL_DIGITS + 1);
  if (digits <= INTERVAL_DIGITS) return { value: sci(value, digits), interval: `${sci(interval[0], digits)} to ${sci(interval[1], digits)}` };
  const relative = (Math.abs(interval[1] - interval[0]) / 2 / Math.abs(value)) * 100;
  return { value: sci(value, INTERVAL_DIGITS), interval: relative < 1e-4 ? 'within ±0.0001 %' : `±${sig(relative, 1)} %` };
}

/** `value` in `factor` units with the decimals its uncertainty allows, else `fallback` decimals. */
export function byNoise(value: number | null | undefined, uncertainty: number | null | undefined, factor: number, fallback: number): string {
  const d = digitsForNoise(uncertainty === null || uncertainty === undefined ? null : Math.abs(uncertainty * factor));
  return fixed(value, d ?? fallback, factor);
}

/** A scan rate in V/s without a float tail: 0.009999999999999988 → "0.01"; three significant digits. */
export function scanRate(vPerS: number | null | undefined): string {
  return sig(vPerS, 3);
}
