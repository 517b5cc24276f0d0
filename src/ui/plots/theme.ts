/**
 * Light and dark plots from one figure: the builders draw in the light palette; for the dark
 * theme the layout's paper, plot, font, grid and axis colours and the few trace colours that
 * would vanish on a dark ground (ink, fit, theory) are swapped. Pure.
 */
import type { Data, Layout } from 'plotly.js';
import { palette } from './palette';

export type ColorScheme = 'light' | 'dark';

const DARK = { paper: '#1a2227', plot: '#20292f', ink: '#dfe6e9', grid: '#34424a' };

/** Light-palette colours replaced in dark plots. */
const SWAP: Record<string, string> = {
  [palette.ink]: DARK.ink, [palette.fit]: '#c9d2d6', [palette.theory]: '#f2f2f2', [palette.companion]: '#5d6d75', [palette.baseline]: '#c2c27a',
};

export function themedLayout(layout: Partial<Layout>, scheme: ColorScheme): Partial<Layout> {
  if (scheme === 'light') return layout;
  const axis = (a: Partial<Layout['xaxis']>) => ({ ...a, gridcolor: DARK.grid, linecolor: DARK.ink, zerolinecolor: DARK.grid, color: DARK.ink });
  const out: Partial<Layout> = { ...layout, paper_bgcolor: DARK.paper, plot_bgcolor: DARK.plot, font: { ...layout.font, color: DARK.ink } };
  if (layout.xaxis) out.xaxis = axis(layout.xaxis);
  if (layout.yaxis) out.yaxis = axis(layout.yaxis);
  if (layout.yaxis2) out.yaxis2 = axis(layout.yaxis2);
  return out;
}

/** Trace colours for the scheme (line and marker colours named in SWAP). */
export function themedData(data: Data[], scheme: ColorScheme): Data[] {
  if (scheme === 'light') return data;
  const swap = (c: unknown) => (typeof c === 'string' && c in SWAP ? SWAP[c] : c);
  return data.map((d) => {
    const t = d as { line?: { color?: unknown }; marker?: { color?: unknown } };
    return { ...d, ...(t.line ? { line: { ...t.line, color: swap(t.line.color) } } : {}), ...(t.marker ? { marker: { ...t.marker, color: swap(t.marker.color) } } : {}) } as Data;
  });
}
