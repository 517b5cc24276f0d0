/** "Intake": drop or choose export files; shows the batch progress and the loaded files. */
import { useEffect, useRef, useState } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { batchesFromDrop, batchesFromFolderPick, type FolderBatch } from '../folderDrop';
import { FileList, SelectedFileBar } from './FileList';

/**
 * One upload: each folder, and each set of files with a common name stem, becomes its own new
 * series; the first new series opens with its results table across files as soon as its first
 * file is read (the rest fill in as they come), or, when none of its files could be read, the
 * first new series that has a file once the upload is done.
 */
function load(batches: FolderBatch[]): void {
  const upload = batches.filter((b) => b.files.length > 0).map((b) => ({ folder: b.folder, inputs: b.files.map((f) => ({ name: f.name, data: f })) }));
  if (upload.length === 0) return;
  const act = halfwaveActions();
  let opened = false;
  const open = (group: string) => {
    opened = true;
    act.openSeries(group);
  };
  void act.addUpload(upload, open).then(({ groups }) => {
    const first = groups.find((g) => act.groups().includes(g));
    if (!opened && first) open(first);
  });
}

export function IntakePanel() {
  const input = useRef<HTMLInputElement>(null);
  const folderInput = useRef<HTMLInputElement>(null);
  // React has no typed prop for folder picking; the attribute is set directly.
  useEffect(() => folderInput.current?.setAttribute('webkitdirectory', ''), []);
  const [over, setOver] = useState(false);
  const batch = useHalfwave((s) => s.importBatch);
  const count = useHalfwave((s) => s.fileOrder.length);
  const fitting = useHalfwave((s) => Object.values(s.series).filter((e) => e.status === 'running').length);

  const take = (list: FileList | null) => {
    if (!list || list.length === 0) return;
    load([{ folder: null, files: Array.from(list) }]);
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
          void batchesFromDrop(e.dataTransfer).then(load);
        }}
      >
        <p>Drop potentiostat text exports or folders here</p>
        <div className="buttons">
          <button type="button" onClick={() => input.current?.click()} title="choose one or many files">Files…</button>
          <button type="button" onClick={() => folderInput.current?.click()} title="every table file in the folder; the folder becomes a series">Folder…</button>
        </div>
        <input
          ref={folderInput}
          type="file"
          multiple
          className="visually-hidden"
          data-testid="folder-input"
          aria-label="Choose a folder of voltammogram files"
          onChange={(e) => {
            if (e.target.files) load(batchesFromFolderPick(e.target.files));
            e.target.value = '';
          }}
        />
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
        <p className="hint">CSV, TSV or text tables; many files at once; a folder becomes a scan-rate series. Nothing leaves this computer.</p>
      </div>
      {batch ? (
        <div className="batch" data-testid="import-progress" role="status">
          Reading {Math.min(batch.done + 1, batch.total)} of {batch.total}
          <progress max={batch.total} value={batch.done} aria-label="files read" />
        </div>
      ) : fitting > 0 ? (
        <p className="batch" data-testid="series-progress" role="status">Fitting {fitting} series across scan rates…</p>
      ) : null}
      <FileList />
      <SelectedFileBar />
    </section>
  );
}
