/**
 * Turns one voltammogram and its analysis into Plotly data and layout: the measured trace per
 * cycle, optional smoothed curve, the baselines exactly as subtracted, and peak markers with a
 * stem from baseline to peak (the drawn ip). Sign conventions: IUPAC plots i with anodic up on
 * a potential axis increasing to the right; the polarographic choice plots −i (cathodic up) on
 * a potential axis increasing to the left. Isolated bad points the analysis left out are marked
 * with a cross, and the stretch where a sweep ends in a steeply rising current (the window edge)
 * is shaded grey. Pure: no DOM, no Plotly import.
 */
import type { Annotations, Data, Layout, Shape } from 'plotly.js';
import type { VoltammogramAnalysis } from '../../core/analysis/types';
import type { PeakResult, PeakWindow } from '../../core/peaks/peakTypes';
import type { CycleRange } from '../../core/types';
import { chooseCurrentScale, maxAbs, type UnitScale } from './currentScale';
import { decimateMinMax } from './decimate';
import { baseFont, markers, palette, traceColour } from './palette';

export interface TraceFigureInput {
  fileName: string;
  /** Potentials as analysed, on the display scale (V). */
  potentialV: Float64Array;
  /** The current analysed: as recorded, or less the blank named in `blank`. */
  currentA: Float64Array;
  /** When a blank was subtracted: its name and the current as recorded, drawn faintly behind. @default null */
  blank?: { name: string; recordedA: Float64Array } | null;
  cycles: CycleRange[];
  /** The analysis of the shown potentials (its potentials on the display scale). */
  analysis: VoltammogramAnalysis | null;
  /** 1-based cycle, or 0 for all. */
  cycle: number;
  convention: 'iupac' | 'polarographic';
  showSmoothed: boolean;
  showBaselines: boolean;
  dragMode: 'zoom' | 'window';
  peakWindows: PeakWindow[];
  /**
   * Added to potentials on the file's recording scale (peak windows, the theory overlay, the other
   * files of the series) to put them on the display scale (V).
   */
  recordingOffsetV: number;
  /** e.g. "E vs SCE / V". */
  potentialAxisTitle: string;
  /** 'density' when currentA holds A/cm² (the file stated no area): the axis then reads j. @default 'current' */
  currentKind?: 'current' | 'density';
  /** Simulated voltammogram to overlay (files' scale, IUPAC), with its legend text. */
  theory?: { potentialV: Float64Array; currentA: Float64Array; label: string } | null;
  /** Other voltammograms of the same series drawn thinly behind (same cycle), for comparison. */
  companions?: { name: string; potentialV: Float64Array; currentA: Float64Array; cycles: CycleRange[] }[];
  /** Most points drawn per trace. @default 6000 */
  maxPoints?: number;
  /**
   * Usable potential window of the electrode in its medium, on the display scale (V), drawn as a
   * band behind the trace with its limits marked; a null limit leaves that side open.
   */
  workingWindow?: { lowerV: number | null; upperV: number | null; lowerLabel: string; upperLabel: string } | null;
}

export interface TraceFigure {
  data: Data[];
  layout: Partial<Layout>;
  scale: UnitScale;
}

