/** Reading picked files in the worker, joined: every file gets exactly its own bytes back (hand-made inputs). */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ImportError } from '../io/errors';
import { createJoinedReader, importBytes } from './importBytes';

const text = (b: ArrayBuffer | Uint8Array) => new TextDecoder().decode(b);
const now = (flush: () => void) => queueMicrotask(flush);

describe('createJoinedReader', () => {
  afterEach(() => vi.restoreAllMocks());

  it('gives each file its own bytes when they are read joined, in groups of at most the files and bytes allowed', async () => {
    const spy = vi.spyOn(Blob.prototype, 'arrayBuffer');
    const limits = { files: 2, bytes: 1000 };
    const read = createJoinedReader(now, limits, limits);
    const blobs = ['0.1,2e-6\n', '', 'E/V;I/A\n0,1', 'x'.repeat(1200), 'last'].map((t) => new Blob([t]));
    const out = await Promise.all(blobs.map(read));
    expect(out.map(text)).toEqual(['0.1,2e-6\n', '', 'E/V;I/A\n0,1', 'x'.repeat(1200), 'last']);
    // [0.1…, ''] joined, ['E/V…'] alone (the 1200-byte file would pass 1000 bytes), ['x'…] alone, ['last'] alone.
    expect(spy).toHaveBeenCalledTimes(4);
    // Each answer holds its file's bytes only: a buffer of its own, or its stretch of the joined read.
    expect(new Set(out).size).toBe(out.length);
    expect(out.map((o) => o.byteLength)).toEqual(blobs.map((b) => b.size));
  });

  it('keeps the first group of a flush small and joins the rest in larger groups', async () => {
    const spy = vi.spyOn(Blob.prototype, 'arrayBuffer');
    const read = createJoinedReader(now, { files: 2, bytes: 1000 }, { files: 4, bytes: 1000 });
    const texts = Array.from({ length: 9 }, (_, k) => `${k},${k * 2}e-6\n`);
    const out = await Promise.all(texts.map((t) => read(new Blob([t]))));
    expect(out.map(text)).toEqual(texts);
    // Two files, then four, then the last three: three joined reads.
    expect(spy).toHaveBeenCalledTimes(3);
    expect(spy.mock.contexts.map((b) => (b as Blob).size)).toEqual([0, 2, 6].map((k) => texts.slice(k, k === 0 ? 2 : k + 4).join('').length));
  });

  it('reads the files one by one when the joined read fails, so the error belongs to its file', async () => {
    const original = Blob.prototype.arrayBuffer;
    const bad = new Blob(['gone from the disk']);
    vi.spyOn(Blob.prototype, 'arrayBuffer').mockImplementation(function (this: Blob) {
      // The joined blob and the bad file fail; the good one reads.
      return this === good ? original.call(this) : Promise.reject(new Error('NotReadableError'));
    });
    const good = new Blob(['1,2\n3,4']);
    const read = createJoinedReader(now);
    const [a, b] = await Promise.allSettled([read(good), read(bad)]);
    expect(a.status === 'fulfilled' && text(a.value)).toBe('1,2\n3,4');
    expect(b.status).toBe('rejected');
  });
});

describe('importBytes', () => {
  afterEach(() => vi.restoreAllMocks());

  it('passes bytes through and reads a Blob', async () => {
    const bytes = new TextEncoder().encode('0,1\n').buffer;
    expect(await importBytes('a.csv', bytes)).toBe(bytes);
    expect(text(await importBytes('b.csv', new Blob(['0,1\n'])))).toBe('0,1\n');
  });

  it('turns a file the browser cannot read into ImportError UNREADABLE that names the file', async () => {
    vi.spyOn(Blob.prototype, 'arrayBuffer').mockRejectedValue(new Error('A requested file or directory could not be found'));
    const err = await importBytes('scan_100mVs.csv', new Blob(['1,2'])).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ImportError);
    expect((err as ImportError).code).toBe('UNREADABLE');
    expect((err as ImportError).message).toMatch(/^scan_100mVs\.csv: the browser could not read the file \(A requested file/);
  });
});
