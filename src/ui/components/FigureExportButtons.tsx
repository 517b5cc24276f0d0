/** PNG and SVG buttons for one figure (publication size, made in the page). */
import type { Data, Layout } from 'plotly.js';
import { useState } from 'react';
import { halfwaveActions } from '../../state/react';
import { downloadFigure } from '../figureExport';

export interface FigureExportProps {
  figure: { data: Data[]; layout: Partial<Layout> } | null;
  /** File name without extension. */
  baseName: string;
  /** What the figure shows, in words. */
  what: string;
  testId: string;
}

export function FigureExportButtons({ figure, baseName, what, testId }: FigureExportProps) {
  const [busy, setBusy] = useState(false);
  const run = async (format: 'png' | 'svg') => {
    if (!figure) return;
    setBusy(true);
    try {
      await downloadFigure(figure.data, figure.layout, format, baseName);
    } catch (err) {
      halfwaveActions().setView({ notice: `Could not make the ${format.toUpperCase()} of ${what}: ${(err as Error).message}` });
    } finally {
      setBusy(false);
    }
  };
  return (
    <span className="figure-export" role="group" aria-label={`Save ${what}`}>
      <button type="button" disabled={!figure || busy} data-testid={`${testId}-png`} title={`${what} as PNG, 160 × 120 mm at 300 dpi`} onClick={() => void run('png')}>PNG</button>
      <button type="button" disabled={!figure || busy} data-testid={`${testId}-svg`} title={`${what} as SVG`} onClick={() => void run('svg')}>SVG</button>
    </span>
  );
}
