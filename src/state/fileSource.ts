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
