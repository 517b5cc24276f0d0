/** Loaded files with status, progress, series group and any import error beside the file. */
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { FileEntry } from '../../state/types';
import { bytes, count } from '../format';

const SOURCE_WORDS: Record<string, string> = {
  option: 'your override', time: 'the time column', metadata: 'the file header', filename: 'the file name',
};

const SOURCE_SHORT: Record<string, string> = { option: 'set', time: 'time', metadata: 'header', filename: 'name' };

export function FileList() {
  const order = useHalfwave((s) => s.fileOrder);
  if (order.length === 0) return <p className="empty">No files yet.</p>;
  return (
    <ul className="file-list" data-testid="file-list" aria-label="Loaded files">
      {order.map((id) => <FileRow key={id} id={id} />)}
    </ul>
  );
}

function FileRow({ id }: { id: string }) {
  const file = useHalfwave((s) => s.files[id]);
  const selected = useHalfwave((s) => s.selectedFileId === id);
  const result = useHalfwave((s) => s.results[id]);
  if (!file) return null;
  const act = halfwaveActions();
  return (
    <li className={`file-row status-${file.status}${selected ? ' selected' : ''}`} data-testid="file-row" data-file-name={file.fileName} data-status={file.status} data-analysis={result?.status ?? 'none'}>
      <div className="file-head">
        <button type="button" className="file-name" aria-pressed={selected} disabled={!file.measurement} onClick={() => act.selectFile(id)} title={`${file.fileName} (${bytes(file.sizeBytes)})`}>
          {file.fileName}
        </button>
        <button type="button" className="icon" aria-label={`Remove ${file.fileName}`} title="Remove from the session" onClick={() => act.removeFile(id)}>×</button>
      </div>
      <div className="file-meta">
        <span>{statusText(file, result?.status)}</span>
        {file.measurement?.scanRateVPerS ? (
          <span title={`scan rate taken from ${SOURCE_WORDS[file.measurement.scanRateSource ?? ''] ?? 'unknown source'}`}>
            {Number((file.measurement.scanRateVPerS * 1000).toPrecision(3))} mV/s · {SOURCE_SHORT[file.measurement.scanRateSource ?? ''] ?? '?'}
          </span>
        ) : file.measurement ? <span className="warn-text">no scan rate</span> : null}
      </div>
      {file.status === 'importing' ? <progress max={1} value={file.progress} aria-label={`reading ${file.fileName}`} /> : null}
      {file.error ? (
        <p className="error-text" data-testid="file-error" role="alert">
          {file.error.message}
          {file.measurement ? ' The previous reading of this file is kept.' : ''}
        </p>
      ) : null}
      {file.measurement ? (
        <label className="group-field">
          series
          <input key={file.group} defaultValue={file.group} aria-label={`Series group of ${file.fileName}`} onBlur={(e) => act.setFileGroup(id, e.target.value)}
            onKeyDown={(e) => e.key === 'Enter' && act.setFileGroup(id, e.currentTarget.value)} />
        </label>
      ) : null}
    </li>
  );
}

function statusText(file: FileEntry, analysis: 'running' | 'ready' | 'error' | undefined): string {
  if (file.status === 'queued') return 'waiting';
  if (file.status === 'importing') return `reading ${Math.round(file.progress * 100)} %`;
  if (file.status === 'error') return 'not read';
  const m = file.measurement;
  const pts = m ? `${count(m.potentialV.length)} pts, ${m.cycles.length} cycle${m.cycles.length === 1 ? '' : 's'}` : '';
  return analysis === 'running' ? `${pts} · analysing` : analysis === 'error' ? `${pts} · analysis failed` : pts;
}
