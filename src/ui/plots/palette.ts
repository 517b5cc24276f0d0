/** Halfwave's own colours and marker codes for plots (chosen for contrast on a light background). */
export const palette = {
  ink: '#1d2a33',
  grid: '#e2e4de',
  plotBackground: '#fcfcfa',
  /** Trace colours for successive cycles / files. */
  traces: ['#1b5e70', '#8a4f9e', '#4f7a28', '#b0632b', '#2f4f9e', '#8c3b4a', '#5b6b73', '#a08419'],
  smoothed: '#d08b12',
  baseline: '#6b6b3a',
  anodic: '#b4461a',
  cathodic: '#2b47a0',
  anodicWindow: 'rgba(180, 70, 26, 0.10)',
  cathodicWindow: 'rgba(43, 71, 160, 0.10)',
  fit: '#444444',
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

export const baseFont = { family: 'system-ui, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif', size: 12, color: palette.ink };
