/**
 * The bytes of blobs made from text (the demo, files given as text), kept beside the blob:
 * a blob's own read is a round trip through the browser that waits for the page's thread,
 * and every import would wait for it.
 */
const textBytes = new WeakMap<Blob, Uint8Array<ArrayBuffer>>();

export function textBlob(text: string): Blob {
  const bytes = new TextEncoder().encode(text);
  const blob = new Blob([bytes], { type: 'text/plain' });
  textBytes.set(blob, bytes);
  return blob;
}

/** A fresh copy of the blob's bytes (the worker takes the buffer over). */
export async function bytesOf(source: Blob): Promise<ArrayBuffer> {
  return textBytes.get(source)?.slice().buffer ?? source.arrayBuffer();
}
