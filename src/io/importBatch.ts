/**
 * Imports many files one after another (100 and more), asynchronously, giving the event loop a
 * turn between chunks. A bad file yields its ImportError in its own slot; it never stops the
 * others, and nothing already imported is touched. Progress counts files and the share of the
 * current file done.
 */
import { ImportError } from './errors';
import { importVoltammogramAsync } from './importVoltammogram';
import type { ImportInput } from './importVoltammogram';
import { createYielder } from './timeSlice';
import type { ImportOverrides, ImportResult } from './types';

export interface BatchFile {
  name: string;
  data: ImportInput;
}

export type BatchItem = { fileName: string; ok: true; result: ImportResult } | { fileName: string; ok: false; error: ImportError };

export interface BatchOptions {
  /** Overrides for every file, or per file name. */
  overrides?: ImportOverrides | ((fileName: string) => ImportOverrides | undefined);
  /** Fraction of the whole batch done, 0..1. */
  onProgress?: (fraction: number) => void;
  /** Called as each file finishes, in order. */
  onItem?: (item: BatchItem, index: number) => void;
  signal?: AbortSignal;
}

export async function importBatch(files: BatchFile[], options: BatchOptions = {}): Promise<BatchItem[]> {
  const items: BatchItem[] = [];
  const maybeYield = createYielder();
  for (let i = 0; i < files.length; i++) {
    const f = files[i] as BatchFile;
    const overrides = typeof options.overrides === 'function' ? options.overrides(f.name) : options.overrides;
    let item: BatchItem;
    try {
      const result = await importVoltammogramAsync(f.name, f.data, {
        ...(overrides ? { overrides } : {}),
        ...(options.signal ? { signal: options.signal } : {}),
        onProgress: (p) => options.onProgress?.((i + p) / files.length),
        maybeYield,
      });
      item = { fileName: f.name, ok: true, result };
    } catch (err) {
      if (options.signal?.aborted) throw err;
      const error = err instanceof ImportError ? err : new ImportError('INTERNAL', f.name, String(err));
      item = { fileName: f.name, ok: false, error };
    }
    items.push(item);
    options.onItem?.(item, i);
    options.onProgress?.((i + 1) / files.length);
    await maybeYield();
  }
  return items;
}
