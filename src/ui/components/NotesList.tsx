/** Warnings of the import and the analysis, each a full sentence. */
import { useSelection } from './useSelection';

export function NotesList() {
  const { file, result } = useSelection();
  const notes = [
    ...(file?.warnings ?? []).map((w) => ({ key: `i-${w.code}-${w.message}`, source: 'reading', text: w.message })),
    ...(result?.run?.warnings ?? []).map((w) => ({ key: `a-${w.code}-${w.message}`, source: w.code === 'OHMIC' ? 'iR correction' : w.code === 'CAPACITANCE' ? 'capacitance' : 'analysis', text: w.message })),
  ];
  if (notes.length === 0) return <p className="empty">No warnings for this file.</p>;
  return (
    <ul className="notes" data-testid="notes-list">
      {notes.map((n) => <li key={n.key}><span className="tag">{n.source}</span> {n.text}</li>)}
    </ul>
  );
}
