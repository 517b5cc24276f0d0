/**
 * The fit's 95 % band: the mean-response interval ŷ ± t·s·√(1/n + (x − x̄)²/Sxx) (Draper & Smith,
 * Applied Regression Analysis, 3rd ed. (1998), §1.4), worked by hand for four points.
 */
import { describe, expect, it } from 'vitest';
import { fitLine, oneRateSeriesCouple } from '../../state/testSupport';
import { buildSeriesFigures, confidenceBand } from './seriesFigures';

describe('confidenceBand', () => {
  // x = 1…4, y = 2.1, 3.9, 6.2, 7.8: slope 1.94, intercept 0.15, residuals 0.01, −0.13, 0.23, −0.11,
  // SSres = 0.082, s = √(0.082/2) = 0.20248, Sxx = 5, x̄ = 2.5, t(0.975, 2) = 4.3027.
  const x = [1, 2, 3, 4];
  const fit = fitLine(x, [2.1, 3.9, 6.2, 7.8]);
  const band = confidenceBand(fit, x, 6);
  it('is narrowest at the mean x, t·s/√n wide on each side', () => {
    expect(band).not.toBeNull();
    const mid = band!.x.indexOf(2.5);
    expect(mid).toBe(3);
    expect((band!.upper[mid]! - band!.lower[mid]!) / 2).toBeCloseTo(4.3027 * 0.20248 / 2, 3);
  });
  it('widens towards the ends: at x = 1 the half-width is t·s·√(1/4 + 2.25/5)', () => {
    expect((band!.upper[0]! - band!.lower[0]!) / 2).toBeCloseTo(4.3027 * 0.20248 * Math.sqrt(0.25 + 0.45), 3);
  });
  it('is absent without a residual degree of freedom', () => {
    expect(confidenceBand(fitLine([1, 2], [1, 2]), [1, 2])).toBeNull();
  });
});

describe('the |ip| against v½ figure of one scan rate', () => {
  // Randles–Ševčík has no intercept (Bard & Faulkner 2nd ed. §6.2): replicates at one rate give
  // the line through the origin, drawn from the origin to their v½ (one point would draw nothing).
  it('draws the line through the origin from x = 0', () => {
    const couple = oneRateSeriesCouple([1.01, 0.99, 1].map((f) => f * 16.5e-6));
    const line = buildSeriesFigures(couple, 'SHE').current.data.find((d) => (d as { name?: string }).name?.startsWith('forward-peak line')) as { x: number[]; y: number[] } | undefined;
    expect(line).toBeDefined();
    expect(line!.x[0]).toBe(0);
    expect(line!.y[0]).toBe(0);
    expect(line!.x[1]).toBeCloseTo(Math.sqrt(0.1), 12);
  });
});
