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

  // A slow film (Laviron): E½ stays near 0.2 V while Epc runs out to 0.03 V at 20 V/s; at 50 V/s the
  // anodic peak has left the window and the cathodic one, at −0.006 V, stands alone. It follows the
  // cathodic peaks' trend, 34 mV on, not the E½ 210 mV away.
  it('puts a lone peak with the group whose latest peak of the same direction is nearest', () => {
    const pair = (epa: number, epc: number) => fakeAnalysis([{ epaV: epa, epcV: epc, ipaA: 1e-6, ipcA: 1e-6 }]).cycles[0]?.couples ?? [];
    const lone = fakeAnalysis([{ epaV: null, epcV: -0.006, ipaA: null, ipcA: 1e-6 }]).cycles[0]?.couples ?? [];
    const files = [
      { scanRateVPerS: 10, couples: pair(0.47, 0.053) },
      { scanRateVPerS: 20, couples: pair(0.529, 0.028) },
      { scanRateVPerS: 50, couples: lone },
    ];
    const groups = matchSeriesCouples(files, 0.1);
    expect(groups).toHaveLength(1);
    expect(groups[0]?.map((r) => r.fileIndex)).toEqual([0, 1, 2]);
  });
});
