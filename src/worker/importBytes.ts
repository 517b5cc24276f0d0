/**
 * The bytes of a file to import. A file the user picked reaches the worker as its Blob, a
 * handle to the file on disk, and is read here, off the page's thread; bytes the page already
 * holds (the demo, a saved workspace) come as an ArrayBuffer.
 *
 * The worker starts reading a Blob as soon as its request arrives (`startReading`), so files that
 * wait their turn are read meanwhile. Each read of a picked file goes through the browser, which
 * serves them one by one: the Blobs whose requests arrive together are read as one Blob joining
 * up to eight of them (and 4 MB), then cut apart. A joined read that fails is made again file by
 * file, so the error names the file it belongs to.
 */
import { ImportError } from '../io/errors';

/** Most files, and most bytes, read from the disk in one go. */
const JOIN_FILES = 8;
const JOIN_BYTES = 4 * 1024 * 1024;

/** A file's bytes: its own buffer, or its stretch of a joined read. */
export type Bytes = ArrayBuffer | Uint8Array<ArrayBuffer>;

interface PendingRead {
  blob: Blob;
  resolve: (bytes: Bytes) => void;
  reject: (err: unknown) => void;
}

/**
 * A reader that joins the Blobs asked for before its next flush. `schedule` runs the flush: the
 * worker waits one timer turn, so that the requests already queued behind this one join it.
 */
export function createJoinedReader(schedule: (flush: () => void) => void, joinFiles = JOIN_FILES, joinBytes = JOIN_BYTES): (blob: Blob) => Promise<Bytes> {
  let queue: PendingRead[] = [];
  const readAlone = (r: PendingRead) => {
    r.blob.arrayBuffer().then(r.resolve, r.reject);
  };
  const readJoined = (group: PendingRead[]) => {
    if (group.length === 1) return readAlone(group[0] as PendingRead);
    new Blob(group.map((r) => r.blob)).arrayBuffer().then((all) => {
      let at = 0;
      // Each file's bytes are a view into the joined read, not a copy: new memory costs a page
      // fault per 4 KB when first written (core/scratch.ts), and the views go once the files are read.
      for (const r of group) {
        r.resolve(new Uint8Array(all, at, r.blob.size));
        at += r.blob.size;
      }
    }, () => group.forEach(readAlone));
  };
  const flush = () => {
    const pending = queue;
    queue = [];
    let group: PendingRead[] = [];
    let bytes = 0;
    for (const r of pending) {
      if (group.length > 0 && (group.length >= joinFiles || bytes + r.blob.size > joinBytes)) {
        readJoined(group);
        group = [];
        bytes = 0;
      }
      group.push(r);
      bytes += r.blob.size;
    }
    if (group.length > 0) readJoined(group);
  };
  return (blob) => new Promise<Bytes>((resolve, reject) => {
    if (queue.length === 0) schedule(flush);
    queue.push({ blob, resolve, reject });
  });
}

const readJoined = createJoinedReader((flush) => setTimeout(flush, 0));
const early = new WeakMap<Blob, Promise<Bytes>>();

export function startReading(data: ArrayBuffer | Blob): void {
  if (!(data instanceof Blob) || early.has(data)) return;
  const reading = readJoined(data);
  reading.catch(() => undefined);
  early.set(data, reading);
}

/** The file's bytes; a Blob that cannot be read gives ImportError UNREADABLE, naming the file. */
export async function importBytes(fileName: string, data: ArrayBuffer | Blob): Promise<Bytes> {
  if (!(data instanceof Blob)) return data;
  const reading = early.get(data) ?? data.arrayBuffer();
  early.delete(data);
  try {
    return await reading;
  } catch (err) {
    const why = err instanceof Error && err.message ? ` (${err.message})` : '';
    throw new ImportError('UNREADABLE', fileName, `the browser could not read the file${why}; it may have been moved, deleted or changed since it was picked: pick it again`);
  }
}
