import { describe, expect, it } from 'vitest';
import { matchSeriesCouples } from './matchSeriesCouples';
import { fakeAnalysis } from './seriesTestSupport';

const couplesAt = (...halves: number[]) => fakeAnalysis(halves.map((e) => ({ epaV: e + 0.03, epcV: e - 0.03, ipaA: 1e-6, ipcA: 1e-6 }))).cycles[0]?.couples ?? [];

describe('matchSeriesCouples (design: nearest group, tracked from slow to fast)', () => {
  it('follows a couple that drifts 60 mV per step while keeping a neighbour apart', () => {
    const files = [
      { scanRateVPerS: 0.1, couples: couplesAt(0, 0.3) },
      { scanRateVPerS: 1, couples: couplesAt(-0.06, 0.3) },
      { scanRateVPerS: 10, couples: couplesAt(-0.12, 0.3) },
    ];
    const groups = matchSeriesCouples(files, 0.1);
    expect(groups).toHaveLength(2);
    expect(groups[0]?.map((r) => r.fileIndex)).toEqual([0, 1, 2]);
    expect(groups[0]?.map((r) => r.positionV)).toEqual([0, -0.06, -0.12].map((x) => expect.closeTo(x, 12)));
  });
  it('opens a new group for a couple found only at some scan rates and sorts files by scan rate', () => {
    const files = [
      { scanRateVPerS: 1, couples: couplesAt(0, 0.5) },
      { scanRateVPerS: 0.1, couples: couplesAt(0) },
    ];
    const groups = matchSeriesCouples(files, 0.1);
    expect(groups).toHaveLength(2);
    expect(groups[0]?.map((r) => r.fileIndex)).toEqual([1, 0]);
    expect(groups[1]).toHaveLength(1);
  });
});
