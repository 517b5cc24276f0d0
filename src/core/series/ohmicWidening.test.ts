import { describe, expect, it } from 'vitest';
import { ohmicWidening, weighOhmicAgainstKinetics } from './ohmicWidening';

// i·Ru moves each peak by the ohmic drop (Bard & Faulkner 2nd ed. §1.3.4, from memory); the rules on
// top are ours (ohmicWidening.ts).
describe('ohmicWidening', () => {
  // Worked by hand: reversible 58 mV; ΔEp 60 → 70 mV; i(Epa) − i(Epc) = 40 µA at the fastest rate.
  // With Ru = 200 Ω the drop there is 8 mV against a 12 mV widening (67 %): k° only a lower bound.
  // Without Ru, 12 mV / 40 µA = 300 Ω would explain it, and every n·ΔEp ≤ 72 mV: lower bound too.
  const files = [
    { fileIndex: 0, scanRateVPerS: 0.1, deltaEpV: 0.06, reversibleDeltaEpV: 0.058, peakCurrentSpanA: 20e-6 },
    { fileIndex: 1, scanRateVPerS: 1, deltaEpV: 0.07, reversibleDeltaEpV: 0.058, peakCurrentSpanA: 40e-6 },
  ];
  it('weighs the drop against the widening, with and without Ru', () => {
    const given = ohmicWidening(files, { ruOhm: 200 });
    expect(given.grows).toBe(true);
    expect(given.perFile[1]!.ohmicDropV).toBeCloseTo(0.008, 12);
    expect(given.ohmicShare).toBeCloseTo(0.008 / 0.012, 9);
    expect(given.limitsK0).toBe(true);
    const none = ohmicWidening(files);
    expect(none.explainingRuOhm).toBeCloseTo(300, 6);
    expect(none.limitsK0).toBe(true);
    expect(none.text).toMatch(/300 Ω/);
  });
  it('lets a widening well beyond the drop stand as kinetic', () => {
    const wide = files.map((f) => ({ ...f, deltaEpV: f.deltaEpV + (f.fileIndex ? 0.1 : 0.02) }));
    expect(ohmicWidening(wide, { ruOhm: 50 }).limitsK0).toBe(false);
    expect(ohmicWidening(wide).limitsK0).toBe(false);
  });
  it('does nothing when ΔEp does not grow, or for one file', () => {
    const flat = files.map((f) => ({ ...f, deltaEpV: 0.06 }));
    expect(ohmicWidening(flat).grows).toBe(false);
    expect(ohmicWidening(flat).limitsK0).toBe(false);
    expect(ohmicWidening([files[0]!]).limitsK0).toBe(false);
  });

  // Without Ru and beyond the near-reversible end: three files widening by 150 Ω × their
  // peak-current span (i·Ru, as above). When one Ru holds them no less steadily than one k° does,
  // k° stands and the text names that Ru; when k° holds them far more steadily, nothing is added
  // (the weighing rules are ours).
  const ohmicFiles = [20e-6, 60e-6, 180e-6].map((span, i) => ({ fileIndex: i, scanRateVPerS: 0.1 * 9 ** i, deltaEpV: 0.058 + 150 * span, reversibleDeltaEpV: 0.058, peakCurrentSpanA: span }));
  it('without Ru: an ohmic-looking widening is named beside k°, never turned into a bound by itself', () => {
    const base = ohmicWidening(ohmicFiles);
    expect(base.limitsK0).toBe(false);
    const drifting = weighOhmicAgainstKinetics(base, ohmicFiles, new Map([[0, [0.03]], [1, [0.036]], [2, [0.042]]]));
    expect(drifting.limitsK0).toBe(false);
    expect(drifting.text).toMatch(/one Ru ≈ 150 Ω .*k° is given as if all the widening were kinetic/);
    const kinetic = weighOhmicAgainstKinetics(base, ohmicFiles.map((f, i) => ({ ...f, deltaEpV: f.deltaEpV + [0.02, 0, -0.01][i]! })), new Map([[0, [0.03]], [1, [0.03]], [2, [0.03]]]));
    expect(kinetic).toBe(base);
  });
});
