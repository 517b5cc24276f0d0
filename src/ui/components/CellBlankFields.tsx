/**
 * The blanks of a series (supporting electrolyte alone): each file subtracts the one nearest its
 * scan rate, unless the file on screen is given its own blank, or none.
 */
import { blankNames, blankOf } from '../../run/runInput';
import { halfwaveActions, useHalfwave, useHalfwaveShallow } from '../../state/react';
import { resolveCell } from '../../run/seriesCell';
import type { SeriesCell } from '../../state/types';

const SERIES_CHOICE = '';
const NO_BLANK = '\u0000none';

export function CellBlankFields({ group, cell, set }: { group: string; cell: SeriesCell; set: (patch: Partial<SeriesCell>) => void }) {
  // The blanks as the store has them at event time (components render once per frame).
  const blanksNow = () => resolveCell(halfwaveActions(), group).cell.blankFiles;
  const names = useHalfwaveShallow((s) => [...new Set(s.fileOrder.flatMap((id) => (s.files[id]?.measurement ? [s.files[id].fileName] : [])))]);
  const free = names.filter((n) => !cell.blankFiles.includes(n));
  return (
    <div className="blanks" data-testid="cell-blanks">
      <h3>Blanks (electrolyte alone, subtracted first)</h3>
      {cell.blankFiles.length ? (
        <ul className="chips">
          {cell.blankFiles.map((n) => (
            <li key={n}>{n} <button type="button" aria-label={`Stop subtracting ${n}`} onClick={() => set({ blankFiles: blanksNow().filter((x) => x !== n) })}>×</button></li>
          ))}
        </ul>
      ) : <p className="hint">None: peaks are measured on the currents as recorded.</p>}
      {free.length ? (
        <select aria-label="Add a blank" data-testid="add-blank" value="" onChange={(e) => e.target.value && set({ blankFiles: [...blanksNow().filter((x) => x !== e.target.value), e.target.value] })}>
          <option value="">add a blank…</option>
          {free.map((n) => <option key={n} value={n}>{n}</option>)}
        </select>
      ) : null}
      <FileBlankChoice group={group} names={names} />
    </div>
  );
}

/** The file on screen: the series' nearest blank (the default), a blank of its own, or none. */
function FileBlankChoice({ group, names }: { group: string; names: string[] }) {
  const id = useHalfwave((s) => s.selectedFileId);
  const file = useHalfwave((s) => (id ? s.files[id] : undefined));
  const own = useHalfwave((s) => (id ? s.fileSettings[id]?.blankFile : undefined));
  const seriesPick = useHalfwave((s) => {
    if (!id) return null;
    const fs = s.fileSettings[id];
    // What the series alone would give this file (its own choice set aside).
    return blankOf({ ...s, fileSettings: { ...s.fileSettings, [id]: { peakWindows: fs?.peakWindows ?? [], baselines: fs?.baselines ?? [] } } }, id);
  });
  const isBlank = useHalfwave((s) => !!file && blankNames(s).has(file.fileName));
  if (!id || !file?.measurement || file.group !== group || isBlank) return null;
  const value = own === undefined ? SERIES_CHOICE : own === null ? NO_BLANK : own;
  const choose = (v: string) => {
    const blankFile = v === SERIES_CHOICE ? undefined : v === NO_BLANK ? null : v;
    void halfwaveActions().updateFileSettings(id, (fs) => {
      const { blankFile: _old, ...rest } = fs;
      return blankFile === undefined ? rest : { ...rest, blankFile };
    });
  };
  return (
    <label className="file-blank">
      {file.fileName} subtracts{' '}
      <select data-testid="file-blank" value={value} onChange={(e) => choose(e.target.value)}>
        <option value={SERIES_CHOICE}>{seriesPick ? `the series' nearest in scan rate (${seriesPick})` : "the series' blank (none set)"}</option>
        <option value={NO_BLANK}>no blank</option>
        {names.filter((n) => n !== file.fileName).map((n) => <option key={n} value={n}>{n}</option>)}
      </select>
    </label>
  );
}
