/**
 * The whole-curve fit drawn as a pure function: every file of the series (the fitted cycle) as a
 * wide pale line, the model current at the fitted points as a thin line of the same colour, and
 * below them, on their own axis, the residuals (measured − model). Files are coloured in order of
 * scan rate. The fitted window is a shaded band; with drag mode 'window' a horizontal drag sets
 * it. Sign conventions as the trace plot: IUPAC (anodic up, E increasing to the right) or
 * polarographic (−i, E increasing to the left). Potentials are moved by `offsetV` from the
 * recording scale onto the display scale. No DOM, no Plotly import.
 */
import type { Data, Layout, Shape } from 'plotly.js';
import type { CycleRange } from '../../core/types';
import { chooseCurrentScale, maxAbs, type UnitScale } from './currentScale';
import { decimateMinMax } from './decimate';
import { baseFont, palette, sequentialColour } from './palette';

export interface FitFigureFile {
  name: string;
  scanRateVPerS: number | null;
  /** Recorded potential (V, recording scale) and current (A, IUPAC). */
  potentialV: Float64Array;
  currentA: Float64Array;
  cycles: CycleRange[];
}

export interface FitFigureInput {
  files: FitFigureFile[];
  /** Model current (A) at the fitted points (indices into each file's columns), in the order of `files`; null before a fit. */
  model: { indices: Int32Array; modelA: Float64Array }[] | null;
  /** 1-based cycle that was fitted. @default 1 */
  cycle?: number;
  /** Added to recorded potentials to put them on the display scale (V). */
  offsetV: number;
  scaleName: string;
  convention: 'iupac' | 'polarographic';
  /** Fitted window on the display scale (V); null: the whole cycle. */
  windowV: [number, number] | null;
  dragMode: 'zoom' | 'window';
  /** Most points drawn per line. @default 1500 */
  maxPoints?: number;
}

export interface FitFigure {
  data: Data[];
  layout: Partial<Layout>;
  scale: UnitScale;
  residualScale: UnitScale;
}

const fmtRate = (v: number | null) => (v === null ? 'v unknown' : `${Number(v.toPrecision(3))} V/s`);

export function buildFitFigure(input: FitFigureInput): FitFigure {
  const cycle = input.cycle ?? 1;
  const order = input.files.map((f, k) => k).sort((a, b) => (input.files[a]?.scanRateVPerS ?? 0) - (input.files[b]?.scanRateVPerS ?? 0));
  const ranges = input.files.map((f) => f.cycles.find((c) => c.index === cycle) ?? f.cycles[0] ?? { index: 1, start: 0, end: f.potentialV.length });
  const scale = chooseCurrentScale(Math.max(0, ...input.files.map((f, k) => maxAbs(f.currentA, ranges[k]?.start, ranges[k]?.end))));
  const residuals = input.model ? input.files.map((f, k) => residualOf(f, input.model?.[k])) : [];
  const residualLimitA = robustLimit(residuals.map((r) => r.y));
  const residualScale = chooseCurrentScale(residualLimitA);
  const sign = input.convention === 'polarographic' ? -1 : 1;
  const max = input.maxPoints ?? 1500;
  const data: Data[] = [];
  order.forEach((k, rank) => {
    const f = input.files[k] as FitFigureFile;
    // In order of scan rate on the sequential scale the series overlay uses.
    const colour = sequentialColour(order.length === 1 ? 0 : rank / (order.length - 1));
    const r = ranges[k] as CycleRange;
    const xy = decimateMinMax(f.potentialV, f.currentA, r.start, r.end, max);
    data.push({
      type: 'scatter', mode: 'lines', name: fmtRate(f.scanRateVPerS), legendgroup: f.name, x: xy.x.map((v) => v + input.offsetV), y: xy.y.map((a) => sign * a * scale.factor),
      line: { color: colour, width: 5 }, opacity: 0.35, hovertemplate: `${f.name} (measured)<br>E %{x:.4f} V<br>i %{y:.4g} ${scale.unit}<extra></extra>`,
    });
    const m = input.model?.[k];
    const res = residuals[k];
    if (!m || !res) return;
    const fitXy = decimateMinMax(res.x, m.modelA, 0, m.modelA.length, max);
    data.push({
      type: 'scatter', mode: 'lines', name: `fit, ${fmtRate(f.scanRateVPerS)}`, legendgroup: f.name, showlegend: false,
      x: fitXy.x.map((v) => v + input.offsetV), y: fitXy.y.map((a) => sign * a * scale.factor), line: { color: colour, width: 1.4 },
      hovertemplate: `${f.name} (fitted)<br>E %{x:.4f} V<br>i %{y:.4g} ${scale.unit}<extra></extra>`,
    });
    const resXy = decimateMinMax(res.x, res.y, 0, res.y.length, max);
    data.push({
      type: 'scatter', mode: 'lines', name: `residual, ${fmtRate(f.scanRateVPerS)}`, legendgroup: f.name, showlegend: false, xaxis: 'x', yaxis: 'y2',
      x: resXy.x.map((v) => v + input.offsetV), y: resXy.y.map((a) => sign * a * residualScale.factor), line: { color: colour, width: 1 },
      hovertemplate: `${f.name}: measured − fitted<br>E %{x:.4f} V<br>%{y:.3g} ${residualScale.unit}<extra></extra>`,
    });
  });
  const clipped = residuals.some((r) => maxAbs(r.y) > residualLimitA);
  return { data, layout: fitLayout(input, scale, input.model ? { scale: residualScale, limit: residualLimitA * residualScale.factor, clipped } : null), scale, residualScale };
}

