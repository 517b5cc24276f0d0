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

  it('places a wave by its peak\'s distance from its couple\'s midpoint, and gives none where the width disagrees (α not 0.5)', () => {
    // ψ = 1 at α = 0.5: |Ep − E°′| and |Ep − Ep/2| of that wave.
    const m = slowWaveMeasures(1, 0.5);
    expect(m.halfWidth).toBeGreaterThan(2.3);
    expect(kineticWaveShapeFor(2.2, 3)).toBeNull();
    const s = kineticWaveShapeFor(m.halfWidth, pastFormalOf(1))!;
    expect(s.words).toMatch(/ψ ≈ 1\.0 /);
    expect(s.at(0)).toBeCloseTo(1, 3);
    expect(s.at(3)).toBeLessThan(s.at(1));
    expect(s.at(20)).toBeLessThan(0.01);
    // The same distance with a width 20 % off: α is not 0.5.
    expect(kineticWaveShapeFor(m.halfWidth * 1.2, pastFormalOf(1))).toBeNull();
  });
});

/** The peak's distance past E°′ (RT/nF) of the α = 0.5 wave at ψ. */
function pastFormalOf(psi: number): number {
  return slowWaveMeasures(psi, 0.5).pastFormal;
}
