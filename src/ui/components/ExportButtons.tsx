/** Results sheet of every series (or only the one on screen), as CSV or JSON, saved through a Blob. */
import { useState } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { downloadText, stamp } from '../download';

export function ExportButtons() {
  const group = useHalfwave((s) => s.currentGroup());
  const hasFiles = useHalfwave((s) => s.fileOrder.length > 0);
  const [scope, setScope] = useState<'all' | 'this'>('all');
  const [busy, setBusy] = useState(false);
  const act = halfwaveActions();
  const chosen = scope === 'this' ? group : null;
  const what = chosen === null ? 'every series' : `series “${chosen}”`;
  const run = async (format: 'csv' | 'json') => {
    setBusy(true);
    try {
      const text = await act.exportGroup(chosen, format);
      const safe = (chosen ?? 'all-series').replace(/[^\w.-]+/g, '_');
      downloadText(`halfwave-results-${safe}-${stamp()}.${format}`, text, format === 'csv' ? 'text/csv' : 'application/json');
    } catch (err) {
      act.setView({ notice: `Could not make the results sheet of ${what}: ${(err as Error).message}` });
    } finally {
      setBusy(false);
    }
  };
  const off = !hasFiles || busy || (scope === 'this' && !group);
  return (
    <div className="group" role="group" aria-label="Results sheet">
      <span className="group-label">Results</span>
      <select aria-label="Which series the results sheet covers" data-testid="export-scope" value={scope} onChange={(e) => setScope(e.target.value as 'all' | 'this')}>
        <option value="all">all series</option>
        <option value="this">this series</option>
      </select>
      <button type="button" disabled={off} data-testid="export-csv" title={`Results sheet of ${what} as CSV`} onClick={() => void run('csv')}>CSV</button>
      <button type="button" disabled={off} data-testid="export-json" title={`Results sheet of ${what} as JSON`} onClick={() => void run('json')}>JSON</button>
    </div>
  );
}