export function buildTraceFigure(input: TraceFigureInput): TraceFigure {
  const cycles = input.cycle === 0 ? input.cycles : input.cycles.filter((c) => c.index === input.cycle);
  const companions = (input.companions ?? []).map((c) => ({ ...c, range: pickCycle(c.cycles, input.cycle) }));
  const blank = input.blank ?? null;
  const scale = chooseCurrentScale(Math.max(0, ...cycles.map((c) => maxAbs(input.currentA, c.start, c.end)),
    ...(blank ? cycles.map((c) => maxAbs(blank.recordedA, c.start, c.end)) : []),
    ...companions.map((c) => (c.range ? maxAbs(c.currentA, c.range.start, c.range.end) : 0))));
  const sign = input.convention === 'polarographic' ? -1 : 1;
  const tx = (v: number) => v + input.recordingOffsetV;
  const same = (v: number) => v;
  const ty = (a: number) => sign * a * scale.factor;
  const data: Data[] = [];
  companions.forEach((c, k) => {
    if (!c.range) return;
    const xy = decimateMinMax(c.potentialV, c.currentA, c.range.start, c.range.end, 1500, tx, ty);
    // One legend entry for all of them; hovering names each file.
    data.push({
      type: 'scatter', mode: 'lines', name: 'other files of the series', legendgroup: 'series', showlegend: k === 0, x: xy.x, y: xy.y,
      line: { color: palette.companion, width: 1 }, hovertemplate: `${c.name}<br>E %{x:.4f} V<br>i %{y:.4g}<extra></extra>`,
    });
  });
  if (blank) {
    // What was recorded, before the blank was taken off: the picks below are on the current less the blank.
    cycles.forEach((c, k) => data.push({
      ...line({ ...input, currentA: blank.recordedA }, c.start, c.end, `as recorded (before ${blank.name})`, palette.companion, same, ty, 1),
      legendgroup: 'recorded', showlegend: k === 0,
    }));
  }
  cycles.forEach((c, k) => data.push(line(input, c.start, c.end, blank ? `cycle ${c.index}, less the blank` : `cycle ${c.index}`, traceColour(k), same, ty)));
  const smoothed = input.analysis?.smoothed;
  if (input.showSmoothed && smoothed) {
    for (const c of cycles) {
      data.push(line({ ...input, currentA: smoothed.currentA }, c.start, c.end, `smoothed, cycle ${c.index}`, palette.smoothed, same, ty, 1.2));
    }
  }
  if (input.theory) {
    const t = input.theory;
    const xy = decimateMinMax(t.potentialV, t.currentA, 0, t.potentialV.length, input.maxPoints ?? 6000, tx, ty);
    data.push({
      type: 'scatter', mode: 'lines', name: t.label, x: xy.x, y: xy.y,
      line: { color: palette.theory, width: 1.6, dash: 'dot' }, hovertemplate: 'theory<br>E %{x:.4f} V<br>i %{y:.4g}<extra></extra>',
    });
  }
  const shown = new Set(cycles.map((c) => c.index));
  const peaks = (input.analysis?.cycles ?? []).filter((c) => shown.has(c.index)).flatMap((c) => c.peaks);
  if (input.showBaselines) data.push(...peaks.map((p, k) => baselineTrace(p, k === 0, same, ty)));
  data.push(...(['anodic', 'cathodic'] as const).map((d) => peakTrace(peaks.filter((p) => p.direction === d), d, same, ty, scale)));
  const spikes = (input.analysis?.spikes ?? []).filter((p) => cycles.some((c) => p.index >= c.start && p.index < c.end));
  if (spikes.length) {
    data.push({
      type: 'scatter', mode: 'markers', name: `left-out points (${spikes.length})`, x: spikes.map((p) => p.potentialV), y: spikes.map((p) => ty(p.currentA)),
      marker: { symbol: 'x-thin-open', size: 9, color: palette.spike, line: { width: 1.5, color: palette.spike } },
      hovertemplate: 'left out: an isolated bad point<br>E %{x:.4f} V<br>i %{y:.4g}<extra></extra>',
    });
  }
  return { data, layout: traceLayout(input, scale, tx), scale };
}

type Map1 = (v: number) => number;

/** The companion's range for the shown cycle (its first cycle when "all" is shown). */
function pickCycle(cycles: CycleRange[], cycle: number): CycleRange | undefined {
  return cycle === 0 ? cycles[0] : cycles.find((c) => c.index === cycle);
}

function line(input: TraceFigureInput, start: number, end: number, name: string, color: string, tx: Map1, ty: Map1, width = 1.6): Data {
  const xy = decimateMinMax(input.potentialV, input.currentA, start, end, input.maxPoints ?? 6000, tx, ty);
  return {
    type: 'scatter', mode: 'lines', name, x: xy.x, y: xy.y,
    line: { color, width }, hovertemplate: 'E %{x:.4f} V<br>i %{y:.4g}<extra>%{fullData.name}</extra>',
  };
}

function baselineTrace(p: PeakResult, first: boolean, tx: Map1, ty: Map1): Data {
  const b = p.baseline;
  return {
    type: 'scatter', mode: 'lines', name: 'baseline (as subtracted)', legendgroup: 'baseline', showlegend: first,
    x: Array.from(b.potentialV, tx), y: Array.from(b.currentA, ty),
    line: { color: palette.baseline, width: 1.3, dash: 'dash' }, hovertemplate: `${b.method} baseline<extra></extra>`,
  };
}

function peakTrace(peaks: PeakResult[], direction: 'anodic' | 'cathodic', tx: Map1, ty: Map1, scale: UnitScale): Data {
  // Stems from baseline to peak: pairs of points separated by nulls (gaps) in one trace.
  const x: (number | null)[] = [];
  const y: (number | null)[] = [];
  for (const p of peaks) {
    x.push(tx(p.potentialV), tx(p.potentialV), null);
    y.push(ty(p.baselineCurrentA), ty(p.rawCurrentA), null);
  }
  const color = direction === 'anodic' ? palette.anodic : palette.cathodic;
  return {
    type: 'scatter', mode: 'lines+markers', name: direction === 'anodic' ? 'anodic peaks (Epa, ipa)' : 'cathodic peaks (Epc, ipc)',
    x, y, connectgaps: false, line: { color, width: 1.5 },
    marker: { symbol: [...peaks.flatMap(() => ['line-ew', markers[direction], 'circle'])], size: peaks.flatMap(() => [8, 11, 0]), color },
    customdata: peaks.flatMap((p) => [p.heightA * scale.factor, p.heightA * scale.factor, null]),
    hovertemplate: `Ep %{x:.4f} V<br>ip %{customdata:.4g} ${scale.unit}<extra>${direction}</extra>`,
  } as Data;
}

