import { z } from 'zod';
import type { QueuedClockAction } from './clock-queue';

const DB_NAME = 'keybed-wall';
const STORE = 'clock-actions';
const VERSION = 1;

/** What a stored action must look like to be sent; anything else found on the device is left alone. */
const StoredAction = z.object({
  key: z.string(),
  seq: z.number(),
  kind: z.enum(['clock-on', 'clock-off']),
  technician: z.object({ id: z.string(), name: z.string() }),
  task: z.object({ id: z.string(), title: z.string(), jobTitle: z.string() }).optional(),
  at: z.string(),
  grant: z.object({ token: z.string(), expiresAt: z.string() }).optional(),
  state: z.enum(['waiting', 'refused']),
  refusal: z.object({ code: z.string(), message: z.string() }).optional(),
});

export interface QueueStore {
  all(): Promise<QueuedClockAction[]>;
  put(action: QueuedClockAction): Promise<void>;
  remove(key: string): Promise<void>;
  /** False when the device would not give us IndexedDB: actions then live only while the page is open. */
  readonly isDurable: boolean;
}

function done<T>(request: IDBRequest<T>): Promise<T> {
  return new Promise((resolve, reject) => {
    request.onsuccess = () => resolve(request.result);
    request.onerror = () => reject(request.error ?? new Error('IndexedDB request failed'));
  });
}

function openDatabase(): Promise<IDBDatabase> {
  const request = indexedDB.open(DB_NAME, VERSION);
  request.onupgradeneeded = () => {
    if (!request.result.objectStoreNames.contains(STORE)) request.result.createObjectStore(STORE, { keyPath: 'key' });
  };
  return done(request);
}

function indexedDbStore(db: IDBDatabase): QueueStore {
  const store = (mode: IDBTransactionMode) => db.transaction(STORE, mode).objectStore(STORE);
  return {
    isDurable: true,
    async all() {
      const rows: unknown[] = await done(store('readonly').getAll());
      return rows.flatMap((row) => {
        const parsed = StoredAction.safeParse(row);
        return parsed.success ? [parsed.data] : [];
      });
    },
    put: async (action) => void (await done(store('readwrite').put(action))),
    remove: async (key) => void (await done(store('readwrite').delete(key))),
  };
}

function memoryStore(): QueueStore {
  const rows = new Map<string, QueuedClockAction>();
  return {
    isDurable: false,
    all: async () => [...rows.values()],
    put: async (action) => void rows.set(action.key, action),
    remove: async (key) => void rows.delete(key),
  };
}

/** The screen's store of clock actions not yet sent: IndexedDB, or memory if the browser refuses it. */
export async function openQueueStore(): Promise<QueueStore> {
  try {
    if (typeof indexedDB === 'undefined') return memoryStore();
    return indexedDbStore(await openDatabase());
  } catch {
    return memoryStore();
  }
}
