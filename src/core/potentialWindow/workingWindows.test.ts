/**
 * The working-window table: complete, ordered, sourced, and consistent with the Nernst equation
 * and with the reference table it is converted through.
 */
import { describe, expect, it } from 'vitest';
import { convertPotential } from '../reference';
import { ELECTRODE_MATERIALS, WINDOW_MEDIA, WORKING_WINDOWS, workingWindow } from './workingWindows';

const width = (m: string, medium: string) => {
  const w = WORKING_WINDOWS.find((x) => x.material === m && x.medium === medium);
  return (w?.upper?.potentialV ?? Number.NaN) - (w?.lower?.potentialV ?? Number.NaN);
};

describe('working windows', () => {
  it('covers every material in every medium, each limit below the other and with its source', () => {
    for (const m of ELECTRODE_MATERIALS) {
      for (const medium of WINDOW_MEDIA) {
        const w = workingWindow(m.id, medium.id);
        if (w.lower === null || w.upper === null) {
          expect(w.note).toMatch(/not usable/);
          continue;
        }
        expect(w.lower.potentialV).toBeLessThan(w.upper.potentialV);
        expect(w.lower.source).toMatch(/from memory|Handbook|ed\./);
        expect(w.upper.source).toMatch(/from memory|Handbook|ed\./);
        expect(w.lower.process.length).toBeGreaterThan(3);
      }
    }
    expect(WORKING_WINDOWS).toHaveLength(ELECTRODE_MATERIALS.length * WINDOW_MEDIA.length);
  });

  // Hydrogen evolution follows the reversible hydrogen electrode, E = −(ln 10)RT/F·pH vs SHE
  // (Nernst equation; Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §2.1, from memory):
  // on platinum, where the overpotential is small, the acid and base limits are 13 pH units apart,
  // so 13 × 59.16 mV = 0.769 V, within 0.1 V (the table's limits are rounded guides).
  it('the hydrogen limit on platinum moves by −59 mV per pH unit between acid and base', () => {
    const acid = workingWindow('platinum', 'aqueous-acid').lower?.potentialV as number;
    const base = workingWindow('platinum', 'aqueous-base').lower?.potentialV as number;
    expect(Math.abs((acid - base) - 13 * 0.05916)).toBeLessThan(0.1);
  });

  // Common practice, no source: diamond has the widest aqueous window, platinum the narrowest of
  // the carbon-free metals in acid, and carbon has a larger hydrogen overpotential than platinum.
  it('orders the materials as practice knows them', () => {
    for (const medium of ['aqueous-acid', 'aqueous-neutral', 'aqueous-base']) {
      for (const m of ['platinum', 'gold', 'glassy-carbon', 'carbon-paste']) expect(width('boron-doped-diamond', medium)).toBeGreaterThan(width(m, medium));
    }
    expect(workingWindow('glassy-carbon', 'aqueous-acid').lower?.potentialV).toBeLessThan(workingWindow('platinum', 'aqueous-acid').lower?.potentialV as number);
  });

  // SCE = +0.2412 V vs SHE (Bard & Faulkner 2001, inside back cover), through the app's table.
  it('an organic-medium limit on the SCE scale converts to SHE by +0.2412 V', () => {
    const w = workingWindow('glassy-carbon', 'acetonitrile-tetraalkylammonium');
    expect(w.reference).toBe('SCE');
    expect(convertPotential(w.upper?.potentialV as number, 'SCE', 'SHE')).toBeCloseTo(2.4 + 0.2412, 10);
  });

  it('refuses a combination the table does not have', () => {
    expect(() => workingWindow('platinum', 'molten-salt' as never)).toThrow(/no working window/);
  });
});
