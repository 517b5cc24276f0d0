/**
 * Loads Plotly's basic bundle once (its own same-origin chunk). `preloadPlotly` starts the load at
 * app start, so the bundle is evaluated while the workers start, before the first files' answers.
 */
import type PlotlyBasic from 'plotly.js-basic-dist-min';

export type PlotlyApi = typeof PlotlyBasic;
let plotlyLoading: Promise<PlotlyApi> | null = null;

export function loadPlotly(): Promise<PlotlyApi> {
  // The bundle is CommonJS: the API is the default export (or the module itself in some loaders).
  plotlyLoading ??= import('plotly.js-basic-dist-min').then((m) => ((m as { default?: PlotlyApi }).default ?? (m as unknown as PlotlyApi)));
  return plotlyLoading;
}

export function preloadPlotly(): void {
  void loadPlotly().catch(() => undefined);
}
