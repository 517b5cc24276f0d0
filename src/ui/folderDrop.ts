/**
 * Files from a drop or a folder pick, grouped by the folder they came from, so a dropped folder
 * of exports becomes one scan-rate series named after it. Directory entries are read through the
 * browser's file-system entry API; hidden files (".DS_Store") and files whose extension is not a
 * text table are left out.
 */
export interface FolderBatch {
  /** Folder name, or null for loose files. */
  folder: string | null;
  files: File[];
}

const TABLE_FILE = /\.(csv|txt|tsv|dat|asc|text)$/i;

export function isTableFile(name: string): boolean {
  return !name.startsWith('.') && TABLE_FILE.test(name);
}

function readAll(reader: FileSystemDirectoryReader): Promise<FileSystemEntry[]> {
  // readEntries returns at most ~100 entries per call; call until it returns none.
  return new Promise((resolve, reject) => {
    const out: FileSystemEntry[] = [];
    const next = () => reader.readEntries((batch) => {
      if (batch.length === 0) resolve(out);
      else {
        out.push(...batch);
        next();
      }
    }, reject);
    next();
  });
}

function fileOf(entry: FileSystemFileEntry): Promise<File> {
  return new Promise((resolve, reject) => entry.file(resolve, reject));
}

async function collect(entry: FileSystemEntry, folder: string | null, into: Map<string | null, File[]>): Promise<void> {
  if (entry.isFile) {
    if (!isTableFile(entry.name)) return;
    const file = await fileOf(entry as FileSystemFileEntry);
    into.set(folder, [...(into.get(folder) ?? []), file]);
  } else if (entry.isDirectory) {
    for (const child of await readAll((entry as FileSystemDirectoryEntry).createReader())) await collect(child, entry.name, into);
  }
}

/** Batches from a drop: folders (recursively, each sub-folder its own batch) and loose files. */
export async function batchesFromDrop(dt: DataTransfer): Promise<FolderBatch[]> {
  const entries = Array.from(dt.items ?? [])
    .map((item) => (item.kind === 'file' ? item.webkitGetAsEntry?.() ?? null : null))
    .filter((e): e is FileSystemEntry => e !== null);
  if (entries.length === 0) return [{ folder: null, files: Array.from(dt.files) }];
  const into = new Map<string | null, File[]>();
  for (const entry of entries) await collect(entry, null, into);
  return [...into].map(([folder, files]) => ({ folder, files: files.sort((a, b) => a.name.localeCompare(b.name)) }));
}

/** Batches from an <input webkitdirectory> pick, by the folder part of each relative path. */
export function batchesFromFolderPick(list: FileList): FolderBatch[] {
  const into = new Map<string | null, File[]>();
  for (const f of Array.from(list)) {
    if (!isTableFile(f.name)) continue;
    const parts = (f.webkitRelativePath || f.name).split('/');
    const folder = parts.length > 1 ? (parts[parts.length - 2] as string) : null;
    into.set(folder, [...(into.get(folder) ?? []), f]);
  }
  return [...into].map(([folder, files]) => ({ folder, files: files.sort((a, b) => a.name.localeCompare(b.name)) }));
}
