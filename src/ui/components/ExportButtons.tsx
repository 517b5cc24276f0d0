/**
 * Results of every series (or only the one on screen) as CSV or JSON, every series as an XLSX
 * workbook; all made in this page and saved through a Blob.
 */
import { useState } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { workbookSheets } from '../../state/workbook';
import { downloadBlob, downloadText, safeName, stamp } from '../download';
import { workbookBlob } from '../xlsxExport';

export function ExportButtons() {
  const group = useHalfwave((s) => s.currentGroup());
  const hasFiles = useHalfwave((s) => s.fileOrder.length > 0);
  const [scope, setScope] = useState<'all' | 'this'>('all');
  const [busy, setBusy] = useState(false);
  const act = halfwaveActions();
  const chosen = scope === 'this' ? group : null;
  const what = chosen === null ? 'every series' : `series “${chosen}”`;
  const guarded = async (task: string, job: () => Promise<void>) => {
    setBusy(true);
    try {
      await job();
    } catch (err) {
      act.setView({ notice: `Could not make ${task}: ${(err as Error).message}` });
    } finally {
      setBusy(false);
    }
  };
  const sheet = (format: 'csv' | 'json') => guarded(`the results sheet of ${what}`, async () => {
    const text = await act.exportGroup(chosen, format);
    downloadText(`halfwave-results-${safeName(chosen ?? 'all-series')}-${stamp()}.${format}`, text, format === 'csv' ? 'text/csv' : 'application/json');
  });
  const workbook = () => guarded('the results workbook', async () => {
    downloadBlob(`halfwave-results-${stamp()}.xlsx`, await workbookBlob(await workbookSheets(act)));
  });
  const off = !hasFiles || busy || (scope === 'this' && !group);
  return (
    <div className="group" role="group" aria-label="Results">
      <span className="group-label">Results</span>
      <select aria-label="Which series the results sheet covers" data-testid="export-scope" value={scope} onChange={(e) => setScope(e.target.value as 'all' | 'this')}>
        <option value="all">all series</option>
        <option value="this">this series</option>
      </select>
      <button type="button" disabled={off} data-testid="export-csv" title={`Results sheet of ${what} as CSV`} onClick={() => void sheet('csv')}>CSV</button>
      <button type="button" disabled={off} data-testid="export-json" title={`Results sheet of ${what} as JSON`} onClick={() => void sheet('json')}>JSON</button>
      <button type="button" disabled={!hasFiles || busy} data-testid="export-xlsx" title="Every series as a workbook: a sheet per series, the files with SHA-256, the method and parameters" onClick={() => void workbook()}>XLSX</button>
    </div>
  );
}
