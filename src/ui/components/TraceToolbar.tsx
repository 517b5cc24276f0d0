/** Controls above the trace: cycle, overlays, and what a drag on the plot does. */
import { halfwaveActions, useHalfwave } from '../../state/react';
import { safeName } from '../download';
import { FigureExportButtons, type FigureExportProps } from './FigureExportButtons';

export function TraceToolbar({ cycles, status, figure, fileName }: { cycles: number[]; status: 'running' | 'ready' | 'error' | null; figure: FigureExportProps['figure']; fileName: string }) {
  const cycle = useHalfwave((s) => s.selectedCycle);
  const showSmoothed = useHalfwave((s) => s.showSmoothed);
  const showBaselines = useHalfwave((s) => s.showBaselines);
  const showTheory = useHalfwave((s) => s.showTheory);
  const showCompanions = useHalfwave((s) => s.showCompanions);
  const dragMode = useHalfwave((s) => s.dragMode);
  const dir = useHalfwave((s) => s.windowDirection);
  const set = halfwaveActions().setView;
  const drag = dragMode === 'zoom' ? 'zoom' : dir;
  return (
    <div className="toolbar" role="toolbar" aria-label="Trace display">
      <label>
        Cycle{' '}
        <select value={cycle} data-testid="cycle-select" onChange={(e) => set({ selectedCycle: Number(e.target.value) })}>
          {cycles.map((c) => <option key={c} value={c}>{c}</option>)}
          {cycles.length > 1 ? <option value={0}>all</option> : null}
        </select>
      </label>
      <label><input type="checkbox" checked={showSmoothed} data-testid="show-smoothed" onChange={(e) => set({ showSmoothed: e.target.checked })} /> smoothed</label>
      <label><input type="checkbox" checked={showBaselines} onChange={(e) => set({ showBaselines: e.target.checked })} /> baselines</label>
      <label title="draw the other files of this series behind the selected one (up to 12)">
        <input type="checkbox" checked={showCompanions} data-testid="show-companions" onChange={(e) => set({ showCompanions: e.target.checked })} /> series
      </label>
      <label title="simulated voltammogram with the parameters fitted from this file's scan-rate series">
        <input type="checkbox" checked={showTheory} data-testid="show-theory" onChange={(e) => set({ showTheory: e.target.checked })} /> theory
      </label>
      <label>
        Drag:{' '}
        <select
          value={drag}
          data-testid="drag-mode"
          onChange={(e) => {
            const v = e.target.value;
            set(v === 'zoom' ? { dragMode: 'zoom' } : { dragMode: 'window', windowDirection: v === 'cathodic' ? 'cathodic' : 'anodic' });
          }}
        >
          <option value="zoom">zoom</option>
          <option value="anodic">mark anodic window</option>
          <option value="cathodic">mark cathodic window</option>
        </select>
      </label>
      <FigureExportButtons figure={figure} baseName={`halfwave-trace-${safeName(fileName.replace(/\.[^.]+$/, ''))}`} what="the trace" testId="trace" />
      <span className="status" role="status" data-testid="analysis-status" title="state of the analysis of this file">{status === 'running' ? 'analysing…' : status === 'ready' ? 'up to date' : ''}</span>
    </div>
  );
}
