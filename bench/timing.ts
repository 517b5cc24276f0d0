/** Timing helpers shared by the benches: warm up, then take the median of repeated runs. */
import { performance } from 'node:perf_hooks';

/** Median wall time of `fn` in ms over `repeats` runs after `warmup` unmeasured runs. */
export function medianMs(fn: () => unknown, repeats = 15, warmup = 3): number {
  for (let i = 0; i < warmup; i++) fn();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)] as number;
}
