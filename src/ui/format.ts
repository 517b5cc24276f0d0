/** Number formatting for tables: fixed decimals per quantity, a dash for missing values. */
export const DASH = '—';

export function fixed(value: number | null | undefined, digits: number, factor = 1): string {
  return value === null || value === undefined || !Number.isFinite(value) ? DASH : (value * factor).toFixed(digits);
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
