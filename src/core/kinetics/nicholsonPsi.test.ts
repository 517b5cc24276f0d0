import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { NICHOLSON_TABLE, lavagniniPsi, nicholsonPsi, nicholsonTablePsi } from './nicholsonPsi';

describe('nicholsonPsi', () => {
  // Nicholson, Anal. Chem. 37, 1351 (1965), Table I (from memory): 84 mV → ψ = 1.00.
  it('returns the exact table row at 84 mV', () => {
    expect(nicholsonPsi(0.084, { method: 'table' }).psi).toBeCloseTo(1, 12);
    for (const row of NICHOLSON_TABLE) expect(nicholsonTablePsi(row.nDeltaEpMv)).toBeCloseTo(row.psi, 10);
  });
  // Lavagnini, Antiochia & Magno, Electroanalysis 16, 505 (2004) (from memory): X = 84 → 1.0570; X = 63 → 6.993.
  it('reproduces the Lavagnini fit values', () => {
    expect(lavagniniPsi(84)).toBeCloseTo(1.057, 3);
    expect(lavagniniPsi(63)).toBeCloseTo(6.993, 3);
    const r = nicholsonPsi(0.084, { method: 'lavagnini' });
    expect(r.source).toBe('lavagnini-2004-fit');
    expect(r.psi).toBeCloseTo(1.057, 3);
  });
  // Nicholson (1965) Table I is the default: 72 mV → ψ = 2.00 (the fit would give 2.13, +6.6 %), and
  // no jump where the fit's range ends at 141 mV (ψ = 0.25 from both sides).
  it('uses the table by default: 72 mV → 2.00, continuous through 141 mV', () => {
    const r = nicholsonPsi(0.072);
    expect(r.source).toBe('nicholson-1965-table');
    expect(r.psi).toBeCloseTo(2, 10);
    expect(lavagniniPsi(72) / 2 - 1).toBeGreaterThan(0.06);
    const below = nicholsonPsi(0.14099).psi;
    const above = nicholsonPsi(0.14101).psi;
    expect(Math.abs(above / below - 1)).toBeLessThan(1e-3);
  });
  // Lavagnini et al. (2004) fit vs Nicholson (1965) Table I, computed: the fit stays within 7 % of the table over 63–141 mV.
  it('fit and table agree within 7 % inside 63–141 mV', () => {
    for (const row of NICHOLSON_TABLE.filter((r) => r.nDeltaEpMv >= 63 && r.nDeltaEpMv <= 141)) {
      expect(Math.abs(lavagniniPsi(row.nDeltaEpMv) / row.psi - 1)).toBeLessThan(0.07);
    }
  });
  // Design choice, no source: refuse outside the table's 61–212 mV; the fit alone refuses outside 63–141 mV.
  it('refuses 60 mV everywhere and 212 mV for the fit, and uses the table at 212 mV by default', () => {
    expect(() => nicholsonPsi(0.06)).toThrow(AnalysisError);
    expect(() => nicholsonPsi(0.06, { method: 'table' })).toThrow(/not determinable/);
    expect(() => nicholsonPsi(0.212, { method: 'lavagnini' })).toThrow(/63–141/);
    const edge = nicholsonPsi(0.212);
    expect(edge.source).toBe('nicholson-1965-table');
    expect(edge.psi).toBeCloseTo(0.1, 10);
    expect(() => nicholsonPsi(0.25)).toThrow(/irreversible/);
  });
  it('interpolates monotonically between table rows', () => {
    let prev = Infinity;
    for (let x = 61; x <= 212; x += 0.25) {
      const psi = nicholsonTablePsi(x);
      expect(psi).toBeLessThan(prev);
      prev = psi;
    }
  });
  // Working curve is a function of nFΔEp/RT (Nicholson 1965): n = 2 halves ΔEp; 50 °C stretches it.
  it('scales ΔEp by n and by temperature', () => {
    expect(nicholsonPsi(0.042, { electronCount: 2 }).psi).toBeCloseTo(nicholsonTablePsi(84), 10);
    const hot = nicholsonPsi(0.084 * (323.15 / 298.15), { temperatureK: 323.15 });
    expect(hot.nDeltaEpMv25).toBeCloseTo(84, 10);
  });
});
