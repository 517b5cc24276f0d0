import { useRef } from 'react';

/** A value and the time it was taken (ms, on the clock `useHeldWhile` is given). */
export interface Held<T> {
  value: T;
  at: number;
}

/**
 * The value to show at time `t`: `value` when nothing is held, when `hold` is false, or when the
 * held one is `everyMs` old; otherwise the held one, unchanged.
 */
export function heldValue<T>(held: Held<T> | null, hold: boolean, value: T, everyMs: number, t: number): Held<T> {
  return !hold || held === null || t - held.at >= everyMs ? { value, at: t } : held;
}

/**
 * `value`, but while `hold` is true only refreshed once every `everyMs`: a view that would be
 * drawn again for every file of a reading (the results table, whose rows re-sort and whose
 * columns are measured again as each file lands) is redrawn about once a second, and at once
 * when the reading ends. The first value is taken at once.
 */
export function useHeldWhile<T>(hold: boolean, value: T, everyMs: number, now: () => number = () => performance.now()): T {
  const held = useRef<Held<T> | null>(null);
  // A ref written while rendering: the held value is a cache of `value`, the same whichever
  // render of a pair React keeps, so it needs no effect and costs no extra render.
  held.current = heldValue(held.current, hold, value, everyMs, now());
  return held.current.value;
}
