/**
 * The bytes of a file to import. A file the user picked reaches the worker as its Blob, a
 * handle to the file on disk, and is read here, off the page's thread; bytes the page already
 * holds (the demo, a saved workspace) come as an ArrayBuffer.
 *
 * The worker starts reading a Blob as soon as its request arrives (`startReading`), so files that
 * wait their turn are read meanwhile. Each read of a picked file goes through the browser, which
 * serves them one by one: the Blobs whose requests arrive together are read as one Blob joining
 * several of them, then cut apart. A joined read that fails is made again file by file, so the
 * error names the file it belongs to.
 *
 * Joining costs the worker a blocking call to the browser per joined Blob: a few ms each on a busy
 * two-core machine, more than the files it joins add to it. So the groups are large, up to 128
 * files and 8 MB; only the first group of a flush is small (up to 8 files and 1 MB), so that the
 * first file is analysed, and shown, while the rest are still being read. Measured on a 120-file
 * batch (same-hour A/B, 8 fresh pages each): groups of 8 throughout ended 30–45 ms later.
 */
import { ImportError } from '../io/errors';

/** Most files, and most bytes, read from the disk in one go: the first group of a flush, then every later one. */
const FIRST_JOIN = { files: 8, bytes: 1024 * 1024 };
const JOIN = { files: 128, bytes: 8 * 1024 * 1024 };

/** Limits of one joined read: at most `files` files and `bytes` bytes (a larger file is read alone). */
export interface JoinLimits {
  files: number;
  bytes: number;
}

/** A file's bytes: its own buffer, or its stretch of a joined read. */
export type Bytes = ArrayBuffer | Uint8Array<ArrayBuffer>;

interface PendingRead {
  blob: Blob;
  resolve: (bytes: Bytes) => void;
  reject: (err: unknown) => void;
}

/**
 * A reader that joins the Blobs asked for before its next flush. `schedule` runs the flush: the
 * worker waits one timer turn, so that the requests already queued behind this one join it. The
 * first group of each flush keeps to `first`, the later ones to `rest`.
 */
export function createJoinedReader(schedule: (flush: () => void) => void, first: JoinLimits = FIRST_JOIN, rest: JoinLimits = JOIN): (blob: Blob) => Promise<Bytes> {
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
    let limits = first;
    for (const r of pending) {
      if (group.length > 0 && (group.length >= limits.files || bytes + r.blob.size > limits.bytes)) {
        readJoined(group);
        group = [];
        bytes = 0;
        limits = rest;
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
