/**
 * Loaded files as one list box: a single tab stop; the arrow keys, Home and End move the selection
 * (WAI-ARIA listbox pattern, focus kept on the list with aria-activedescendant); each row shows the
 * status, progress, scan rate and any import error. The selected file's series name and removal
 * sit below the list (SelectedFileBar), so the rows hold nothing focusable.
 */
import { memo, useEffect, useRef, type KeyboardEvent } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { FileEntry } from '../../state/types';
import { bytes, count, scanRate } from '../format';

const SOURCE_WORDS: Record<string, string> = {
  option: 'your override', time: 'the time column', metadata: 'the file header', filename: 'the file name',
};

const SOURCE_SHORT: Record<string, string> = { option: 'set', time: 'time', metadata: 'header', filename: 'name' };

const optionId = (id: string) => `file-option-${id}`;

export function FileList() {
  const order = useHalfwave((s) => s.fileOrder);
  const selected = useHalfwave((s) => s.selectedFileId);
  // The list reads the store once for all its rows; a row is drawn again only when its own file,
  // analysis status or selection changed (memo). With a store hook per row, every change of the
  // store asked each of a few hundred rows whether it was concerned.
  const files = useHalfwave((s) => s.files);
  const results = useHalfwave((s) => s.results);
  const notKept = useHalfwave((s) => s.notKept);
  const list = useRef<HTMLUListElement>(null);
  // The selected file stays in sight, however it was chosen: the arrow keys, a row of the results
  // table, or an upload that opened its series (its files come after everything loaded before).
  useEffect(() => {
    if (selected) document.getElementById(optionId(selected))?.scrollIntoView({ block: 'nearest' });
  }, [selected]);
  if (order.length === 0) return <p className="empty">No files yet.</p>;
  const onKey = (e: KeyboardEvent) => {
    const s = halfwaveActions();
    const usable = s.fileOrder.filter((id) => s.files[id]?.measurement);
    const k = selected ? usable.indexOf(selected) : -1;
    const next = e.key === 'ArrowDown' ? usable[Math.min(usable.length - 1, k + 1)] : e.key === 'ArrowUp' ? usable[Math.max(0, k - 1)]
      : e.key === 'Home' ? usable[0] : e.key === 'End' ? usable[usable.length - 1] : undefined;
    if (!next) return;
    e.preventDefault();
    s.selectFile(next);
  };
  return (
    <ul ref={list} className="file-list" data-testid="file-list" role="listbox" aria-label="Loaded files" tabIndex={0}
      aria-activedescendant={selected && order.includes(selected) ? optionId(selected) : undefined} onKeyDown={onKey}>
      {order.map((id) => {
        const file = files[id];
        const sha = file?.sha256;
        return file ? <FileRow key={id} id={id} file={file} selected={selected === id} analysis={results[id]?.status} notKept={!!sha && notKept.includes(sha)} /> : null;
      })}
    </ul>
  );
}

interface FileRowProps {
  id: string;
  file: FileEntry;
  selected: boolean;
  analysis: 'running' | 'ready' | 'error' | undefined;
  notKept: boolean;
}

const FileRow = memo(function FileRow({ id, file, selected, analysis: result, notKept }: FileRowProps) {
  const m = file.measurement;
  return (
    <li id={optionId(id)} role="option" aria-selected={selected} aria-disabled={!m}
      className={`file-row status-${file.status}${selected ? ' selected' : ''}`} data-testid="file-row" data-file-name={file.fileName}
      data-status={file.status} data-analysis={result ?? 'none'} data-kept={notKept ? 'no' : undefined} onClick={() => m && halfwaveActions().selectFile(id)}>
      <div className="file-head">
        <span className="file-name" title={`${file.fileName} (${bytes(file.sizeBytes)}), series “${file.group}”`}>{file.fileName}</span>
      </div>
      <div className="file-meta">
        <span>{statusText(file, result)}</span>
        {m?.scanRateVPerS ? (
          <span title={`scan rate taken from ${SOURCE_WORDS[m.scanRateSource ?? ''] ?? 'unknown source'}`}>
            {scanRate(m.scanRateVPerS * 1000)} mV/s · {SOURCE_SHORT[m.scanRateSource ?? ''] ?? '?'}
          </span>
        ) : m ? <span className="warn-text">no scan rate</span> : null}
      </div>
      {notKept ? <p className="warn-text" data-testid="not-kept" title="The browser's storage could not keep this file's bytes: it will not come back on the next visit unless you save a session with data">not kept for the next visit</p> : null}
      {file.status === 'importing' ? <progress max={1} value={file.progress} aria-label={`reading ${file.fileName}`} /> : null}
      {file.error ? (
        <p className="error-text" data-testid="file-error">
          {file.error.message}
          {m ? ' The previous reading of this file is kept.' : ''}
        </p>
      ) : null}
    </li>
  );
});

function statusText(file: FileEntry, analysis: 'running' | 'ready' | 'error' | undefined): string {
  if (file.status === 'queued') return 'waiting';
  if (file.status === 'importing') return `reading ${Math.round(file.progress * 100)} %`;
  if (file.status === 'error') return 'not read';
  const m = file.measurement;
  const pts = m ? `${count(m.potentialV.length)} pts, ${m.cycles.length} cycle${m.cycles.length === 1 ? '' : 's'}` : '';
  return analysis === 'running' ? `${pts} · analysing` : analysis === 'error' ? `${pts} · analysis failed` : pts;
}

/** The selected file's series name and removal, below the list. */
export function SelectedFileBar() {
  const id = useHalfwave((s) => s.selectedFileId);
  const file = useHalfwave((s) => (id ? s.files[id] : undefined));
  if (!id || !file) return null;
  const act = halfwaveActions();
  return (
    <div className="selected-file" data-testid="selected-file">
      <label className="group-field">
        series of {file.fileName}
        <input key={`${id}-${file.group}`} defaultValue={file.group} data-testid="file-series" onBlur={(e) => act.setFileGroup(id, e.target.value)}
          onKeyDown={(e) => e.key === 'Enter' && act.setFileGroup(id, e.currentTarget.value)} />
      </label>
      <button type="button" data-testid="file-remove" aria-label={`Remove ${file.fileName}`} title="Remove from the session" onClick={() => act.removeFile(id)}>Remove</button>
    </div>
  );
}
