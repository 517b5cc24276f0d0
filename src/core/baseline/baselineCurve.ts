/**
 * Shared helpers of the baseline methods: input checks and sampling a baseline function over the
 * points it spans, so every method returns the exact curve that is subtracted.
 */
import { AnalysisError } from '../errors';
import type { BaselineAnchor, BaselineCurve, BaselineMethod } from './baselineTypes';

/** Potential and current columns of a voltammogram (V, A with IUPAC sign). */
export interface BaselineTrace {
  potentialV: ArrayLike<number>;
  currentA: ArrayLike<number>;
}

/** Throws unless [start, end) is a valid, non-empty point range of a column of length n. */
export function assertRange(name: string, start: number, end: number, n: number, minLength = 1): void {
  if (!Number.isInteger(start) || !Number.isInteger(end) || start < 0 || end > n || end - start < minLength) {
    throw new AnalysisError(
      end - start < minLength && start >= 0 && end <= n ? 'TOO_FEW_POINTS' : 'OUT_OF_RANGE',
      `${name} [${start}, ${end}) must hold at least ${minLength} points inside [0, ${n})`,
    );
  }
}

/** Throws NON_FINITE when a point of the range is NaN or infinite. */
export function assertFinitePoints(trace: BaselineTrace, start: number, end: number): void {
  for (let i = start; i < end; i++) {
    if (!Number.isFinite(trace.potentialV[i] as number) || !Number.isFinite(trace.currentA[i] as number)) {
      throw new AnalysisError('NON_FINITE', `baseline fit window contains a non-finite point at index ${i}`);
    }
  }
}

/** Anchor at data point `index`. */
export function anchorAt(trace: BaselineTrace, index: number): BaselineAnchor {
  return { potentialV: trace.potentialV[index] as number, currentA: trace.currentA[index] as number, index };
}

/** Evaluates `f(index)` on every point of [spanStart, spanEnd) and packages the curve. */
export function sampleBaseline(
  potentialV: ArrayLike<number>,
  spanStart: number,
  spanEnd: number,
  f: (index: number) => number,
  meta: { method: BaselineMethod; anchors: BaselineAnchor[]; description: string },
): BaselineCurve {
  const n = spanEnd - spanStart;
  const e = new Float64Array(n);
  const i = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    e[k] = potentialV[spanStart + k] as number;
    i[k] = f(spanStart + k);
  }
  return { ...meta, potentialV: e, currentA: i, startIndex: spanStart, endIndex: spanEnd };
}

/** Baseline current at voltammogram point `index`, or null when the curve does not span it. */
export function baselineAt(curve: BaselineCurve, index: number): number | null {
  if (index < curve.startIndex || index >= curve.endIndex) return null;
  return curve.currentA[index - curve.startIndex] as number;
}

/** Formats a potential in mV for descriptions. */
export function formatMv(potentialV: number): string {
  return `${(potentialV * 1000).toFixed(1)} mV`;
}
