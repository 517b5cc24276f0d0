/**
 * Small storage adapter behind autosave, so the store does not care whether text lands in
 * localStorage, in memory (tests) or elsewhere. Failures (quota, private mode) reject; the
 * caller shows them and keeps working.
 */
export interface StorageAdapter {
  read(key: string): Promise<string | null>;
  write(key: string, text: string): Promise<void>;
  remove(key: string): Promise<void>;
}

export function localStorageAdapter(storage: Storage): StorageAdapter {
  return {
    read: (key) => Promise.resolve(storage.getItem(key)),
    write: (key, text) => new Promise((resolve, reject) => {
      try {
        storage.setItem(key, text);
        resolve();
      } catch (err) {
        reject(err instanceof Error ? err : new Error(String(err)));
      }
    }),
    remove: (key) => Promise.resolve(storage.removeItem(key)),
  };
}

export function memoryStorageAdapter(initial: Record<string, string> = {}): StorageAdapter & { data: Map<string, string> } {
  const data = new Map(Object.entries(initial));
  return {
    data,
    read: (key) => Promise.resolve(data.get(key) ?? null),
    write: (key, text) => {
      data.set(key, text);
      return Promise.resolve();
    },
    remove: (key) => {
      data.delete(key);
      return Promise.resolve();
    },
  };
}

/** The platform's localStorage when usable, else memory (so autosave never breaks the app). */
export function defaultStorageAdapter(): StorageAdapter {
  try {
    const ls = globalThis.localStorage;
    const probe = '__halfwave_probe__';
    ls.setItem(probe, '1');
    ls.removeItem(probe);
    return localStorageAdapter(ls);
  } catch {
    return memoryStorageAdapter();
  }
}
