/**
 * Halfwave's plot colours. Categorical colours come from the Okabe–Ito set (M. Okabe, K. Ito,
 * "Color Universal Design", 2008), which stays distinguishable for the common colour-vision
 * deficiencies; anodic and cathodic differ in colour and in marker shape. Scan-rate overlays use
 * a sequential scale sampled from viridis (S. van der Walt, N. Smith, matplotlib colormaps, 2015),
 * which is monotonic in lightness. Colours are for the light theme; theme.ts maps them for dark.
 */
export const palette = {
  ink: '#1d2a33',
  grid: '#e2e4de',
  plotBackground: '#fcfcfa',
  /** Trace colours for successive cycles / files (ink first, then Okabe–Ito). */
  traces: ['#1d2a33', '#E69F00', '#56B4E9', '#7f7f7f', '#009E73', '#CC79A7', '#0072B2', '#D55E00'],
  smoothed: '#CC79A7',
  baseline: '#6b6b3a',
  anodic: '#D55E00',
  cathodic: '#0072B2',
  anodicWindow: 'rgba(213, 94, 0, 0.10)',
  cathodicWindow: 'rgba(0, 114, 178, 0.10)',
  /** The usable potential window of the electrode in its medium (a light band over that range). */
  workingWindow: 'rgba(0, 158, 115, 0.07)',
  /** Where a sweep ends in a current still rising steeply (breakdown or catalysis at the window edge). */
  windowEdge: 'rgba(90, 90, 90, 0.13)',
  /** Isolated bad points left out of the analysis. */
  spike: '#9a3b2e',
  fit: '#444444',
  fitBand: 'rgba(68, 68, 68, 0.16)',
  theory: '#111111',
  companion: '#a7b4b9',
} as const;

export const markers = {
  anodic: 'triangle-up',
  cathodic: 'triangle-down',
} as const;

export function traceColour(k: number): string {
  return palette.traces[k % palette.traces.length] as string;
}

/** viridis at 0, 0.1, …, 1 (from memory of the published table; checked for monotonic lightness in palette.test.ts). */
export const VIRIDIS = ['#440154', '#482475', '#414487', '#355F8D', '#2A788E', '#21918C', '#22A884', '#44BF70', '#7AD151', '#BDDF26', '#FDE725'];

/** Colour at t ∈ [0, 1] on viridis, kept to [0, 0.85] so the lightest end still reads on white. */
export function sequentialColour(t: number): string {
  const u = Math.min(1, Math.max(0, t)) * 0.85 * (VIRIDIS.length - 1);
  const k = Math.min(VIRIDIS.length - 2, Math.floor(u));
  const a = hexToRgb(VIRIDIS[k] as string);
  const b = hexToRgb(VIRIDIS[k + 1] as string);
  const f = u - k;
  return `#${a.map((c, i) => Math.round(c + (((b[i] as number) - c) * f)).toString(16).padStart(2, '0')).join('')}`;
}

export function hexToRgb(hex: string): [number, number, number] {
  const h = hex.replace('#', '');
  return [0, 2, 4].map((i) => parseInt(h.slice(i, i + 2), 16)) as [number, number, number];
}

export const baseFont = { family: 'system-ui, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif', size: 12, color: palette.ink };
