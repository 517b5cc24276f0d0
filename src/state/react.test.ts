/**
 * How components hear of store changes (react.ts): once per frame, and while files are being
 * read at most once per READING_FRAME_MS, with the last change after the reading drawn at the
 * next frame. Timers are Vitest's fake ones (no animation frames in Node: a frame is a 16 ms timer).
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createStore, type StoreApi } from 'zustand/vanilla';
import { framedStore, insideControlEvent, READING_FRAME_MS } from './react';
import type { HalfwaveState } from './types';

interface Probe {
  importBatch: { done: number; total: number } | null;
  count: number;
}

function probeStore(userAction = () => false) {
  const store = createStore<Probe>()(() => ({ importBatch: null, count: 0 }));
  const framed = framedStore(store as unknown as StoreApi<HalfwaveState>, userAction);
  const heard = vi.fn();
  framed.subscribe(heard);
  const bump = () => store.setState((s) => ({ count: s.count + 1 }));
  return { store, heard, bump };
}

beforeEach(() => {
  vi.useFakeTimers();
});
afterEach(() => {
  vi.useRealTimers();
});

describe('store changes reach components', () => {
  it('many changes in one frame are heard once, at the frame', () => {
    const { heard, bump } = probeStore();
    for (let k = 0; k < 5; k++) bump();
    expect(heard).not.toHaveBeenCalled();
    vi.advanceTimersByTime(16);
    expect(heard).toHaveBeenCalledTimes(1);
  });

  it('while files are read, changes are heard at most once per reading interval', () => {
    const { store, heard, bump } = probeStore();
    store.setState({ importBatch: { done: 0, total: 3 } });
    vi.advanceTimersByTime(16);
    expect(heard).toHaveBeenCalledTimes(1);
    // A change every frame for one interval: heard once more, at the interval's end.
    for (let t = 0; t < READING_FRAME_MS - 32; t += 16) {
      bump();
      vi.advanceTimersByTime(16);
    }
    expect(heard).toHaveBeenCalledTimes(1);
    vi.advanceTimersByTime(32 + 16);
    expect(heard).toHaveBeenCalledTimes(2);
  });

  it('the end of the reading is heard at the next frame, not at the end of the interval', () => {
    const { store, heard, bump } = probeStore();
    store.setState({ importBatch: { done: 0, total: 1 } });
    vi.advanceTimersByTime(16);
    bump();
    vi.advanceTimersByTime(16);
    expect(heard).toHaveBeenCalledTimes(1);
    store.setState({ importBatch: null });
    vi.advanceTimersByTime(16);
    expect(heard).toHaveBeenCalledTimes(2);
    vi.advanceTimersByTime(READING_FRAME_MS);
    expect(heard).toHaveBeenCalledTimes(2);
  });

  it('a change made by a user\'s action on a control is heard at once, even while files are read, and takes what waited with it', () => {
    let clicking = false;
    const { store, heard, bump } = probeStore(() => clicking);
    store.setState({ importBatch: { done: 0, total: 3 } });
    vi.advanceTimersByTime(16);
    expect(heard).toHaveBeenCalledTimes(1);
    bump();
    clicking = true;
    bump();
    clicking = false;
    expect(heard).toHaveBeenCalledTimes(2);
    // Nothing was left waiting.
    vi.advanceTimersByTime(READING_FRAME_MS * 2);
    expect(heard).toHaveBeenCalledTimes(2);
  });
});

describe('insideControlEvent', () => {
  it('is false outside any event (a worker answer comes in a promise continuation)', () => {
    expect(insideControlEvent()).toBe(false);
  });
});
