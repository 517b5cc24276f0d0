import { describe, expect, it } from 'vitest';
import { thermalVoltageV } from '../constants';
import { classifyCouple, type ClassifyCoupleInput } from './classifyCouple';

const u = thermalVoltageV(298.15);
const base: ClassifyCoupleInput = {
  deltaEpV: 0.0592,
  ratio: 1.0,
  halfPeakWidthsV: { anodic: 0.0565, cathodic: 0.0565 },
  fwhmV: { anodic: null, cathodic: null },
  switchPastPeakV: 0.1215,
  hasAnodic: true,
  hasCathodic: true,
};

describe('classifyCouple', () => {
  // Nicholson, Anal. Chem. 37 (1965) 1351, via B&F 2nd ed. §6.5 (from memory): 59.2 mV at 121.5 mV past the peak.
  it('ΔEp at the tabulated reversible value and ratio 1 → reversible, with the numbers', () => {
    const v = classifyCouple(base);
    expect(v.category).toBe('reversible');
    expect(v.evidence.reversibleDeltaEpAtSwitchV! * 1000).toBeCloseTo(59.2, 6);
    expect(v.evidence.reversibleDeltaEpLimitV * 1000).toBeCloseTo(56.99, 1);
    expect(v.reasons[0]).toMatch(/ΔEp = 59\.2 mV/);
  });

  // Nicholson, Anal. Chem. 37 (1965) 1351, Table I (from memory): n·ΔEp = 84 mV ↔ ψ = 1, a quasi-reversible couple.
  it('ΔEp = 84 mV → quasi-reversible; 250 mV → irreversible; one peak → irreversible', () => {
    expect(classifyCouple({ ...base, deltaEpV: 0.084 }).category).toBe('quasi-reversible');
    expect(classifyCouple({ ...base, deltaEpV: 0.25 }).category).toBe('irreversible');
    expect(classifyCouple({ ...base, hasCathodic: false, deltaEpV: null, ratio: null }).category).toBe('irreversible');
  });

  it('ratio 0.6 → chemically-coupled; ratio 1.4 → chemically-coupled with the larger-return label', () => {
    expect(classifyCouple({ ...base, ratio: 0.6 }).category).toBe('chemically-coupled');
    const big = classifyCouple({ ...base, ratio: 1.4 });
    expect(big.category).toBe('chemically-coupled');
    expect(big.label).toMatch(/larger/);
  });

  // Bard & Faulkner 2nd ed. §14.3 (3.53·RT/nF, from memory); exactly 4·ln(1+√2)·RT/nF: ideal adsorbed FWHM 90.58/n mV.
  it('ΔEp ≈ 0 with FWHM 90.6 mV → adsorbed; with FWHM 200 mV → inconclusive', () => {
    const ads = classifyCouple({ ...base, deltaEpV: 0.002, fwhmV: { anodic: 0.0906, cathodic: 0.0905 } });
    expect(ads.category).toBe('adsorbed');
    expect(ads.evidence.adsorbedFwhmV * 1000).toBeCloseTo(90.58, 1);
    expect(classifyCouple({ ...base, deltaEpV: 0.002, fwhmV: { anodic: 0.2, cathodic: null } }).category).toBe('inconclusive');
  });

  it('a couple with a shoulder peak is inconclusive, with the plain-numbers verdict among the reasons', () => {
    const v = classifyCouple({ ...base, ratio: 0.6, overlapping: true });
    expect(v.category).toBe('inconclusive');
    expect(v.reasons[1]).toMatch(/chemically coupled/);
  });

  it('thresholds follow the temperature and n (RT/nF units)', () => {
    const hot = classifyCouple({ ...base, deltaEpV: (0.0592 * 323.15) / 298.15, switchPastPeakV: (0.1215 * 323.15) / 298.15 }, { temperatureK: 323.15 });
    expect(hot.category).toBe('reversible');
    const n2 = classifyCouple({ ...base, deltaEpV: 0.0296, switchPastPeakV: 0.06075 }, { electronCount: 2 });
    expect(n2.category).toBe('reversible');
    expect(n2.evidence.reversibleHalfPeakWidthV).toBeCloseTo((2.2 * u) / 2, 12);
  });

  // Bard & Faulkner 2nd ed. §14.3 (from memory): a surface wave closes after its
  // peak and returns its charge; a diffusing one keeps ≈ half its current 6RT/nF past Ep.
  it('closed peaks with equal charges → adsorbed at ΔEp = 150 mV (Laviron label); open tails → quasi-reversible', () => {
    const wide = { ...base, deltaEpV: 0.15, fwhmV: { anodic: 0.117, cathodic: 0.117 }, chargeRatio: 1.0 };
    const ads = classifyCouple({ ...wide, tailFractions: { anodic: 0.002, cathodic: 0.003 } });
    expect(ads.category).toBe('adsorbed');
    expect(ads.label).toMatch(/slow electron transfer, Laviron/);
    expect(ads.reasons[0]).toMatch(/no diffusion tail/);
    expect(classifyCouple({ ...wide, tailFractions: { anodic: 0.5, cathodic: 0.55 } }).category).toBe('quasi-reversible');
    expect(classifyCouple({ ...wide, tailFractions: { anodic: 0.002, cathodic: 0.003 }, chargeRatio: 0.6 }).category).not.toBe('adsorbed');
  });
});
