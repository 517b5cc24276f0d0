/**
 * The fit figure as a pure function, on hand-made columns (arithmetic only, no published values):
 * files in order of scan rate, the model drawn only at the fitted points, residuals = measured −
 * model on their own axis and unit, the sign conventions of the trace plot (IUPAC, "Terminology of
 * electrochemical methods of analysis (IUPAC Recommendations 2019)", Pure Appl. Chem. 92 (2020)
 * 641: anodic current positive; polarographic: cathodic up, E increasing to the left, from
 * memory), the display-scale offset and the window band.
 */
import { describe, expect, it } from 'vitest';
import { buildFitFigure, type FitFigureFile, type FitFigureInput } from './fitFigure';
import { sequentialColour } from './palette';

const file = (name: string, v: number, factor: number): FitFigureFile => ({
  name, scanRateVPerS: v, potentialV: Float64Array.from([0, 0.1, 0.2, 0.1, 0]), currentA: Float64Array.from([0, 1, 5, -2, -1].map((x) => x * factor * 1e-6)),
  cycles: [{ index: 1, start: 0, end: 5 }],
});

const base: FitFigureInput = {
  files: [file('fast.csv', 1, 2), file('slow.csv', 0.1, 1)], model: null, offsetV: 0, scaleName: 'Ag/AgCl', convention: 'iupac', windowV: null, dragMode: 'zoom',
};

const trace = (fig: ReturnType<typeof buildFitFigure>, k: number) => fig.data[k] as { name: string; x: number[]; y: number[]; yaxis?: string; showlegend?: boolean };

describe('buildFitFigure', () => {
  it('before a fit: one measured line per file, slowest scan first, in µA', () => {
    const fig = buildFitFigure(base);
    expect(fig.data.map((d) => (d as { name: string }).name)).toEqual(['0.1 V/s', '1 V/s']);
    expect(fig.scale.unit).toBe('µA');
    expect(trace(fig, 1).y).toEqual([0, 2, 10, -4, -2].map((v) => expect.closeTo(v, 12)));
    expect(fig.layout.shapes).toEqual([]);
    expect(fig.layout.yaxis2).toBeUndefined();
    expect(fig.layout.yaxis?.domain).toEqual([0, 1]);
    // Coloured in order of scan rate on the series overlay's sequential scale: slowest at one end, fastest at the other.
    expect(fig.data.map((d) => (d as { line: { color: string } }).line.color)).toEqual([sequentialColour(0), sequentialColour(1)]);
  });

  it('a single off point (the vertex) does not set the residual axis: the range follows the 99.5th percentile', () => {
    const n = 400;
    const f: FitFigureFile = { name: 'long.csv', scanRateVPerS: 0.1, potentialV: Float64Array.from({ length: n }, (_, i) => i / n), currentA: new Float64Array(n).fill(1e-6), cycles: [{ index: 1, start: 0, end: n }] };
    // Residuals of ±2 nA everywhere, 3 µA at one point.
    const modelA = Float64Array.from({ length: n }, (_, i) => (i === 200 ? 1e-6 - 3e-6 : 1e-6 + (i % 2 ? 2e-9 : -2e-9)));
    const fig = buildFitFigure({ ...base, files: [f], model: [{ indices: Int32Array.from({ length: n }, (_, i) => i), modelA }] });
    expect(fig.residualScale.unit).toBe('nA');
    expect(fig.layout.yaxis2?.range).toEqual([expect.closeTo(-2.6, 9), expect.closeTo(2.6, 9)]);
    expect(fig.layout.yaxis2?.title).toEqual({ text: 'residual / nA' });
    expect(fig.layout.annotations?.[0]?.text).toBe('a few residuals lie off this scale');
  });

  it('after a fit: the model at the fitted points and the residuals below, in their own unit', () => {
    const model = [
      { indices: Int32Array.from([1, 2, 3]), modelA: Float64Array.from([1.99e-6, 10.01e-6, -4e-6]) },
      { indices: Int32Array.from([1, 2]), modelA: Float64Array.from([1.002e-6, 4.997e-6]) },
    ];
    const fig = buildFitFigure({ ...base, model });
    expect(fig.data).toHaveLength(6);
    const slowFit = trace(fig, 1);
    expect(slowFit.x).toEqual([0.1, 0.2]);
    expect(slowFit.y).toEqual([expect.closeTo(1.002, 9), expect.closeTo(4.997, 9)]);
    const slowResidual = trace(fig, 2);
    expect(slowResidual.yaxis).toBe('y2');
    expect(fig.residualScale.unit).toBe('nA');
    // measured − model: 1 − 1.002 µA = −2 nA, 5 − 4.997 µA = 3 nA
    expect(slowResidual.y).toEqual([expect.closeTo(-2, 6), expect.closeTo(3, 6)]);
    expect(trace(fig, 5).y).toEqual([expect.closeTo(10, 6), expect.closeTo(-10, 6), expect.closeTo(0, 6)]);
    expect(fig.data.filter((d) => (d as { showlegend?: boolean }).showlegend !== false)).toHaveLength(2);
  });

  it('polarographic: −i and the potential axis reversed; the offset moves every potential and the window is a band', () => {
    const model = [{ indices: Int32Array.from([2]), modelA: Float64Array.from([9.5e-6]) }, { indices: Int32Array.from([2]), modelA: Float64Array.from([4.5e-6]) }];
    const fig = buildFitFigure({ ...base, model, convention: 'polarographic', offsetV: -0.2, windowV: [-0.15, 0], dragMode: 'window' });
    expect(trace(fig, 0).y[2]).toBeCloseTo(-5, 12);
    expect(trace(fig, 0).x).toEqual([-0.2, expect.closeTo(-0.1, 12), 0, expect.closeTo(-0.1, 12), -0.2]);
    // measured − model = 5 − 4.5 µA = 500 nA, drawn as −500 nA
    expect(trace(fig, 2).y).toEqual([expect.closeTo(-500, 6)]);
    expect(fig.layout.xaxis?.autorange).toBe('reversed');
    expect(fig.layout.shapes?.[0]).toMatchObject({ x0: -0.15, x1: 0 });
    expect(fig.layout.dragmode).toBe('select');
    expect(fig.layout.xaxis?.title).toEqual({ text: 'E vs Ag/AgCl / V' });
  });
});
