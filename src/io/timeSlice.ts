/**
 * Cooperative time slicing for long imports: `maybeYield()` gives the event loop a turn only
 * when `sliceMs` have passed since the last turn, so a hundred small files do not each pay a
 * timer delay (browsers clamp nested zero-delay timers to about 4 ms), while a big file still lets
 * progress and cancel messages through.
 */
export function createYielder(sliceMs = 16): () => Promise<void> {
  let last = performance.now();
  return async () => {
    if (performance.now() - last < sliceMs) return;
    await new Promise<void>((resolve) => setTimeout(resolve, 0));
    last = performance.now();
  };
}
