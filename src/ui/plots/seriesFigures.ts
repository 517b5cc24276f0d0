/**
 * Scan-rate series plots as pure functions: peak current against v½ (or against v for a surface
 * wave) with the fitted line, log₁₀|ip| against log₁₀ v with its fit, and Ep against log₁₀ v.
 * Fit lines are drawn from the series result's own slope and intercept over the data range, so
 * the picture shows exactly the fit that produced the numbers in the table.
 */
import type { Data, Layout } from 'plotly.js';
import type { FitLineResult } from '../../core/regression/fitLine';
import type { SeriesCouple } from '../../core/analysis/seriesTypes';
import type { SeriesPoint } from '../../core/series/seriesPoint';
import { chooseCurrentScale } from './currentScale';
import { baseFont, markers, palette } from './palette';

export interface Figure {
  data: Data[];
  layout: Partial<Layout>;
}

export interface SeriesFigures {
  current: Figure;
  logLog: Figure;
  peakPotential: Figure;
}

type Getter = (p: SeriesPoint) => number | null;

/** Potentials of `couple` are already on the scale named `scaleName` (the run reports on it). */
export function buildSeriesFigures(couple: SeriesCouple, scaleName: string): SeriesFigures {
  return {
    current: currentFigure(couple),
    logLog: logLogFigure(couple),
    peakPotential: peakPotentialFigure(couple, scaleName),
  };
}

function currentFigure(c: SeriesCouple): Figure {
  const surface = c.regime === 'surface';
  const xOf = (p: SeriesPoint) => (surface ? p.scanRateVPerS : Math.sqrt(p.scanRateVPerS));
  const scale = chooseCurrentScale(Math.max(0, ...c.points.map((p) => Math.max(p.ipaA ?? 0, p.ipcA ?? 0))));
  const fit = surface ? c.surface?.fit ?? null : c.forwardFit;
  const fitted = c.points.filter((p) => p.forwardIpA !== null && Number.isFinite(p.forwardIpA)).map(xOf);
  const data: Data[] = [];
  if (fit) data.push(...confidenceBandTraces(fit, fitted, scale.factor));
  data.push(
    points(c.points, xOf, (p) => p.ipaA, scale.factor, 'ipa', palette.anodic, markers.anodic),
    points(c.points, xOf, (p) => p.ipcA, scale.factor, 'ipc', palette.cathodic, markers.cathodic),
  );
  if (fit) data.push(fitLine(fit, c.points.map(xOf), scale.factor, Number.isFinite(fit.r2) ? `forward-peak fit, R² ${fit.r2.toFixed(4)}` : 'forward-peak line through the origin (one scan rate)'));
  const xTitle = surface ? 'v / (V s⁻¹)' : 'v½ / (V s⁻¹)½';
  return { data, layout: layout(xTitle, `|ip| / ${scale.unit}`, false) };
}

function logLogFigure(c: SeriesCouple): Figure {
  const log = (v: number | null) => (v !== null && v > 0 ? Math.log10(v) : null);
  const lx = (p: SeriesPoint) => Math.log10(p.scanRateVPerS);
  const data: Data[] = c.logLog ? confidenceBandTraces(c.logLog.fit, c.points.filter((p) => log(p.forwardIpA) !== null).map(lx), 1) : [];
  data.push(points(c.points, lx, (p) => log(p.forwardIpA), 1, 'forward peak', palette.traces[0], 'circle'));
  if (c.logLog) data.push(fitLine(c.logLog.fit, c.points.map(lx), 1, `slope ${c.logLog.slope.toFixed(3)}`));
  return { data, layout: layout('log₁₀(v / V s⁻¹)', 'log₁₀(|ip| / A)', false) };
}

function peakPotentialFigure(c: SeriesCouple, scaleName: string): Figure {
  const lx = (p: SeriesPoint) => Math.log10(p.scanRateVPerS);
  const data: Data[] = [];
  for (const [r, y] of [[c.peakShift.anodic, (p: SeriesPoint) => p.epaV], [c.peakShift.cathodic, (p: SeriesPoint) => p.epcV]] as const) {
    if (r) data.push(...confidenceBandTraces(r.fit, c.points.filter((p) => y(p) !== null).map(lx), 1, data.length === 0));
  }
  data.push(
    points(c.points, lx, (p) => p.epaV, 1, 'Epa', palette.anodic, markers.anodic),
    points(c.points, lx, (p) => p.epcV, 1, 'Epc', palette.cathodic, markers.cathodic),
  );
  const xs = c.points.map(lx);
  for (const [dir, r] of [['anodic', c.peakShift.anodic], ['cathodic', c.peakShift.cathodic]] as const) {
    if (r) data.push(fitLine(r.fit, xs, 1, `${dir}: ${(r.slopeVPerDecade * 1000).toFixed(1)} mV/decade`));
  }
  return { data, layout: layout('log₁₀(v / V s⁻¹)', `Ep vs ${scaleName} / V`, false) };
}

