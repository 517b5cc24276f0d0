/**
 * A file's original bytes as the store keeps them, to read the file again (with other import
 * choices, or after a worker stopped) and to save it: the File the user picked (a Blob: the
 * browser holds it, it can be large), or the bytes themselves when the page already has them (the
 * demo, a restored workspace or session, text). Bytes are not wrapped in a Blob: making a Blob,
 * or a slice of one, and reading it back each go through the browser, and on a first visit the
 * page's thread would spend a good part of the demo's start-up on them (measured in Chromium).
 */
export type FileSource = Blob | Uint8Array<ArrayBuffer>;

export function sourceOf(data: string | FileSource): FileSource {
  return typeof data === 'string' ? new TextEncoder().encode(data) : data;
}

export function sourceSize(source: FileSource): number {
  return source instanceof Uint8Array ? source.byteLength : source.size;
}

/** A fresh copy of the file's bytes (the worker takes the buffer over). */
export async function bytesOf(source: FileSource): Promise<ArrayBuffer> {
  return source instanceof Uint8Array ? source.slice().buffer : source.arrayBuffer();
}

/** Most files, and most bytes, read from the disk in one go. */
const JOIN_FILES = 8;
const JOIN_BYTES = 4 * 1024 * 1024;

interface PendingRead {
  blob: Blob;
  resolve: (bytes: ArrayBuffer) => void;
  reject: (err: unknown) => void;
}

/**
 * `bytesOf` for many files at once: the picked files whose bytes are asked for in the same turn
 * are read as one Blob joining up to eight of them (and 4 MB), then cut apart. Each read of a
 * picked file goes through the browser; in Chromium, eight small files read joined took about
 * half the page's time of eight reads (measured with 120 picked files). A joined read that
 * fails is made again file by file, so the error names the file it belongs to.
 */
export function createBytesReader(joinFiles = JOIN_FILES, joinBytes = JOIN_BYTES): (source: FileSource) => Promise<ArrayBuffer> {
  let queue: PendingRead[] = [];
  const readAlone = (r: PendingRead) => {
    r.blob.arrayBuffer().then(r.resolve, r.reject);
  };
  const readJoined = (group: PendingRead[]) => {
    if (group.length === 1) return readAlone(group[0] as PendingRead);
    new Blob(group.map((r) => r.blob)).arrayBuffer().then((all) => {
      let at = 0;
      for (const r of group) {
        r.resolve(all.slice(at, at + r.blob.size));
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
  return (source) => {
    if (source instanceof Uint8Array) return bytesOf(source);
    return new Promise<ArrayBuffer>((resolve, reject) => {
      if (queue.length === 0) queueMicrotask(flush);
      queue.push({ blob: source, resolve, reject });
    });
  };
}
