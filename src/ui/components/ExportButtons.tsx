/** Results sheet of the current scan-rate group, as CSV or JSON, saved through a Blob. */
import { useState } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { downloadText, stamp } from '../download';

export function ExportButtons() {
  const group = useHalfwave((s) => s.currentGroup());
  const [busy, setBusy] = useState(false);
  const act = halfwaveActions();
  const run = async (format: 'csv' | 'json') => {
    if (!group) return;
    setBusy(true);
    try {
      const text = await act.exportGroup(group, format);
      const safe = group.replace(/[^\w.-]+/g, '_');
      downloadText(`halfwave-results-${safe}-${stamp()}.${format}`, text, format === 'csv' ? 'text/csv' : 'application/json');
    } catch (err) {
      act.setView({ notice: `Could not make the results sheet of “${group}”: ${(err as Error).message}` });
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="group" role="group" aria-label="Results sheet">
      <span className="group-label" title={group ? `series “${group}”` : ''}>Results</span>
      <button type="button" disabled={!group || busy} data-testid="export-csv" title={group ? `Results sheet of series “${group}” as CSV` : 'Load files first'} onClick={() => void run('csv')}>CSV</button>
      <button type="button" disabled={!group || busy} data-testid="export-json" title={group ? `Results sheet of series “${group}” as JSON` : 'Load files first'} onClick={() => void run('json')}>JSON</button>
    </div>
  );
}
