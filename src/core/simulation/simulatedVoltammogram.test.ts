import { describe, expect, it } from 'vitest';
import { simulatedVoltammogram } from './simulatedVoltammogram';

describe('simulatedVoltammogram', () => {
  it('two cycles of 0.3 → −0.3 → 0.3 V give four sweeps in two cycles and carry the scan rate', () => {
    const v = simulatedVoltammogram({ cycles: 2, scanRateVPerS: 0.5 });
    expect(v.cycles).toHaveLength(2);
    expect(v.segments.map((s) => s.direction)).toEqual(['negative', 'positive', 'negative', 'positive']);
    expect(v.segments[0]?.end).toBe(601);
    expect(v.scanRateVPerS).toBe(0.5);
    expect(v.timeS?.[600]).toBeCloseTo(1.2, 12);
  });
});
