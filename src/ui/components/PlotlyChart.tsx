/**
 * Plotly host. Plotly (its basic bundle: scatter lines and markers, all this app draws) is loaded
 * once, on its own same-origin chunk, started early by `preloadPlotly` so it parses while the
 * workers read the first files; updates go through Plotly.react. Only SVG trace types are used.
 * The toolbar holds only the view tools this app needs (zoom, pan, zoom in/out, reset): no image,
 * sharing or cloud entries (the app's own export buttons make publication-size PNG and SVG).
 */
import type { Config, Data, Layout, PlotlyHTMLElement, PlotSelectionEvent } from 'plotly.js';
import { useEffect, useRef, useState } from 'react';
import { loadPlotly } from '../plotlyLoader';
import { themedData, themedLayout } from '../plots/theme';
import { useColorScheme } from '../useColorScheme';

const config: Partial<Config> = {
  displaylogo: false,
  responsive: true,
  scrollZoom: false,
  modeBarButtons: [['zoom2d', 'pan2d', 'zoomIn2d', 'zoomOut2d', 'resetScale2d']],
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
  const scheme = useColorScheme();
  onSelect.current = onRangeSelect;

  useEffect(() => {
    let alive = true;
    loadPlotly()
      .then(async (Plotly) => {
        const el = host.current;
        if (!alive || !el) return;
        const gd = (await Plotly.react(el, themedData(data, scheme), themedLayout(layout, scheme), config)) as PlotlyHTMLElement & { removeAllListeners?: (e: string) => void };
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
  }, [data, layout, scheme]);

  useEffect(() => {
    const el = host.current;
    return () => {
      if (el) void loadPlotly().then((Plotly) => Plotly.purge(el));
    };
  }, []);

  if (failed) return <p className="error-text" role="alert">The plot could not be drawn: {failed}</p>;
  // A figure, not an image: it holds the (focusable) toolbar buttons.
  return <div ref={host} className="plot-host" data-testid={testId} role="figure" aria-label={label} />;
}
