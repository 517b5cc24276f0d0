/** Reading picked files joined: every file gets exactly its own bytes back (hand-made inputs). */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createBytesReader } from './fileSource';

const text = (b: ArrayBuffer) => new TextDecoder().decode(b);

describe('createBytesReader', () => {
  afterEach(() => vi.restoreAllMocks());

  it('gives each file its own bytes when they are read joined, in groups of at most the files and bytes allowed', async () => {
    const spy = vi.spyOn(Blob.prototype, 'arrayBuffer');
    const read = createBytesReader(2, 1000);
    const blobs = ['0.1,2e-6\n', '', 'E/V;I/A\n0,1', 'x'.repeat(1200), 'last'].map((t) => new Blob([t]));
    const out = await Promise.all(blobs.map(read));
    expect(out.map(text)).toEqual(['0.1,2e-6\n', '', 'E/V;I/A\n0,1', 'x'.repeat(1200), 'last']);
    // [0.1…, ''] joined, ['E/V…'] alone (the 1200-byte file would pass 1000 bytes), ['x'…] alone, ['last'] alone.
    expect(spy).toHaveBeenCalledTimes(4);
    // Each answer is a buffer of its own (the worker takes it over).
    expect(new Set(out).size).toBe(out.length);
  });

  it('reads the files one by one when the joined read fails, so the error names its file', async () => {
    const original = Blob.prototype.arrayBuffer;
    const bad = new Blob(['gone from the disk']);
    vi.spyOn(Blob.prototype, 'arrayBuffer').mockImplementation(function (this: Blob) {
      // The joined blob and the bad file fail; the good one reads.
      return this === good ? original.call(this) : Promise.reject(new Error('NotReadableError'));
    });
    const good = new Blob(['1,2\n3,4']);
    const read = createBytesReader();
    const [a, b] = await Promise.allSettled([read(good), read(bad)]);
    expect(a.status === 'fulfilled' && text(a.value)).toBe('1,2\n3,4');
    expect(b.status).toBe('rejected');
  });

  it('copies bytes the page already holds, without joining', async () => {
    const bytes = new TextEncoder().encode('0,1\n');
    const out = await createBytesReader()(bytes);
    expect(text(out)).toBe('0,1\n');
    expect(out).not.toBe(bytes.buffer);
  });
});
