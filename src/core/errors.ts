/**
 * Typed errors of the numeric core. Every failure the core can foresee carries a stable `code`
 * so that the worker, the store and the CLI can pass it on without parsing messages.
 */
export type AnalysisErrorCode =
  | 'EMPTY_INPUT'
  | 'LENGTH_MISMATCH'
  | 'NON_FINITE'
  | 'BAD_OPTION'
  | 'NOT_CONVERGED'
  | 'OUT_OF_RANGE'
  | 'TOO_FEW_POINTS'
  | 'NO_PEAK'
  | 'UNKNOWN_REFERENCE'
  | 'CANCELLED';

export class AnalysisError extends Error {
  readonly code: AnalysisErrorCode;
  constructor(code: AnalysisErrorCode, message: string) {
    super(message);
    this.name = 'AnalysisError';
    this.code = code;
  }
}

/** Throws BAD_OPTION unless `value` is a finite number inside [min, max]. */
export function assertFiniteInRange(
  name: string,
  value: number,
  min = -Infinity,
  max = Infinity,
): asserts value is number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < min || value > max) {
    throw new AnalysisError('BAD_OPTION', `${name} must be ${describeRange(min, max)}, got ${String(value)}`);
  }
}

/** "a finite number above 0", "… from 1 to 12", "… at least 0" — the range in words. */
function describeRange(min: number, max: number): string {
  const low = min === Number.MIN_VALUE ? 'above 0' : `at least ${min}`;
  if (max === Infinity) return min === -Infinity ? 'a finite number' : `a finite number ${low}`;
  if (min === -Infinity) return `a finite number at most ${max}`;
  return min === Number.MIN_VALUE ? `a finite number above 0 and at most ${max}` : `a finite number from ${min} to ${max}`;
}

/** Throws LENGTH_MISMATCH / EMPTY_INPUT unless the columns are equally long and non-empty. */
export function assertSameLength(columns: Record<string, ArrayLike<number>>, minLength = 1): void {
  const entries = Object.entries(columns);
  const first = entries[0];
  if (!first) return;
  const n = first[1].length;
  for (const [name, col] of entries) {
    if (col.length !== n) {
      throw new AnalysisError('LENGTH_MISMATCH', `${name} has ${col.length} points, ${first[0]} has ${n}`);
    }
  }
  if (n < minLength) {
    throw new AnalysisError(n === 0 ? 'EMPTY_INPUT' : 'TOO_FEW_POINTS', `need at least ${minLength} points, got ${n}`);
  }
}
