/**
 * Results of the current scan-rate series as CSV or JSON, every series as an XLSX workbook, and
 * the printable notebook report; all made in this page and saved through a Blob.
 */
import { useState } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { workbookSheets } from '../../state/workbook';
import { downloadBlob, downloadText, safeName, stamp } from '../download';
import { workbookBlob } from '../xlsxExport';

export function ExportButtons() {
  const group = useHalfwave((s) => s.currentGroup());
  const [busy, setBusy] = useState(false);
  const act = halfwaveActions();
  const guarded = async (what: string, job: () => Promise<void>) => {
    setBusy(true);
    try {
      await job();
    } catch (err) {
      act.setView({ notice: `Could not make ${what}: ${(err as Error).message}` });
    } finally {
      setBusy(false);
    }
  };
  const sheet = (format: 'csv' | 'json') => group && guarded(`the results sheet of “${group}”`, async () => {
    const text = await act.exportGroup(group, format);
    downloadText(`halfwave-results-${safeName(group)}-${stamp()}.${format}`, text, format === 'csv' ? 'text/csv' : 'application/json');
  });
  const workbook = () => guarded('the results workbook', async () => {
    downloadBlob(`halfwave-results-${stamp()}.xlsx`, await workbookBlob(await workbookSheets(act)));
  });
  return (
    <div className="group" role="group" aria-label="Results">
      <span className="group-label" title={group ? `series “${group}”` : ''}>Results</span>
      <button type="button" disabled={!group || busy} data-testid="export-csv" title={group ? `Results sheet of series “${group}” as CSV` : 'Load files first'} onClick={() => void sheet('csv')}>CSV</button>
      <button type="button" disabled={!group || busy} data-testid="export-json" title={group ? `Results sheet of series “${group}” as JSON` : 'Load files first'} onClick={() => void sheet('json')}>JSON</button>
      <button type="button" disabled={!group || busy} data-testid="export-xlsx" title="Every series as a workbook: a sheet per series, the files with SHA-256, the method and parameters" onClick={() => void workbook()}>XLSX</button>
    </div>
  );
}
