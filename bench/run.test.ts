import { describe, expect, it } from 'vitest';
import { keyedFigures, REGISTRY } from './run';

// The machine-readable bench line: only keyed rows, rounded to 6 significant digits (common practice, no source).
describe('bench --json figures', () => {
  it('collects the keyed rows and leaves the others in the table only', () => {
    const rows = [
      { name: 'a', value: 1.23456789, unit: 'ms', key: 'importMBps' },
      { name: 'b', value: 2, unit: 'ms' },
      { name: 'c', value: 0.5, unit: '×', key: 'importVsPapaparse' },
    ];
    expect(keyedFigures(rows)).toEqual({ importMBps: 1.23457, importVsPapaparse: 0.5 });
  });

  it('refuses a key used by two rows', () => {
    expect(() => keyedFigures([{ name: 'a', value: 1, unit: '', key: 'x' }, { name: 'b', value: 2, unit: '', key: 'x' }])).toThrow(/used by two rows/);
  });

  it('registers the hostile-input and fit benches beside the others', () => {
    expect(REGISTRY.map((e) => e.title)).toEqual(['simulation', 'import', 'analysis', 'scale', 'hostile input', 'fit']);
  });
});
