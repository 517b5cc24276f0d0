import { describe, expect, it } from 'vitest';
import { describeLayout } from './describeLayout';
import { importVoltammogram } from './importVoltammogram';

// The layout line is our own wording (no external source); it must name every decision the importer made.
describe('describeLayout', () => {
  it('names the delimiter, decimal mark, header, rows, columns with units and the current sign', () => {
    const text = 't/s,E/V,I/uA\n0,0.1,1.5\n0.1,0.11,1.6\n0.2,0.12,1.7\n0.3,0.13,1.8\n0.4,0.12,1.7\n0.5,0.11,1.6\n0.6,0.10,1.5\n';
    const { measurement } = importVoltammogram('a.csv', new TextEncoder().encode(text));
    expect(describeLayout(measurement)).toBe('comma-separated, decimal point, header on line 1, rows 2–8 (7 read, 0 skipped), time t/s [s], potential E/V [V], current I/uA [µA], current sign anodic positive (IUPAC)');
  });
});
