/** Smoothing setting; `window` is an odd point count, `order` < window. */
export interface SmoothingSetting {
  window: number;
  order: number;
}

