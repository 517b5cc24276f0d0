/**
 * One peak window of a file: its potential range, the baseline chosen for the peak inside it and,
 * for a two-anchor baseline, the two anchor potentials. Potentials are shown on the display scale
 * and stored on the files' own scale.
 */
import type { BaselineMethod, BaselineSpec, PeakWindow } from '../../state/types';
import { NumberField } from './NumberField';

const METHODS: { value: BaselineMethod | 'default'; label: string }[] = [
  { value: 'default', label: 'method default' },
  { value: 'linear', label: 'straight line' },
  { value: 'polynomial', label: 'polynomial' },
  { value: 'two-point', label: 'two anchors' },
  { value: 'nicholson', label: 'forward decay (return peaks)' },
];

export interface WindowRowProps {
  index: number;
  window: PeakWindow;
  spec: BaselineSpec | undefined;
  offsetV: number;
  onWindow: (w: PeakWindow) => void;
  onSpec: (spec: BaselineSpec | null) => void;
  onRemove: () => void;
}

function round(v: number): number {
  return Math.round(v * 10000) / 10000;
}

export function WindowRow({ index, window: w, spec, offsetV, onWindow, onSpec, onRemove }: WindowRowProps) {
  const setMethod = (m: BaselineMethod | 'default') => {
    if (m === 'default') return onSpec(null);
    const next: BaselineSpec = { direction: w.direction, fromV: w.fromV, toV: w.toV, method: m };
    if (m === 'two-point') next.anchorsV = spec?.anchorsV ?? [w.fromV, w.toV];
    onSpec(next);
  };
  const anchors = spec?.method === 'two-point' ? (spec.anchorsV ?? [w.fromV, w.toV]) : null;
  const setAnchor = (k: 0 | 1, v: number) => {
    if (!spec || !anchors) return;
    const next: [number, number] = [anchors[0], anchors[1]];
    next[k] = v - offsetV;
    onSpec({ ...spec, anchorsV: next });
  };
  return (
    <fieldset className={`window ${w.direction}`} data-testid="peak-window">
      <legend>{w.direction} window {index + 1}</legend>
      <NumberField label="from" unit="V" value={round(w.fromV + offsetV)} onCommit={(v) => v !== null && onWindow({ ...w, fromV: v - offsetV })} />
      <NumberField label="to" unit="V" value={round(w.toV + offsetV)} onCommit={(v) => v !== null && onWindow({ ...w, toV: v - offsetV })} />
      <label className="field">
        baseline
        <select value={spec?.method ?? 'default'} data-testid="window-baseline" onChange={(e) => setMethod(e.target.value as BaselineMethod | 'default')}>
          {METHODS.map((m) => <option key={m.value} value={m.value}>{m.label}</option>)}
        </select>
      </label>
      <button type="button" onClick={onRemove} aria-label={`Remove ${w.direction} window ${index + 1}`}>Remove</button>
      {anchors ? (
        <>
          <NumberField label="anchor 1" unit="V" value={round(anchors[0] + offsetV)} onCommit={(v) => v !== null && setAnchor(0, v)} />
          <NumberField label="anchor 2" unit="V" value={round(anchors[1] + offsetV)} onCommit={(v) => v !== null && setAnchor(1, v)} />
        </>
      ) : null}
    </fieldset>
  );
}
