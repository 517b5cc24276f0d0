// A file that states no sign convention is read as IUPAC (anodic positive); when its first cycle's
// loop runs the other way round (core/sweeps/loopOrientation.ts: Bard & Faulkner, Electrochemical
// Methods, 2nd ed. (2001), §1.2.2 and §6.2, from memory) the import says so, and changes nothing.
import { describe, expect, it } from 'vitest';
import { simulatedVoltammogram } from '../core/peaks/simulatedVoltammogram';
import { importVoltammogram } from './importVoltammogram';

const v = simulatedVoltammogram({ formalPotentialV: 0.2, k0CmPerS: Infinity, scanRateVPerS: 0.1, startV: 0.5, switchV: -0.1 });

function csv(sign: 1 | -1, preamble: string[] = []): ArrayBuffer {
  const rows = Array.from(v.potentialV, (e, k) => `${(k * 0.001 / 0.1).toFixed(4)},${e.toFixed(4)},${(sign * (v.currentA[k] as number)).toExponential(6)}`);
  return new TextEncoder().encode([...preamble, 'time_s,potential_V,current_A', ...rows].join('\n')).buffer as ArrayBuffer;
}

const doubted = (r: ReturnType<typeof importVoltammogram>) => r.warnings.filter((w) => w.code === 'CONVENTION_DOUBTED');

describe('a sign convention the data contradict', () => {
  it('is not doubted for currents written anodic-positive', () => {
    expect(doubted(importVoltammogram('iupac.csv', csv(1), {}))).toEqual([]);
  });

  it('is doubted, in words naming the file and the fix, for cathodic-positive currents the file does not declare', () => {
    const r = importVoltammogram('cathodic_positive.csv', csv(-1), {});
    const [w, ...more] = doubted(r);
    expect(more).toEqual([]);
    expect(w?.message).toMatch(/^cathodic_positive\.csv: /);
    expect(w?.message).toMatch(/polarographic/);
    expect(r.measurement.detection.currentConvention.explanation).toMatch(/polarographic way round .*: check$/);
    // Said, not changed: the currents stay as written.
    expect(r.measurement.currentConvention).toBe('iupac');
    const k = 300;
    expect(Math.abs((r.measurement.currentA[k] as number) + (v.currentA[k] as number))).toBeLessThan(1e-6 * Math.abs(v.currentA[k] as number));
  });

  it('is not doubted when the file states its convention, or the user chose one', () => {
    const stated = importVoltammogram('stated.csv', csv(-1, ['Current convention: polarographic (cathodic positive)']), {});
    expect(stated.measurement.currentConvention).toBe('polarographic');
    expect(doubted(stated)).toEqual([]);
    expect(doubted(importVoltammogram('chosen.csv', csv(-1), { overrides: { currentConvention: 'polarographic' } }))).toEqual([]);
    // An anodic-positive file the user calls polarographic: the user's word stands, unquestioned.
    expect(doubted(importVoltammogram('chosen.csv', csv(1), { overrides: { currentConvention: 'polarographic' } }))).toEqual([]);
  });
});