/**
 * Half-height of the residual axis (A): 1.3 × the 99.5th percentile of |residual| over all files,
 * so that a single point (the vertex, where the charging current turns over within one sample)
 * does not flatten the rest; points beyond are drawn off scale and the axis title says so.
 */
function robustLimit(ys: Float64Array[]): number {
  const all = Float64Array.from(ys.flatMap((y) => Array.from(y, Math.abs))).sort();
  if (all.length === 0) return 0;
  const q = all[Math.min(all.length - 1, Math.floor(0.995 * all.length))] as number;
  return 1.3 * q || (all[all.length - 1] as number);
}

/** Potential (recorded) and measured − model current at the fitted points. */
function residualOf(f: FitFigureFile, m: { indices: Int32Array; modelA: Float64Array } | undefined): { x: Float64Array; y: Float64Array } {
  if (!m) return { x: new Float64Array(0), y: new Float64Array(0) };
  const x = new Float64Array(m.indices.length);
  const y = new Float64Array(m.indices.length);
  m.indices.forEach((i, k) => {
    x[k] = f.potentialV[i] as number;
    y[k] = (f.currentA[i] as number) - (m.modelA[k] as number);
  });
  return { x, y };
}

interface ResidualAxis {
  scale: UnitScale;
  /** Half-height of the axis in the shown unit. */
  limit: number;
  clipped: boolean;
}

function fitLayout(input: FitFigureInput, scale: UnitScale, residual: ResidualAxis | null): Partial<Layout> {
  const polarographic = input.convention === 'polarographic';
  const axis = { gridcolor: palette.grid, showline: true, linecolor: palette.ink, ticks: 'outside' as const, mirror: true };
  const shapes: Partial<Shape>[] = input.windowV ? [{
    type: 'rect', xref: 'x', yref: 'paper', x0: input.windowV[0], x1: input.windowV[1], y0: 0, y1: 1, line: { width: 0 }, fillcolor: 'rgba(27, 94, 112, 0.08)', layer: 'below',
  }] : [];
  return {
    font: baseFont, paper_bgcolor: '#ffffff', plot_bgcolor: palette.plotBackground,
    margin: { l: 64, r: 16, t: 28, b: 48 }, showlegend: true,
    legend: { orientation: 'h', x: 0, y: 1.02, yanchor: 'bottom', font: { size: 11 }, title: { text: 'scan rate' } },
    xaxis: { ...axis, anchor: residual ? 'y2' : 'y', title: { text: `E vs ${input.scaleName} / V` }, autorange: polarographic ? 'reversed' : true, zeroline: false },
    yaxis: { ...axis, domain: residual ? [0.36, 1] : [0, 1], title: { text: polarographic ? `−i / ${scale.unit}` : `i / ${scale.unit}` }, zeroline: true, zerolinecolor: '#b9bcb2' },
    ...(residual ? {
      yaxis2: {
        ...axis, domain: [0, 0.28], anchor: 'x', ...(residual.limit > 0 ? { range: [-residual.limit, residual.limit] } : {}), zeroline: true, zerolinecolor: '#8d948a',
        title: { text: `residual / ${residual.scale.unit}` },
      },
      annotations: residual.clipped ? [{
        xref: 'paper', yref: 'paper', x: 1, y: 0.28, xanchor: 'right', yanchor: 'bottom', showarrow: false, text: 'a few residuals lie off this scale', font: { size: 10, color: palette.ink },
      }] : [],
    } : {}),
    dragmode: input.dragMode === 'window' ? 'select' : 'zoom', selectdirection: 'h', hovermode: 'closest', shapes,
    uirevision: `${input.files.map((f) => f.name).join('|')}|${input.convention}`,
  };
}
