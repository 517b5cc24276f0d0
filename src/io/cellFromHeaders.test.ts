import { describe, expect, it } from 'vitest';
import { diskAreaCm2 } from '../core/units';
import { cellFromHeaders } from './cellFromHeaders';
import { importVoltammogram } from './importVoltammogram';

const table = 'E/V,I/A\n0.1,1e-6\n0.2,2e-6\n0.3,3e-6\n0.4,2e-6\n0.3,1e-6\n0.2,0\n0.1,-1e-6\n';
const read = (name: string, preamble: string[]) => importVoltammogram(name, new TextEncoder().encode(`${preamble.join('\n')}\n${table}`)).measurement;

// Geometric area of a disk, π d²/4 (elementary geometry); 2 mm → 0.031416 cm².
describe('cellFromHeaders', () => {
  it('reads a disk diameter and a pseudo-reference wire written in words, with the line as evidence', () => {
    const m = read('cv.csv', ['WE: Pt disk 2 mm', 'RE: Ag wire pseudo-reference', 'CE: Pt coil']);
    const c = cellFromHeaders([m]);
    expect(c.values.areaCm2).toBeCloseTo(diskAreaCm2(0.2), 12);
    expect(c.values.inputReference).toBe('pseudo');
    expect(c.evidence.areaCm2).toMatchObject({ fileName: 'cv.csv', line: 1 });
    expect(c.evidence.areaCm2?.text).toMatch(/Pt disk 2 mm/);
    expect(c.evidence.inputReference).toMatchObject({ line: 2, text: 'Ag wire pseudo-reference' });
    expect(c.notes).toEqual([]);
  });
  it.each([
    ['Working electrode: glassy carbon, 3 mm disk', diskAreaCm2(0.3)],
    ['Electrode: Au, d = 1.6 mm', diskAreaCm2(0.16)],
    ['WE diameter: 10 µm', diskAreaCm2(1e-3)],
    ['Electrode A = 0.071 cm²', 0.071],
    ['Working electrode: carbon paste, 3 mm disk (0.0707 cm2)', 0.0707],
  ])('"%s" gives %f cm²', (line, area) => {
    expect(cellFromHeaders([read('x.csv', [line])]).values.areaCm2).toBeCloseTo(area, 9);
  });
  it('does not take a reference or counter electrode size as the working area', () => {
    expect(cellFromHeaders([read('x.csv', ['Counter electrode: Pt disk 5 mm'])]).values.areaCm2).toBeUndefined();
  });
  it('reads Ag/Ag⁺ and SCE, notes an unknown reference and a second file that disagrees', () => {
    expect(cellFromHeaders([read('a.csv', ['Reference: Ag/Ag+ 0.01 M'])]).values.inputReference).toBe('AgAg+');
    expect(cellFromHeaders([read('a.csv', ['Reference electrode: SCE'])]).values.inputReference).toBe('SCE');
    const c = cellFromHeaders([read('a.csv', ['RE: home-made', 'WE: 3 mm disk']), read('b.csv', ['WE: 2 mm disk'])]);
    expect(c.notes.join(' ')).toMatch(/"home-made" is not in the table/);
    expect(c.notes.join(' ')).toMatch(/b\.csv states area/);
    expect(c.values.areaCm2).toBeCloseTo(diskAreaCm2(0.3), 12);
  });
});
