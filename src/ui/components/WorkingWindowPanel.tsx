/**
 * "Working window" of the series on screen: the electrode material and the medium, and the usable
 * potential range that follows from the table (each limit with the process that sets it and its
 * source), shown on the display scale and drawn as a band behind the trace. Either limit can be
 * replaced by the user's own value; "table values" brings the table's back.
 */
import { halfwaveActions, useHalfwave } from '../../state/react';
import { ELECTRODE_MATERIALS, WINDOW_MEDIA, type ElectrodeMaterial, type WindowMedium } from '../../state/workingWindowSlice';
import { fixed } from '../format';
import { NumberField } from './NumberField';
import { useSeriesScale } from './useSeriesCell';
import { useWorkingWindow } from './useWorkingWindow';

const NONE = '';

export function WorkingWindowPanel() {
  const group = useHalfwave((s) => s.currentGroup());
  const choice = useHalfwave((s) => (group ? s.workingWindows[group] : undefined));
  const shown = useWorkingWindow(group);
  const scale = useSeriesScale(group);
  if (!group) return null;
  const set = halfwaveActions().setWorkingWindow;
  // Handlers read the choice from the store, not from this render: a second pick before the next
  // frame's render must build on the first.
  const now = () => halfwaveActions().workingWindows[group];
  const pick = (material: string, medium: string) => set(group, material === NONE ? null : { material: material as ElectrodeMaterial, medium: (medium || 'aqueous-neutral') as WindowMedium });
  const edit = (which: 'lowerV' | 'upperV', displayed: number | null) => {
    const current = now();
    if (!current || !shown) return;
    const { [which]: _old, ...rest } = current;
    set(group, displayed === null ? rest : { ...rest, [which]: displayed - shown.offsetV });
  };
  return (
    <section className="panel working-window" aria-labelledby="window-title" data-testid="working-window">
      <h2 id="window-title">Working window</h2>
      <div className="field-grid">
        <label className="field">Working electrode
          <select value={choice?.material ?? NONE} data-testid="window-material" onChange={(e) => pick(e.target.value, now()?.medium ?? '')}>
            <option value={NONE}>not shown</option>
            {ELECTRODE_MATERIALS.map((m) => <option key={m.id} value={m.id}>{m.label}</option>)}
          </select>
        </label>
        {choice ? (
          <label className="field">Medium
            <select value={choice.medium} data-testid="window-medium" onChange={(e) => pick(now()?.material ?? choice.material, e.target.value)}>
              {WINDOW_MEDIA.map((m) => <option key={m.id} value={m.id}>{m.label}</option>)}
            </select>
          </label>
        ) : null}
      </div>
      {shown ? (
        shown.problem !== null && shown.lowerV === null && shown.upperV === null ? <p className="warn-text" data-testid="window-problem">{shown.problem}</p> : (
          <>
            <div className="field-grid two">
              <NumberField label="Negative limit" unit={`V vs ${scale.name}`} value={round(shown.lowerV)} allowEmpty testId="window-lower" onCommit={(v) => edit('lowerV', v)} />
              <NumberField label="Positive limit" unit={`V vs ${scale.name}`} value={round(shown.upperV)} allowEmpty testId="window-upper" onCommit={(v) => edit('upperV', v)} />
            </div>
            <ul className="window-sources" data-testid="window-sources">
              <li>{fixed(shown.lowerV, 2)} V: {shown.entry.lower?.process ?? '—'} ({shown.lowerSource})</li>
              <li>{fixed(shown.upperV, 2)} V: {shown.entry.upper?.process ?? '—'} ({shown.upperSource})</li>
            </ul>
            {shown.entry.note ? <p className="hint">{shown.entry.note}</p> : null}
            <p className="hint">Beyond these limits a steeply rising current is the solvent or electrolyte breaking down, or a catalytic current, not a peak. At the negative end in water the electrode evolves hydrogen: keep the cell ventilated.</p>
          </>
        )
      ) : <p className="hint">Choose the electrode material to draw the usable potential range behind the trace.</p>}
    </section>
  );
}

const round = (v: number | null) => (v === null ? null : Math.round(v * 1000) / 1000);
