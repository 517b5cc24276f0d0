/**
 * The slow-electron-transfer wave of kineticWaveShape.ts against the published limits of its
 * integral equation: the reversible wave (ψ large) and the totally irreversible one (ψ small).
 */
import { describe, expect, it } from 'vitest';
import { kineticWaveShapeFor, slowWaveMeasures } from './kineticWaveShape';

describe('slow-electron-transfer wave', () => {
  // Nicholson & Shain, Anal. Chem. 36 (1964) 706, Table I; Bard & Faulkner 2nd ed. (2001)
  // eqs. 6.2.19 and 6.2.21: √π·χ at the peak 0.4463, |Ep − Ep/2| = 2.20 RT/nF.
  it('tends to the reversible wave as ψ grows: peak 0.4463 and |Ep − Ep/2| 2.20 RT/nF within 1 %', () => {
    const m = slowWaveMeasures(200, 0.5);
    expect(Math.abs(m.peakCurrentFunction / 0.4463 - 1)).toBeLessThan(0.01);
    expect(Math.abs(m.halfWidth / 2.2 - 1)).toBeLessThan(0.01);
  });

  // Bard & Faulkner 2nd ed. eqs. 6.3.6 and 6.3.8 (Nicholson & Shain 1964, Table III): a totally
  // irreversible wave has |Ep − Ep/2| = 1.857 RT/αnF and a peak √π·χ = 0.4958·√α.
  it.each([0.3, 0.5, 0.7])('α = %f, ψ small: |Ep − Ep/2| = 1.857/α RT/nF and peak 0.4958√α within 1 %', (alpha) => {
    const m = slowWaveMeasures(0.002, alpha);
    expect(Math.abs(m.halfWidth / (1.857 / alpha) - 1)).toBeLessThan(0.01);
    expect(Math.abs(m.peakCurrentFunction / (0.4958 * Math.sqrt(alpha)) - 1)).toBeLessThan(0.01);
  });

  it('picks a shape by width: none at a reversible wave\'s, 1 at the peak, a foot that falls away before it', () => {
    expect(kineticWaveShapeFor(2.2)).toBeNull();
    for (const width of [2.6, 3.2, 5]) {
      const s = kineticWaveShapeFor(width)!;
      expect(s.at(0)).toBeCloseTo(1, 3);
      expect(s.at(3)).toBeLessThan(s.at(1));
      expect(s.at(20)).toBeLessThan(0.01);
    }
    // Beyond an irreversible wave's width at α = 0.5 the wave is irreversible with α = 1.857/width.
    expect(kineticWaveShapeFor(1.857 / 0.35)!.words).toMatch(/α = 0\.35/);
  });
});
