/**
 * Plotly host. Plotly is loaded on first use (its own chunk, same origin) so the first paint does
 * not wait for it; updates go through Plotly.react. Only SVG trace types are used (no WebGL).
 */
import type PlotlyDefault from 'plotly.js-dist-min';
import type { Config, Data, Layout, PlotlyHTMLElement, PlotSelectionEvent } from 'plotly.js-dist-min';
import { useEffect, useRef, useState } from 'react';

type PlotlyApi = typeof PlotlyDefault;
let plotlyLoading: Promise<PlotlyApi> | null = null;

function loadPlotly(): Promise<PlotlyApi> {
  // The bundle is CommonJS: the API is the default export (or the module itself in some loaders).
  plotlyLoading ??= import('plotly.js-dist-min').then((m) => (m.default ?? (m as unknown as PlotlyApi)));
  return plotlyLoading;
}

const config: Partial<Config> = {
  displaylogo: false,
  responsive: true,
  scrollZoom: false,
  modeBarButtonsToRemove: ['lasso2d', 'select2d', 'autoScale2d'],
  toImageButtonOptions: { format: 'svg', filename: 'halfwave-plot' },
};

export interface PlotlyChartProps {
  data: Data[];
  layout: Partial<Layout>;
  testId: string;
  label: string;
  /** Called with the potential range of a horizontal drag-select. */
  onRangeSelect?: (fromX: number, toX: number) => void;
}

export function PlotlyChart({ data, layout, testId, label, onRangeSelect }: PlotlyChartProps) {
  const host = useRef<HTMLDivElement>(null);
  const onSelect = useRef(onRangeSelect);
  const [failed, setFailed] = useState<string | null>(null);
  onSelect.current = onRangeSelect;

  useEffect(() => {
    let alive = true;
    loadPlotly()
      .then(async (Plotly) => {
        const el = host.current;
        if (!alive || !el) return;
        const gd = (await Plotly.react(el, data, layout, config)) as PlotlyHTMLElement & { removeAllListeners?: (e: string) => void };
        gd.removeAllListeners?.('plotly_selected');
        gd.on('plotly_selected', (ev: PlotSelectionEvent) => {
          const range = ev?.range?.x;
          if (range && range.length === 2) onSelect.current?.(Number(range[0]), Number(range[1]));
        });
        el.dataset.renders = String(Number(el.dataset.renders ?? '0') + 1);
      })
      .catch((err: unknown) => alive && setFailed((err as Error).message));
    return () => {
      alive = false;
    };
  }, [data, layout]);

  useEffect(() => {
    const el = host.current;
    return () => {
      if (el) void loadPlotly().then((Plotly) => Plotly.purge(el));
    };
  }, []);

  if (failed) return <p className="error-text" role="alert">The plot could not be drawn: {failed}</p>;
  return <div ref={host} className="plot-host" data-testid={testId} role="img" aria-label={label} />;
}
