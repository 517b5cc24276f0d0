/**
 * Every voltammogram of a scan-rate series over each other, coloured in order of scan rate on a
 * sequential scale (palette.ts), with the legend in V/s, in one of four scalings: i as measured;
 * i/A (current density); i/v½, on which diffusion-controlled waves of a reversible couple coincide
 * (Randles–Ševčík, ip ∝ v½); i/v, on which capacitive currents and surface-confined waves coincide
 * (ic = A·Cd·v; Laviron's ip ∝ v). Pure: no DOM, no Plotly import.
 */
import type { Data, Layout } from 'plotly.js';
import type { CycleRange } from '../../core/types';
import type { OverlayNormalisation } from '../../state/types';
import { chooseCurrentScale, maxAbs } from './currentScale';
import { decimateMinMax } from './decimate';
import { baseFont, palette, sequentialColour } from './palette';

export interface OverlayFile {
  name: string;
  scanRateVPerS: number;
  /** Potentials as analysed, on the display scale (V). */
  potentialV: Float64Array;
  currentA: Float64Array;
  cycles: CycleRange[];
}

export interface OverlayInput {
  files: OverlayFile[];
  normalisation: OverlayNormalisation;
  /** 1-based cycle drawn from each file (its last when it has fewer). */
  cycle: number;
  /** Electrode area (cm²) for the density; null when not known. */
  areaCm2: number | null;
  potentialAxisTitle: string;
  convention: 'iupac' | 'polarographic';
}

const UNIT: Record<OverlayNormalisation, (prefix: string) => string> = {
  current: (p) => `i / ${p}A`,
  density: (p) => `i/A / (${p}A cm⁻²)`,
  diffusion: (p) => `i/v½ / (${p}A s½ V⁻½)`,
  capacitive: (p) => `i/v / (${p}A s V⁻¹)`,
};

/** Divisor of each current for the normalisation (NaN when the area is missing). */
export function normaliser(n: OverlayNormalisation, scanRateVPerS: number, areaCm2: number | null): number {
  if (n === 'density') return areaCm2 !== null && areaCm2 > 0 ? areaCm2 : Number.NaN;
  if (n === 'diffusion') return Math.sqrt(scanRateVPerS);
  if (n === 'capacitive') return scanRateVPerS;
  return 1;
}

export function buildOverlayFigure(input: OverlayInput): { data: Data[]; layout: Partial<Layout> } {
  const files = input.files.filter((f) => f.scanRateVPerS > 0).sort((a, b) => a.scanRateVPerS - b.scanRateVPerS);
  const picked = files.map((f) => ({ f, range: f.cycles.find((c) => c.index === input.cycle) ?? f.cycles[f.cycles.length - 1], by: normaliser(input.normalisation, f.scanRateVPerS, input.areaCm2) }));
  const largest = Math.max(0, ...picked.map(({ f, range, by }) => (range ? maxAbs(f.currentA, range.start, range.end) / by : 0)).filter(Number.isFinite));
  const scale = chooseCurrentScale(largest);
  const sign = input.convention === 'polarographic' ? -1 : 1;
  const data: Data[] = picked.flatMap(({ f, range, by }, k) => {
    if (!range || !Number.isFinite(by)) return [];
    const xy = decimateMinMax(f.potentialV, f.currentA, range.start, range.end, 1500);
    const colour = sequentialColour(picked.length === 1 ? 0 : k / (picked.length - 1));
    return [{
      type: 'scatter', mode: 'lines', name: `${Number(f.scanRateVPerS.toPrecision(3))} V/s`, x: xy.x, y: xy.y.map((a) => (sign * a * scale.factor) / by),
      line: { color: colour, width: 1.4 }, hovertemplate: `${f.name}<br>E %{x:.4f} V<br>%{y:.4g}<extra></extra>`,
    } as Data];
  });
  const prefix = scale.unit.slice(0, -1);
  const polarographic = input.convention === 'polarographic';
  const axis = { gridcolor: palette.grid, zeroline: false, showline: true, linecolor: palette.ink, ticks: 'outside' as const, mirror: true };
  return {
    data,
    layout: {
      font: { ...baseFont, size: 11 }, paper_bgcolor: '#ffffff', plot_bgcolor: palette.plotBackground, margin: { l: 64, r: 10, t: 26, b: 42 },
      legend: { title: { text: 'v' }, font: { size: 10 } }, hovermode: 'closest',
      xaxis: { ...axis, title: { text: input.potentialAxisTitle }, autorange: polarographic ? 'reversed' : true },
      yaxis: { ...axis, title: { text: `${polarographic ? '−' : ''}${UNIT[input.normalisation](prefix)}` } },
    },
  };
}
