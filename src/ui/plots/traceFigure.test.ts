/**
 * Trace figure builder as a pure function. Sign conventions: IUPAC, "Terminology of
 * electrochemical methods of analysis (IUPAC Recommendations 2019)", Pure Appl. Chem. 92 (2020)
 * 641 — anodic current positive; the polarographic (classical American) plot shows cathodic
 * current up with potential increasing to the left (from memory).
 */
import { describe, expect, it } from 'vitest';
import type { VoltammogramAnalysis } from '../../core/analysis/types';
import type { PeakResult } from '../../core/peaks/peakTypes';
import { buildTraceFigure, type TraceFigureInput } from './traceFigure';

const potentialV = Float64Array.from([0, 0.1, 0.2, 0.1, 0]);
const currentA = Float64Array.from([0, 1e-6, 5e-6, -2e-6, -1e-6]);
const base: TraceFigureInput = {
  fileName: 'a.csv', potentialV, currentA, cycles: [{ index: 1, start: 0, end: 5 }], analysis: null, cycle: 1,
  convention: 'iupac', showSmoothed: false, showBaselines: true, dragMode: 'zoom', peakWindows: [],
  recordingOffsetV: 0, potentialAxisTitle: 'E vs SCE / V',
};

const peak = {
  direction: 'anodic', potentialV: 0.2, heightA: 4e-6, rawCurrentA: 5e-6, baselineCurrentA: 1e-6,
  baseline: { method: 'linear', potentialV: Float64Array.from([0.1, 0.2]), currentA: Float64Array.from([0.5e-6, 1e-6]), startIndex: 1, endIndex: 3, anchors: [], description: '' },
} as unknown as PeakResult;
const analysis = { cycles: [{ index: 1, peaks: [peak], couples: [], warnings: [] }], smoothed: null } as unknown as VoltammogramAnalysis;

function ys(fig: ReturnType<typeof buildTraceFigure>, k: number): unknown[] {
  return (fig.data[k] as { y: unknown[] }).y;
}

describe('buildTraceFigure', () => {
  it('IUPAC: µA scale, anodic up, potential increasing to the right', () => {
    const fig = buildTraceFigure(base);
    expect(fig.scale.unit).toBe('µA');
    expect(ys(fig, 0)).toEqual([0, 1, 5, -2, -1].map((v) => expect.closeTo(v, 12)));
    expect(fig.layout.xaxis?.autorange).toBe(true);
    expect(fig.layout.yaxis?.title).toEqual({ text: 'i / µA (anodic up)' });
  });

  it('polarographic: current sign flipped and the potential axis reversed', () => {
    const fig = buildTraceFigure({ ...base, convention: 'polarographic' });
    expect(ys(fig, 0)).toEqual([0, -1, -5, 2, 1].map((v) => expect.closeTo(v, 12)));
    expect(fig.layout.xaxis?.autorange).toBe('reversed');
  });

  it('draws the baseline as subtracted and a stem from baseline to peak', () => {
    const fig = buildTraceFigure({ ...base, analysis });
    const names = fig.data.map((d) => (d as { name: string }).name);
    expect(names).toEqual(['cycle 1', 'baseline (as subtracted)', 'anodic peaks (Epa, ipa)', 'cathodic peaks (Epc, ipc)']);
    expect(ys(fig, 1)).toEqual([expect.closeTo(0.5, 12), expect.closeTo(1, 12)]);
    expect(ys(fig, 2)).toEqual([expect.closeTo(1, 12), expect.closeTo(5, 12), null]);
    const hidden = buildTraceFigure({ ...base, analysis, showBaselines: false });
    expect(hidden.data).toHaveLength(3);
  });

  it('marks the points the analysis left out and shades a steep rise at the window edge', () => {
    const cycle = { index: 1, peaks: [], couples: [], warnings: [], windowEdges: [{ direction: 'anodic', segmentIndex: 0, fromV: 0.15, fromIndex: 1, toV: 0.2, currentA: 5e-6, atSwitch: true }] };
    const flagged = { cycles: [cycle], smoothed: null, spikes: [{ index: 3, potentialV: 0.1, currentA: -2e-6, replacedByA: 1e-6 }] } as unknown as VoltammogramAnalysis;
    const fig = buildTraceFigure({ ...base, analysis: flagged });
    const left = fig.data.find((d) => (d as { name: string }).name === 'left-out points (1)') as { x: number[]; y: number[] };
    expect(left.x).toEqual([0.1]);
    expect(left.y).toEqual([expect.closeTo(-2, 12)]);
    expect(fig.layout.shapes).toContainEqual(expect.objectContaining({ x0: 0.15, x1: 0.2, name: 'steep rise at the window edge' }));
    expect(buildTraceFigure({ ...base, analysis: flagged, cycle: 2, cycles: [{ index: 2, start: 0, end: 5 }] }).layout.shapes).toEqual([]);
  });

  it('draws companions of the series behind the trace and scales the current axis to them', () => {
    const big = Float64Array.from([0, 1e-3, 2e-3, -1e-3, 0]);
    const fig = buildTraceFigure({ ...base, companions: [{ name: 'b.csv', potentialV, currentA: big, cycles: base.cycles }] });
    expect(fig.data[0]).toMatchObject({ name: 'other files of the series', showlegend: true, hovertemplate: expect.stringContaining('b.csv') });
    expect(fig.scale.unit).toBe('mA');
    expect(ys(fig, 1)).toEqual([0, 1e-3, 5e-3, -2e-3, -1e-3].map((v) => expect.closeTo(v, 12)));
  });

  it('draws the analysed potentials as they are and shifts what is on the recording scale (windows, companions)', () => {
    const fig = buildTraceFigure({
      ...base, recordingOffsetV: 0.2, peakWindows: [{ direction: 'cathodic', fromV: 0.05, toV: 0.15 }],
      companions: [{ name: 'b.csv', potentialV, currentA, cycles: base.cycles }],
    });
    expect((fig.data[0] as { x: number[] }).x[2]).toBeCloseTo(0.4, 12);
    expect((fig.data[1] as { x: number[] }).x[2]).toBeCloseTo(0.2, 12);
    expect(fig.layout.shapes?.[0]).toMatchObject({ x0: expect.closeTo(0.25, 12), x1: expect.closeTo(0.35, 12) });
  });

  // Arithmetic on hand-made columns, no published value.
  it('with a blank subtracted: the current less the blank is the trace the picks sit on, the recording drawn faintly behind', () => {
    const recordedA = currentA.map((a) => a + 3e-6);
    const fig = buildTraceFigure({ ...base, blank: { name: 'electrolyte.csv', recordedA } });
    const names = fig.data.map((d) => (d as { name: string }).name);
    expect(names.slice(0, 2)).toEqual(['as recorded (before electrolyte.csv)', 'cycle 1, less the blank']);
    expect(ys(fig, 1)).toEqual([0, 1, 5, -2, -1].map((v) => expect.closeTo(v, 9)));
    expect(ys(fig, 0)).toEqual([3, 4, 8, 1, 2].map((v) => expect.closeTo(v, 9)));
    // The current axis covers both.
    expect(fig.scale.unit).toBe('µA');
  });
});
