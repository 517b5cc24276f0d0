/**
 * Series overlay as a pure function. Randles–Ševčík: ip ∝ v½ for a reversible diffusing couple
 * (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §6.2), so on the i/v½ scale the
 * simulated waves of the same couple at different scan rates have the same peak height; the
 * simulator is the project's own (src/core/simulation), validated against that equation.
 */
import { describe, expect, it } from 'vitest';
import { simulatedTrace } from '../../state/testSupport';
import { buildOverlayFigure, normaliser, type OverlayFile } from './overlayFigure';

function file(v: number): OverlayFile {
  const sim = simulatedTrace(v);
  return { name: `sim ${v}`, scanRateVPerS: v, potentialV: sim.potentialV, currentA: sim.currentA, cycles: [{ index: 1, start: 0, end: sim.potentialV.length }] };
}

const peak = (y: unknown[]) => Math.max(...(y as number[]).map(Math.abs));

describe('buildOverlayFigure', () => {
  const files = [file(0.5), file(0.05), file(0.2)];
  it('orders the files by scan rate, names them in V/s and colours them along the scale', () => {
    const fig = buildOverlayFigure({ files, normalisation: 'current', cycle: 1, areaCm2: 0.0707, potentialAxisTitle: 'E vs SCE / V', convention: 'iupac' });
    expect(fig.data.map((d) => (d as { name: string }).name)).toEqual(['0.05 V/s', '0.2 V/s', '0.5 V/s']);
    const colours = fig.data.map((d) => (d as { line: { color: string } }).line.color);
    expect(new Set(colours).size).toBe(3);
    expect(fig.layout.yaxis?.title).toEqual({ text: 'i / µA' });
  });

  it('on the i/v½ scale a reversible couple at three scan rates has one peak height (±2 %)', () => {
    const fig = buildOverlayFigure({ files, normalisation: 'diffusion', cycle: 1, areaCm2: 0.0707, potentialAxisTitle: 'E', convention: 'iupac' });
    const peaks = fig.data.map((d) => peak((d as { y: unknown[] }).y));
    for (const p of peaks) expect(Math.abs(p / (peaks[0] as number) - 1)).toBeLessThan(0.02);
    expect(String((fig.layout.yaxis?.title as { text: string }).text)).toMatch(/^i\/v½ \/ \(.A s½ V⁻½\)$/);
  });

  it('divides by the area for the density and draws nothing without one', () => {
    expect(normaliser('density', 0.1, 0.05)).toBe(0.05);
    expect(normaliser('capacitive', 0.1, null)).toBe(0.1);
    expect(buildOverlayFigure({ files, normalisation: 'density', cycle: 1, areaCm2: null, potentialAxisTitle: 'E', convention: 'iupac' }).data).toHaveLength(0);
  });
});
