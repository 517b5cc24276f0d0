/**
 * A record that starts inside its window, on the foot of the wave (as a sweep started at the
 * rest potential of a cell holding both forms may): our own reversible couple (this project's
 * simulator, 2 cycles, 0.3 → −0.3 V, E°′ = 0 V) with its first 250 mV cut off, read through the
 * importer and analysed. A later cycle then does not start at rest, and the share of the product
 * still at the surface (the semi-integral at the turn over its value at the switch before,
 * Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §6.7, from memory) measures nothing
 * past 100 %: the warning must say so in words, never print such a share.
 */
import { describe, expect, it } from 'vitest';
import { simulateCv } from '../../src/core/simulation';
import { analyzeVoltammogram } from '../../src/core/analysis/analyzeVoltammogram';
import { importVoltammogram } from '../../src/io/importVoltammogram';

describe('a record that starts on the foot of its wave', () => {
  it('gets NOT_AT_REST on its later cycle without a share above 100 %', () => {
    const sim = simulateCv({ k0CmPerS: Infinity, formalPotentialV: 0, startV: 0.3, switchV: -0.3, scanRateVPerS: 0.1, stepV: 0.001, cycles: 2, areaCm2: 0.0707, concentrationOMolPerCm3: 1e-6, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 });
    const rows = ['Time (s),Potential (V),Current (A)'];
    let from = 0;
    while ((sim.potentialV[from] as number) > 0.05) from++;
    for (let i = from; i < sim.potentialV.length; i++) rows.push(`${sim.timeS[i]},${sim.potentialV[i]},${sim.currentA[i]}`);
    const { measurement } = importVoltammogram('mid_window.csv', `${rows.join('\n')}\n`);
    const a = analyzeVoltammogram(measurement);
    const notes = a.cycles.flatMap((c) => c.warnings).filter((w) => w.code === 'NOT_AT_REST');
    expect(notes.length).toBeGreaterThan(0);
    for (const w of notes) {
      const share = /\(([\d.e+]+) % of it still at the surface/.exec(w.message);
      if (share) expect(Number(share[1])).toBeLessThanOrEqual(100);
      else expect(w.message).toMatch(/did not start at rest/);
    }
  });
});