function points(ps: SeriesPoint[], x: (p: SeriesPoint) => number, y: Getter, factor: number, name: string, color: string | undefined, symbol: string): Data {
  const kept = ps.filter((p) => y(p) !== null);
  return {
    type: 'scatter', mode: 'markers', name, x: kept.map(x), y: kept.map((p) => (y(p) as number) * factor),
    text: kept.map((p) => p.fileName), marker: { color: color ?? palette.ink, symbol, size: 9 },
    hovertemplate: '%{text}<br>x %{x:.4g}, y %{y:.4g}<extra></extra>',
  } as Data;
}

function fitLine(fit: FitLineResult, xs: number[], factor: number, name: string): Data {
  // A line through the origin from one scan rate is drawn from the origin, or it would be a point.
  const lo = new Set(xs).size === 1 && fit.intercept === 0 ? 0 : Math.min(...xs);
  const hi = Math.max(...xs);
  const x = [lo, hi];
  return {
    type: 'scatter', mode: 'lines', name, x, y: x.map((v) => (fit.slope * v + fit.intercept) * factor),
    line: { color: palette.fit, width: 1.2, dash: 'dot' }, hoverinfo: 'skip',
  } as Data;
}

/**
 * The fit's 95 % confidence band for the mean response, ŷ(x) ± t·s·√(1/n + (x − x̄)²/Sxx)
 * (N. R. Draper, H. Smith, Applied Regression Analysis, 3rd ed. (1998), §1.4), over the fitted
 * x range. `xs` are the x values the fit used; Sxx follows from the fit's own slope error,
 * Sxx = s²/se(slope)², so the band belongs to exactly the line drawn. None without a residual
 * degree of freedom.
 */
export function confidenceBand(fit: FitLineResult, xs: number[], steps = 40): { x: number[]; lower: number[]; upper: number[] } | null {
  const s = fit.residualStdDev;
  const se = fit.slopeStdError;
  const t = fit.tQuantile;
  if (s === null || se === null || t === null || !(se > 0) || xs.length < 3) return null;
  const n = xs.length;
  const mean = xs.reduce((a, b) => a + b, 0) / n;
  const sxx = (s * s) / (se * se);
  const lo = Math.min(...xs);
  const hi = Math.max(...xs);
  const x = Array.from({ length: steps + 1 }, (_, k) => lo + ((hi - lo) * k) / steps);
  const half = x.map((v) => t * s * Math.sqrt(1 / n + ((v - mean) ** 2) / sxx));
  const yhat = x.map((v) => fit.slope * v + fit.intercept);
  return { x, lower: yhat.map((y, k) => y - (half[k] as number)), upper: yhat.map((y, k) => y + (half[k] as number)) };
}

function confidenceBandTraces(fit: FitLineResult, xs: number[], factor: number, showLegend = true): Data[] {
  const band = confidenceBand(fit, xs);
  if (!band) return [];
  const edge = { type: 'scatter', mode: 'lines', x: band.x, line: { width: 0, color: palette.fit }, hoverinfo: 'skip', legendgroup: 'band' } as const;
  return [
    { ...edge, y: band.lower.map((v) => v * factor), name: '95 % band', showlegend: false } as Data,
    { ...edge, y: band.upper.map((v) => v * factor), name: `fit, ${Math.round(fit.confidenceLevel * 100)} % band`, showlegend: showLegend, fill: 'tonexty', fillcolor: palette.fitBand } as Data,
  ];
}

function layout(xTitle: string, yTitle: string, legendInside: boolean): Partial<Layout> {
  return {
    font: { ...baseFont, size: 11 }, paper_bgcolor: '#ffffff', plot_bgcolor: palette.plotBackground,
    margin: { l: 58, r: 10, t: 26, b: 42 },
    legend: legendInside ? { x: 0.02, y: 0.98 } : { orientation: 'h', x: 0, y: 1.02, yanchor: 'bottom', font: { size: 10 } },
    xaxis: { title: { text: xTitle }, gridcolor: palette.grid, zeroline: false, showline: true, linecolor: palette.ink, ticks: 'outside', mirror: true },
    yaxis: { title: { text: yTitle }, gridcolor: palette.grid, zeroline: false, showline: true, linecolor: palette.ink, ticks: 'outside', mirror: true },
    hovermode: 'closest',
  };
}
