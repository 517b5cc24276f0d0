/**
 * Baseline choice for one found peak: stored as a per-file baseline choice covering ±20 mV around
 * its Ep on the file's recording scale (the peak is shown on the display scale, `offsetV` away),
 * which the analysis applies to the peak whose Ep falls inside.
 */
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { BaselineMethod, BaselineSpec, PeakResult } from '../../state/types';

const HALF_RANGE_V = 0.02;
const OPTIONS: { value: BaselineMethod | 'default'; label: string }[] = [
  { value: 'default', label: 'method default' },
  { value: 'linear', label: 'straight line' },
  { value: 'polynomial', label: 'polynomial' },
  { value: 'nicholson', label: 'forward decay' },
];

const covers = (b: BaselineSpec, p: PeakResult, recordedV: number) =>
  b.direction === p.direction && Math.min(b.fromV, b.toV) <= recordedV && recordedV <= Math.max(b.fromV, b.toV);

export function PeakBaselineSelect({ peak, label, offsetV }: { peak: PeakResult; label: string; offsetV: number }) {
  const id = useHalfwave((s) => s.selectedFileId);
  const recordedV = peak.potentialV - offsetV;
  const spec = useHalfwave((s) => (id ? s.fileSettings[id]?.baselines.find((b) => covers(b, peak, recordedV)) : undefined));
  if (!id) return null;
  const choose = (m: BaselineMethod | 'default') => void halfwaveActions().updateFileSettings(id, (f) => {
    const rest = f.baselines.filter((b) => !covers(b, peak, recordedV));
    const mine: BaselineSpec[] = m === 'default' ? [] : [{ direction: peak.direction, fromV: recordedV - HALF_RANGE_V, toV: recordedV + HALF_RANGE_V, method: m }];
    return { ...f, baselines: [...rest, ...mine] };
  });
  return (
    <select aria-label={label} value={spec?.method ?? 'default'} data-testid="peak-baseline" onChange={(e) => choose(e.target.value as BaselineMethod | 'default')}>
      {OPTIONS.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
      {spec && !OPTIONS.some((o) => o.value === spec.method) ? <option value={spec.method}>{spec.method}</option> : null}
    </select>
  );
}
