/** "Intake": drop or choose export files; shows the batch progress and the loaded files. */
import { useRef, useState } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { FileList } from './FileList';

export function IntakePanel() {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const batch = useHalfwave((s) => s.importBatch);
  const count = useHalfwave((s) => s.fileOrder.length);

  const take = (list: FileList | null) => {
    if (!list || list.length === 0) return;
    void halfwaveActions().addFiles(Array.from(list, (f) => ({ name: f.name, data: f })));
  };

  return (
    <section className="panel intake" aria-labelledby="intake-title">
      <h2 id="intake-title">Intake <span className="count">{count} file{count === 1 ? '' : 's'}</span></h2>
      <div
        className={`dropzone${over ? ' over' : ''}`}
        data-testid="dropzone"
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setOver(false);
          take(e.dataTransfer.files);
        }}
      >
        <p>Drop potentiostat text exports here</p>
        <button type="button" onClick={() => input.current?.click()}>Choose files…</button>
        <input
          ref={input}
          type="file"
          multiple
          accept=".csv,.txt,.tsv,.dat,.asc,text/plain,text/csv"
          className="visually-hidden"
          data-testid="file-input"
          aria-label="Choose voltammogram files"
          onChange={(e) => {
            take(e.target.files);
            e.target.value = '';
          }}
        />
        <p className="hint">CSV, TSV or text tables; many files at once. Nothing leaves this computer.</p>
      </div>
      {batch ? (
        <div className="batch" data-testid="import-progress" role="status">
          Reading {Math.min(batch.done + 1, batch.total)} of {batch.total}
          <progress max={batch.total} value={batch.done} aria-label="files read" />
        </div>
      ) : null}
      <FileList />
    </section>
  );
}
