/**
 * "Peak finding": the analysis settings applied to every file (smoothing, baselines, the peak
 * threshold) and the selected file's own peak windows. Not an experiment protocol: nothing here
 * tells the instrument what to do.
 */
import type { AnalysisSettings } from '../../state/types';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { NumberField } from './NumberField';
import { SelectField } from './SelectField';
import { WindowsEditor } from './WindowsEditor';

export function PeakFindingPanel() {
  const s = useHalfwave((st) => st.settings);
  const update = (change: (x: AnalysisSettings) => AnalysisSettings) => void halfwaveActions().updateSettings(change);
  const smoothing = s.smoothing === 'off' ? null : s.smoothing;
  return (
    <section className="panel method" aria-labelledby="method-title">
      <h2 id="method-title">Peak finding</h2>
      <div className="field-grid">
        <label className="check">
          <input type="checkbox" checked={smoothing !== null} data-testid="smoothing-on"
            onChange={(e) => update((x) => ({ ...x, smoothing: e.target.checked ? { window: 5, order: 2 } : 'off' }))} />
          Savitzky–Golay smoothing
        </label>
        {smoothing ? (
          <>
            <NumberField label="Window" unit="points, odd" value={smoothing.window} min={3} max={501} testId="smoothing-window"
              onCommit={(v) => v !== null && update((x) => ({ ...x, smoothing: { window: v % 2 === 1 ? v : v + 1, order: Math.min(smoothing.order, v - 1) } }))} />
            <NumberField label="Polynomial order" value={smoothing.order} min={0} max={Math.min(10, smoothing.window - 1)} testId="smoothing-order"
              onCommit={(v) => v !== null && update((x) => ({ ...x, smoothing: { window: smoothing.window, order: Math.round(v) } }))} />
          </>
        ) : null}
        <SelectField label="Forward-peak baseline" value={s.forwardBaseline} testId="forward-baseline"
          options={[{ value: 'linear', label: 'straight line before the peak' }, { value: 'polynomial', label: 'polynomial before the peak' }]}
          onChange={(v) => update((x) => ({ ...x, forwardBaseline: v }))} />
        <SelectField label="Return-peak baseline" value={s.returnBaseline} testId="return-baseline"
          options={[{ value: 'nicholson', label: 'decay of the forward sweep (Nicholson)' }, { value: 'linear', label: 'straight line before the peak' }, { value: 'polynomial', label: 'polynomial before the peak' }]}
          onChange={(v) => update((x) => ({ ...x, returnBaseline: v }))} />
        <NumberField label="Peak must exceed noise by" unit="× σ" value={s.minSignalToNoise} min={1} max={1000} testId="min-snr"
          onCommit={(v) => v !== null && update((x) => ({ ...x, minSignalToNoise: v }))} />
        <SelectField label="Isolated bad points" value={s.spikeFilter} testId="spike-filter"
          title="a point far off the running median of its neighbours (Hampel test) is left out of the analysis and listed; off keeps every point"
          options={[{ value: 'hampel', label: 'left out and listed (Hampel test)' }, { value: 'off', label: 'kept' }]}
          onChange={(v) => update((x) => ({ ...x, spikeFilter: v }))} />
        <SelectField label="ψ from ΔEp" value={s.psiMethod} testId="psi-method"
          title="Nicholson's k° needs ψ(ΔEp): his 1965 table, interpolated over 61–212 mV, or the Lavagnini et al. 2004 closed form (63–141 mV, up to 7 % off the table)"
          options={[{ value: 'table', label: 'Nicholson 1965 table, interpolated' }, { value: 'lavagnini', label: 'Lavagnini et al. 2004 closed form' }]}
          onChange={(v) => update((x) => ({ ...x, psiMethod: v }))} />
      </div>
      <WindowsEditor />
    </section>
  );
}
