/**
 * perAreaFit: a fit of current densities is per cm² (area 1), a held R_u becomes R_u·A (the drop
 * j·R_u·A equals i·R_u: Ohm's law, common practice, no source), and a mix is refused by name.
 */
import { describe, expect, it } from 'vitest';
import { perAreaFit } from './perAreaFit';

const cell = { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6, electronCount: 1, temperatureK: 298.15 };

describe('perAreaFit', () => {
  it('leaves currents as they are', () => {
    expect(perAreaFit([{ fileName: 'a.csv', currentKind: 'current' }, { fileName: 'b.csv' }], cell, 80, 0.0707)).toEqual({ cell, ruOhm: 80, perArea: false, notes: [] });
  });

  it('fits densities with A = 1 cm² and R_u·A in Ω·cm², or without R_u when no area is known', () => {
    const withArea = perAreaFit([{ fileName: 'j.csv', currentKind: 'density' }], cell, 80, 0.0707);
    expect(withArea.cell.areaCm2).toBe(1);
    expect(withArea.ruOhm).toBeCloseTo(80 * 0.0707, 12);
    expect(withArea.perArea).toBe(true);
    expect(withArea.notes).toHaveLength(1);
    const noArea = perAreaFit([{ fileName: 'j.csv', currentKind: 'density' }], cell, 80, null);
    expect(noArea.ruOhm).toBe(0);
    expect(noArea.notes[1]).toMatch(/R_u of the cell was not used/);
    expect(perAreaFit([{ fileName: 'j.csv', currentKind: 'density' }], cell, undefined, 0.0707).ruOhm).toBeUndefined();
  });

  it('refuses densities and currents together, naming the density files', () => {
    expect(() => perAreaFit([{ fileName: 'j.csv', currentKind: 'density' }, { fileName: 'i.csv', currentKind: 'current' }], cell, 0, 1)).toThrow(/"j\.csv" hold current densities/);
  });
});
