import { describe, expect, it } from 'vitest';
import { pairPeaksIntoCouples } from './pairPeaksIntoCouples';

describe('pairPeaksIntoCouples', () => {
  it('pairs one couple', () => {
    expect(pairPeaksIntoCouples([0.23], [0.17])).toEqual([{ anodic: 0, cathodic: 0 }]);
  });

  // Hand example: two slow couples with ΔEp = 0.2 V whose E½ differ by 0.15 V. Nearest-first
  // greedy pairing would join Epa = 0.30 with Epc = 0.25; order-preserving pairing does not.
  it('keeps couples in order where nearest-first pairing would cross them', () => {
    const pairs = pairPeaksIntoCouples([0.45, 0.3], [0.1, 0.25]);
    expect(pairs).toEqual([
      { anodic: 1, cathodic: 0 },
      { anodic: 0, cathodic: 1 },
    ]);
  });

  it('leaves a peak without a partner unpaired, and respects maxDeltaEpV (wide limit set equal)', () => {
    expect(pairPeaksIntoCouples([0.5], [])).toEqual([{ anodic: 0, cathodic: null }]);
    expect(pairPeaksIntoCouples([0.9], [0.1], { maxDeltaEpV: 0.5, wideMaxDeltaEpV: 0.5 })).toEqual([
      { anodic: null, cathodic: 0 },
      { anodic: 0, cathodic: null },
    ]);
  });

  // Hand example: two small features (weight 0.2) would pair with the large peaks at ΔEp 0.21 and
  // 0.18 V (total 0.39) against 0.06 + 2·0.2·0.6 = 0.30 for the real couple plus two singles.
  it('small features cannot pull a large couple apart when weighted', () => {
    const anodic = [0.028, 0.148];
    const cathodic = [-0.182, -0.031];
    expect(pairPeaksIntoCouples(anodic, cathodic)).toContainEqual({ anodic: 0, cathodic: 0 });
    const weighted = pairPeaksIntoCouples(anodic, cathodic, { anodicWeights: [1, 0.2], cathodicWeights: [0.2, 1] });
    expect(weighted).toContainEqual({ anodic: 0, cathodic: 1 });
  });

  it('allows a small negative ΔEp (adsorbed layer) but not a large one', () => {
    expect(pairPeaksIntoCouples([0.099], [0.1])).toEqual([{ anodic: 0, cathodic: 0 }]);
    expect(pairPeaksIntoCouples([0.0], [0.1])).toHaveLength(2);
    expect(() => pairPeaksIntoCouples([0], [0], { maxDeltaEpV: 0 })).toThrow(/maxDeltaEpV/);
  });
});

// Wang, Analytical Electrochemistry 2nd ed. (2000) eq. 2-5: a totally irreversible couple with
// k° = 1e-5 cm/s, α = 0.5 at 0.1 V/s has its peaks ≈ ±0.35 V from E°′, so ΔEp ≈ 0.7 V.
describe('pairPeaksIntoCouples with one dominant peak per direction', () => {
  it('pairs a lone couple 0.7 V apart, and with a small extra feature beside it', () => {
    expect(pairPeaksIntoCouples([0.35], [-0.35])).toEqual([{ anodic: 0, cathodic: 0 }]);
    const withFeature = pairPeaksIntoCouples([0.35, 0.6], [-0.35], { anodicWeights: [1, 0.1], cathodicWeights: [1] });
    expect(withFeature).toContainEqual({ anodic: 0, cathodic: 0 });
  });
  // Hand example of the cost balance (our pairing rule; common practice, no source): a return peak of weight 0.355 (an irreversible couple's at a
  // fast scan) 0.85 V from the forward peak. Left single, both cost 0.6 + 0.355·0.6 = 0.813, less
  // than the pair's 0.85; the two dominant peaks are joined all the same, as nothing competes.
  it('joins the two dominant peaks when the cost balance alone would leave both single', () => {
    expect(pairPeaksIntoCouples([0.4203], [-0.4301], { anodicWeights: [0.355], cathodicWeights: [1] })).toEqual([{ anodic: 0, cathodic: 0 }]);
    // A small couple (0.30/0.28 V) pairs up inside them; joined, the dominant peaks would cross it: left single.
    const crossed = pairPeaksIntoCouples([0.4203, 0.3], [-0.4301, 0.28], { anodicWeights: [0.355, 0.2], cathodicWeights: [1, 0.2] });
    expect(crossed).toContainEqual({ anodic: 1, cathodic: 1 });
    expect(crossed).not.toContainEqual({ anodic: 0, cathodic: 0 });
  });
  // Our rule (common practice, no source): a direction's only peak counts as dominant from a third of the usual weight (0.1): a totally
  // irreversible couple's return peak at a fast scan (ratio 0.2-0.4 by prominence); a smaller lone
  // feature stays single beyond the narrow limit.
  it('pairs a direction\'s only peak from weight 0.1 up to the wide limit', () => {
    expect(pairPeaksIntoCouples([0.39], [-0.39], { anodicWeights: [0.15], cathodicWeights: [1] })).toEqual([{ anodic: 0, cathodic: 0 }]);
    expect(pairPeaksIntoCouples([0.39], [-0.39], { anodicWeights: [0.05], cathodicWeights: [1] })).toHaveLength(2);
  });
  it('keeps the narrow limit when a direction has two comparable peaks, and beyond 2·maxDeltaEpV', () => {
    expect(pairPeaksIntoCouples([0.35, 0.6], [-0.35], { anodicWeights: [1, 0.8] })).not.toContainEqual({ anodic: 0, cathodic: 0 });
    expect(pairPeaksIntoCouples([0.7], [-0.6])).toHaveLength(2);
    expect(() => pairPeaksIntoCouples([0], [0], { maxDeltaEpV: 0.5, wideMaxDeltaEpV: 0.4 })).toThrow(/wideMaxDeltaEpV/);
  });
});