function traceLayout(input: TraceFigureInput, scale: UnitScale, tx: Map1): Partial<Layout> {
  const polarographic = input.convention === 'polarographic';
  const shapes: Partial<Shape>[] = [...workingWindowShapes(input), ...windowEdgeShapes(input), ...input.peakWindows.map((w): Partial<Shape> => ({
    type: 'rect', xref: 'x', yref: 'paper', x0: tx(w.fromV), x1: tx(w.toV), y0: 0, y1: 1, line: { width: 0 },
    fillcolor: w.direction === 'anodic' ? palette.anodicWindow : palette.cathodicWindow, layer: 'below',
  }))];
  return {
    font: baseFont,
    paper_bgcolor: '#ffffff',
    plot_bgcolor: palette.plotBackground,
    margin: { l: 64, r: 16, t: 28, b: 48 },
    showlegend: true,
    legend: { orientation: 'h', x: 0, y: 1.02, yanchor: 'bottom', font: { size: 11 } },
    xaxis: {
      title: { text: input.potentialAxisTitle }, autorange: polarographic ? 'reversed' : true,
      gridcolor: palette.grid, zeroline: false, showline: true, linecolor: palette.ink, ticks: 'outside', mirror: true,
    },
    yaxis: {
      title: { text: input.currentKind === 'density'
        ? (polarographic ? `−j / (${scale.unit} cm⁻²) (cathodic up)` : `j / (${scale.unit} cm⁻²) (anodic up)`)
        : (polarographic ? `−i / ${scale.unit} (cathodic up)` : `i / ${scale.unit} (anodic up)`) },
      gridcolor: palette.grid, zeroline: true, zerolinecolor: '#b9bcb2', showline: true, linecolor: palette.ink, ticks: 'outside', mirror: true,
    },
    dragmode: input.dragMode === 'window' ? 'select' : 'zoom',
    selectdirection: 'h',
    hovermode: 'closest',
    shapes,
    annotations: workingWindowLabels(input),
    uirevision: `${input.fileName}|${input.convention}`,
  };
}

/** Stretches where a shown sweep ends in a current still rising steeply: shaded, below the traces. */
function windowEdgeShapes(input: TraceFigureInput): Partial<Shape>[] {
  const shown = (c: number) => input.cycle === 0 || c === input.cycle;
  return (input.analysis?.cycles ?? []).filter((c) => shown(c.index)).flatMap((c) => (c.windowEdges ?? []).map((e): Partial<Shape> => ({
    type: 'rect', xref: 'x', yref: 'paper', x0: Math.min(e.fromV, e.toV), x1: Math.max(e.fromV, e.toV), y0: 0, y1: 1,
    line: { width: 0 }, fillcolor: palette.windowEdge, layer: 'below', name: 'steep rise at the window edge',
  })));
}

/** The working window as a band (layer below the traces) with a dashed line at each known limit. */
function workingWindowShapes(input: TraceFigureInput): Partial<Shape>[] {
  const w = visibleWindow(input);
  if (!w) return [];
  const edge = (x: number): Partial<Shape> => ({ type: 'line', xref: 'x', yref: 'paper', x0: x, x1: x, y0: 0, y1: 1, layer: 'below', line: { color: palette.baseline, width: 1, dash: 'dash' } });
  return [
    { type: 'rect', xref: 'x', yref: 'paper', x0: w.x0, x1: w.x1, y0: 0, y1: 1, line: { width: 0 }, fillcolor: palette.workingWindow, layer: 'below' },
    ...w.edges.map((e) => edge(e.x)),
  ];
}

function workingWindowLabels(input: TraceFigureInput): Partial<Annotations>[] {
  return (visibleWindow(input)?.edges ?? []).map((e) => ({
    x: e.x, xref: 'x', y: 0, yref: 'paper', yanchor: 'bottom', xanchor: e.side === 'lower' ? 'left' : 'right', text: e.label, showarrow: false,
    font: { size: 10, color: palette.baseline },
  }));
}

/**
 * The band clipped to the recorded potential range (so it never widens the axis), and the limits
 * that fall inside that range (widened by 5 % of it) as edges to mark.
 */
function visibleWindow(input: TraceFigureInput): { x0: number; x1: number; edges: { x: number; side: 'lower' | 'upper'; label: string }[] } | null {
  const w = input.workingWindow;
  if (!w || (w.lowerV === null && w.upperV === null)) return null;
  const [lo, hi] = potentialRange(input);
  const x0 = Math.max(lo, w.lowerV ?? lo);
  const x1 = Math.min(hi, w.upperV ?? hi);
  const margin = (hi - lo) * 0.05;
  const inView = (x: number | null): x is number => x !== null && x >= lo - margin && x <= hi + margin;
  const edges = [
    ...(inView(w.lowerV) ? [{ x: w.lowerV, side: 'lower' as const, label: w.lowerLabel }] : []),
    ...(inView(w.upperV) ? [{ x: w.upperV, side: 'upper' as const, label: w.upperLabel }] : []),
  ];
  return x1 > x0 ? { x0, x1, edges } : { x0: lo, x1: lo, edges };
}

function potentialRange(input: TraceFigureInput): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of input.potentialV) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}
