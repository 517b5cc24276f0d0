/** Per-file peak windows and the baseline chosen for the peak inside each, as numbers. */
import { useMemo } from 'react';
import type { BaselineMethod, BaselineSpec, PeakWindow } from '../../core/analysis/types';
import { displayScale } from '../../state/display';
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { FileAnalysisSettings } from '../../state/types';
import { NumberField } from './NumberField';

const METHODS: { value: BaselineMethod | 'default'; label: string }[] = [
  { value: 'default', label: 'method default' },
  { value: 'linear', label: 'straight line' },
  { value: 'polynomial', label: 'polynomial' },
  { value: 'two-point', label: 'two anchors (window ends)' },
  { value: 'nicholson', label: 'forward decay (return peaks)' },
];

export function WindowsEditor() {
  const id = useHalfwave((s) => s.selectedFileId);
  const fs = useHalfwave((s) => (id ? s.fileSettings[id] : undefined));
  const settings = useHalfwave((s) => s.settings);
  const m = useHalfwave((s) => (id ? s.files[id]?.measurement : undefined));
  const span = useMemo(() => (m ? potentialSpan(m.potentialV) : null), [m]);
  if (!id || !span) return null;
  const off = displayScale(settings).offsetV;
  const windows = fs?.peakWindows ?? [];
  const update = (change: (f: FileAnalysisSettings) => FileAnalysisSettings) => void halfwaveActions().updateFileSettings(id, change);
  const setWindow = (k: number, w: PeakWindow) => update((f) => ({ ...f, peakWindows: f.peakWindows.map((x, i) => (i === k ? w : x)) }));
  const specFor = (w: PeakWindow) => fs?.baselines.find((b) => b.direction === w.direction && b.fromV === w.fromV && b.toV === w.toV);
  const setMethod = (w: PeakWindow, m: BaselineMethod | 'default') => update((f) => {
    const rest = f.baselines.filter((b) => !(b.direction === w.direction && b.fromV === w.fromV && b.toV === w.toV));
    const spec: BaselineSpec = { direction: w.direction, fromV: w.fromV, toV: w.toV, method: m === 'default' ? 'linear' : m };
    if (m === 'two-point') spec.anchorsV = [w.fromV, w.toV];
    return { ...f, baselines: m === 'default' ? rest : [...rest, spec] };
  });
  return (
    <div className="windows" data-testid="windows-editor">
      <h3>Peak windows of this file</h3>
      {windows.length === 0 ? <p className="hint">Automatic search. Choose “mark a peak window” above the plot and drag across a peak, or add one here.</p> : null}
      {windows.map((w, k) => (
        <fieldset key={k} className={`window ${w.direction}`} data-testid="peak-window">
          <legend>{w.direction} window {k + 1}</legend>
          <NumberField label="from" unit="V" value={round(w.fromV + off)} onCommit={(v) => v !== null && setWindow(k, { ...w, fromV: v - off })} />
          <NumberField label="to" unit="V" value={round(w.toV + off)} onCommit={(v) => v !== null && setWindow(k, { ...w, toV: v - off })} />
          <label className="field">
            baseline
            <select value={specFor(w)?.method ?? 'default'} onChange={(e) => setMethod(w, e.target.value as BaselineMethod | 'default')}>
              {METHODS.map((m) => <option key={m.value} value={m.value}>{m.label}</option>)}
            </select>
          </label>
          <button type="button" onClick={() => update((f) => ({ ...f, peakWindows: f.peakWindows.filter((_, i) => i !== k) }))}>Remove</button>
        </fieldset>
      ))}
      <div className="buttons">
        {(['anodic', 'cathodic'] as const).map((d) => (
          <button key={d} type="button" data-testid={`add-${d}-window`}
            onClick={() => update((f) => ({ ...f, peakWindows: [...f.peakWindows, { direction: d, fromV: span.mid - span.width / 10, toV: span.mid + span.width / 10 }] }))}>
            + {d} window
          </button>
        ))}
      </div>
    </div>
  );
}

function potentialSpan(e: Float64Array): { mid: number; width: number } {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of e) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return { mid: (lo + hi) / 2, width: hi - lo };
}

function round(v: number): number {
  return Math.round(v * 10000) / 10000;
}
