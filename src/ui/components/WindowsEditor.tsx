/** Per-file peak windows and the baseline chosen for the peak inside each, as numbers. */
import { useMemo } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { BaselineSpec, FileAnalysisSettings, PeakWindow } from '../../state/types';
import { useSeriesScale } from './useSeriesCell';
import { WindowRow } from './WindowRow';

const sameRange = (b: BaselineSpec, w: PeakWindow) => b.direction === w.direction && b.fromV === w.fromV && b.toV === w.toV;

export function WindowsEditor() {
  const id = useHalfwave((s) => s.selectedFileId);
  const fs = useHalfwave((s) => (id ? s.fileSettings[id] : undefined));
  const m = useHalfwave((s) => (id ? s.files[id]?.measurement : undefined));
  const off = useSeriesScale(useHalfwave((s) => (id ? (s.files[id]?.group ?? null) : null))).offsetV;
  const span = useMemo(() => (m ? potentialSpan(m.potentialV) : null), [m]);
  if (!id || !span) return null;
  const windows = fs?.peakWindows ?? [];
  const update = (change: (f: FileAnalysisSettings) => FileAnalysisSettings) => void halfwaveActions().updateFileSettings(id, change);
  // A window's baseline choice follows the window when its range is edited.
  const setWindow = (k: number, w: PeakWindow) => update((f) => {
    const old = f.peakWindows[k];
    return {
      peakWindows: f.peakWindows.map((x, i) => (i === k ? w : x)),
      baselines: f.baselines.map((b) => (old && sameRange(b, old) ? { ...b, fromV: w.fromV, toV: w.toV } : b)),
    };
  });
  const setSpec = (w: PeakWindow, spec: BaselineSpec | null) => update((f) => ({
    ...f, baselines: [...f.baselines.filter((b) => !sameRange(b, w)), ...(spec ? [spec] : [])],
  }));
  const remove = (k: number) => update((f) => {
    const old = f.peakWindows[k];
    return { peakWindows: f.peakWindows.filter((_, i) => i !== k), baselines: f.baselines.filter((b) => !(old && sameRange(b, old))) };
  });
  return (
    <div className="windows" data-testid="windows-editor">
      <h3>Peak windows of this file</h3>
      {windows.length === 0 ? <p className="hint">Automatic search. Choose “mark a peak window” above the plot and drag across a peak, or add one here.</p> : null}
      {windows.map((w, k) => (
        <WindowRow key={k} index={k} window={w} spec={fs?.baselines.find((b) => sameRange(b, w))} offsetV={off}
          onWindow={(nw) => setWindow(k, nw)} onSpec={(spec) => setSpec(w, spec)} onRemove={() => remove(k)} />
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
