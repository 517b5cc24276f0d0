/**
 * A totally irreversible couple traced with both peaks (ΔEp far beyond Nicholson's table) must be
 * paired into one couple and read as slow electron transfer, checked against this project's
 * simulator (src/core/simulation, validated against the irreversible Randles–Ševčík constant).
 */
import { describe, expect, it } from 'vitest';
import { thermalVoltageV } from '../constants';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeVoltammogram } from './analyzeVoltammogram';

const u = thermalVoltageV(298.15);

describe('analyzeVoltammogram on a totally irreversible couple', () => {
  // Bard & Faulkner 2nd ed. §6.3 (from memory): |Ep − Ep/2| = 1.857RT/(αnF) =
  // 47.7/α mV = 95.4 mV at α = 0.5; Wang (2000) eq. 2-5 puts each peak ≈ 0.34 V from E°′ here,
  // so ΔEp ≈ 0.7 V, beyond the old 0.6 V pairing limit.
  it('k° = 1e-5 cm/s, α = 0.5, 0.1 V/s over ±0.9 V: one couple, ΔEp ≈ 0.7 V, |Ep − Ep/2| = 95.4 ± 2 mV, label irreversible (slow electron transfer)', () => {
    const v = simulatedVoltammogram({ k0CmPerS: 1e-5, alpha: 0.5, startV: 0.9, switchV: -0.9 }, { noiseA: 5e-9, seed: 7 });
    const a = analyzeVoltammogram(v);
    const couples = a.cycles[0]!.couples;
    expect(couples).toHaveLength(1);
    const c = couples[0]!;
    expect(c.deltaEpV!).toBeGreaterThan(0.6);
    expect(c.deltaEpV!).toBeLessThan(0.8);
    expect(Math.abs(c.cathodicHalfPeakWidthV! - (1.857 * u) / 0.5)).toBeLessThan(0.002);
    expect(c.verdict.category).toBe('irreversible');
    expect(c.verdict.label).toBe('irreversible (slow electron transfer)');
    expect(c.verdict.reasons.join(' ')).toMatch(/return peak exists/);
    expect(c.verdict.reasons.join(' ')).toMatch(/αn = 0\.(49|50|51)/);
    expect(a.cycles[0]!.warnings.filter((w) => w.code === 'UNPAIRED_PEAK')).toHaveLength(0);
  });

  // Same source: two independent irreversible couples 0.5 V apart keep their own partners (the
  // wide limit applies only when each direction has a single dominant peak).
  it('two comparable irreversible couples are not cross-paired', () => {
    const v = simulatedVoltammogram(
      { k0CmPerS: 1e-3, alpha: 0.5, formalPotentialV: 0.25, startV: 0.9, switchV: -0.9 },
      { extra: [{ k0CmPerS: 1e-3, alpha: 0.5, formalPotentialV: -0.35 }] },
    );
    const couples = analyzeVoltammogram(v).cycles[0]!.couples.filter((c) => c.deltaEpV !== null);
    for (const c of couples) expect(c.deltaEpV!).toBeLessThan(0.6);
  });
});

describe('a totally irreversible wave started on its own long foot', () => {
  // Nicholson & Shain, Anal. Chem. 36 (1964) 706; Bard & Faulkner 2nd ed. §6.3 (from memory): far
  // before its peak a totally irreversible wave's current is e^x, and with the peak at x = 0.21,
  // √π·χ = 0.4958, the foot is 4.4·e^(−αnFξ/RT) of the peak: at α = 0.3, 1.3 % at 500 mV before
  // Ep, 0.01 % at 900 mV. The first must be named (the sweep starts on the wave), the second not.
  const epOf = (startV: number) => analyzeVoltammogram(simulatedVoltammogram({ k0CmPerS: 1e-5, alpha: 0.3, startV, switchV: -1.4 })).cycles[0]!.peaks.find((p) => p.direction === 'cathodic')!.potentialV;
  const ep = epOf(0.6);
  const onFoot = (before: number) => {
    const a = analyzeVoltammogram(simulatedVoltammogram({ k0CmPerS: 1e-5, alpha: 0.3, startV: ep + before, switchV: -1.4 }));
    return a.cycles[0]!.warnings.filter((w) => w.code === 'START_ON_FOOT');
  };
  it('is named START_ON_FOOT at 500 mV before Ep, with about 1 % of its peak there', () => {
    const w = onFoot(0.5);
    expect(w).toHaveLength(1);
    const share = Number(/carries about ([\d.]+) %/.exec(w[0]!.message)?.[1]);
    expect(share).toBeGreaterThan(0.9);
    expect(share).toBeLessThan(1.7);
  });
  it('is not named at 900 mV before Ep', () => {
    expect(onFoot(0.9)).toHaveLength(0);
  });
});
