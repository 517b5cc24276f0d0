/**
 * Where autosave keeps the workspace between visits: the session text (settings, series, picks)
 * and each file's original bytes under its SHA-256. The browser's IndexedDB holds them (through
 * idb-keyval: large binary values, no size limit beyond the origin's quota); tests use memory.
 * Failures (quota, private mode) reject with the platform's error; the caller reports what was not
 * saved and keeps working, and nothing already saved is removed by a failed write.
 */
import { del, get, keys, set, type UseStore } from 'idb-keyval';

export interface StorageAdapter {
  read(key: string): Promise<string | null>;
  write(key: string, text: string): Promise<void>;
  remove(key: string): Promise<void>;
  readBytes(key: string): Promise<Uint8Array<ArrayBuffer> | null>;
  writeBytes(key: string, bytes: Uint8Array): Promise<void>;
  removeBytes(key: string): Promise<void>;
  /** Keys of every stored byte record. */
  byteKeys(): Promise<string[]>;
}

const BYTES = 'bytes:';

export function memoryStorageAdapter(initial: Record<string, string> = {}): StorageAdapter & { data: Map<string, string>; bytes: Map<string, Uint8Array<ArrayBuffer>>; quotaBytes: number } {
  const data = new Map(Object.entries(initial));
  const bytes = new Map<string, Uint8Array<ArrayBuffer>>();
  const adapter = {
    data,
    bytes,
    /** Total bytes the memory store accepts before it rejects as a full disk would. */
    quotaBytes: Infinity,
    read: (key: string) => Promise.resolve(data.get(key) ?? null),
    write: (key: string, text: string) => {
      data.set(key, text);
      return Promise.resolve();
    },
    remove: (key: string) => {
      data.delete(key);
      return Promise.resolve();
    },
    removeBytes: (key: string) => {
      bytes.delete(key);
      return Promise.resolve();
    },
    readBytes: (key: string) => Promise.resolve(bytes.get(key) ?? null),
    writeBytes: (key: string, b: Uint8Array) => {
      const used = [...bytes.values()].reduce((n, x) => n + x.length, 0);
      if (used + b.length > adapter.quotaBytes) return Promise.reject(new DOMException('the storage quota is used up', 'QuotaExceededError'));
      bytes.set(key, b.slice());
      return Promise.resolve();
    },
    byteKeys: () => Promise.resolve([...bytes.keys()]),
  };
  return adapter;
}

/**
 * idb-keyval's store, opened so that a database that exists without our object store (made by
 * another page of the origin, or an older version) is upgraded instead of failing every call.
 */
export function workspaceStore(dbName = 'halfwave', storeName = 'workspace'): UseStore {
  let db: Promise<IDBDatabase> | null = null;
  const open = (version?: number): Promise<IDBDatabase> => new Promise<IDBDatabase>((resolve, reject) => {
    const req = version === undefined ? indexedDB.open(dbName) : indexedDB.open(dbName, version);
    req.onupgradeneeded = () => {
      if (!req.result.objectStoreNames.contains(storeName)) req.result.createObjectStore(storeName);
    };
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error ?? new Error(`cannot open the browser database ${dbName}`));
  }).then((d) => {
    if (d.objectStoreNames.contains(storeName)) return d;
    d.close();
    return open(d.version + 1);
  });
  return (mode, callback) => (db ??= open()).then((d) => callback(d.transaction(storeName, mode).objectStore(storeName)));
}

/**
 * False only when the browser says that no database of that name exists (a first visit). Opening
 * one to read it would create it, which costs a first visit a good part of its start-up.
 */
async function databaseMayExist(dbName: string): Promise<boolean> {
  if (typeof indexedDB.databases !== 'function') return true;
  try {
    return (await indexedDB.databases()).some((d) => d.name === dbName);
  } catch {
    return true;
  }
}

export function indexedDbStorageAdapter(store: UseStore = workspaceStore(), dbName = 'halfwave'): StorageAdapter {
  // Asked once; any write makes the database exist.
  let exists: Promise<boolean> | null = null;
  const mayRead = () => (exists ??= databaseMayExist(dbName));
  const written = () => {
    exists = Promise.resolve(true);
  };
  return {
    read: async (key) => ((await mayRead()) ? ((await get<string>(key, store)) ?? null) : null),
    write: (key, text) => {
      written();
      return set(key, text, store);
    },
    remove: (key) => del(key, store),
    readBytes: async (key) => {
      if (!(await mayRead())) return null;
      const v = await get<Uint8Array<ArrayBuffer> | ArrayBuffer>(BYTES + key, store);
      return v === undefined ? null : v instanceof Uint8Array ? v : new Uint8Array(v);
    },
    writeBytes: (key, b) => {
      written();
      return set(BYTES + key, b, store);
    },
    removeBytes: (key) => del(BYTES + key, store),
    byteKeys: async () => ((await mayRead()) ? (await keys<IDBValidKey>(store)).flatMap((k) => (typeof k === 'string' && k.startsWith(BYTES) ? [k.slice(BYTES.length)] : [])) : []),
  };
}

/** IndexedDB when the platform has it, else memory (so autosave never breaks the app). */
export function defaultStorageAdapter(): StorageAdapter {
  return typeof indexedDB === 'undefined' ? memoryStorageAdapter() : indexedDbStorageAdapter();
}

/** True for the platform's "storage is full" errors. */
export function isQuotaError(err: unknown): boolean {
  const name = (err as { name?: string } | null)?.name ?? '';
  return name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED' || /quota/i.test((err as Error | null)?.message ?? '');
}
