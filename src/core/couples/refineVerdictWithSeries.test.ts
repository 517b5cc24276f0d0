import { describe, expect, it } from 'vitest';
import { classifyCouple } from './classifyCouple';
import { refineVerdictWithSeries } from './refineVerdictWithSeries';

const nernstian = classifyCouple({
  deltaEpV: 0.0592,
  ratio: 1,
  halfPeakWidthsV: { anodic: 0.0565, cathodic: 0.0565 },
  fwhmV: { anodic: null, cathodic: null },
  switchPastPeakV: 0.1215,
  hasAnodic: true,
  hasCathodic: true,
});

describe('refineVerdictWithSeries', () => {
  // Slope 0.5 for diffusion, ip ∝ v^½ (Randles–Ševčík, Bard & Faulkner 2nd ed. §6.2).
  it('slope 0.5 and no Ep drift keep a reversible verdict and add reasons', () => {
    const r = refineVerdictWithSeries(nernstian, { logLogSlope: 0.5, epaShiftVPerDecade: 0.001, count: 5 });
    expect(r.category).toBe('reversible');
    expect(r.reasons.length).toBe(nernstian.reasons.length + 2);
    expect(nernstian.reasons.length).toBeLessThan(r.reasons.length);
  });

  // Wang (2000) §2-1.1.1: reversible Ep does not depend on v; 30 mV/decade is kinetic.
  it('an Ep drift of 30 mV per decade turns reversible into quasi-reversible', () => {
    expect(refineVerdictWithSeries(nernstian, { epcShiftVPerDecade: -0.03 }).category).toBe('quasi-reversible');
  });

  // Slope 1 for a surface-confined species, ip ∝ v (Bard & Faulkner 2nd ed. §14.3; Laviron 1974; from memory).
  it('slope 1 contradicts a diffusion verdict → inconclusive', () => {
    expect(refineVerdictWithSeries(nernstian, { logLogSlope: 1.0 }).category).toBe('inconclusive');
  });

  it('empty evidence changes nothing', () => {
    expect(refineVerdictWithSeries(nernstian, {})).toEqual(nernstian);
  });
});
