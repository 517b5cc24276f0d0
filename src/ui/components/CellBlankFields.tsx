/** The blanks of a series (supporting electrolyte alone): each file subtracts the one nearest its scan rate. */
import { useHalfwaveShallow } from '../../state/react';
import type { SeriesCell } from '../../state/types';

export function CellBlankFields({ cell, set }: { cell: SeriesCell; set: (patch: Partial<SeriesCell>) => void }) {
  const names = useHalfwaveShallow((s) => [...new Set(s.fileOrder.flatMap((id) => (s.files[id]?.measurement ? [s.files[id].fileName] : [])))]);
  const free = names.filter((n) => !cell.blankFiles.includes(n));
  return (
    <div className="blanks" data-testid="cell-blanks">
      <h3>Blanks (electrolyte alone, subtracted first)</h3>
      {cell.blankFiles.length ? (
        <ul className="chips">
          {cell.blankFiles.map((n) => (
            <li key={n}>{n} <button type="button" aria-label={`Stop subtracting ${n}`} onClick={() => set({ blankFiles: cell.blankFiles.filter((x) => x !== n) })}>×</button></li>
          ))}
        </ul>
      ) : <p className="hint">None: peaks are measured on the currents as recorded.</p>}
      {free.length ? (
        <select aria-label="Add a blank" data-testid="add-blank" value="" onChange={(e) => e.target.value && set({ blankFiles: [...cell.blankFiles, e.target.value] })}>
          <option value="">add a blank…</option>
          {free.map((n) => <option key={n} value={n}>{n}</option>)}
        </select>
      ) : null}
    </div>
  );
}
