import { z } from 'zod';

/** An answer not yet on the server, kept on this device with the version it was based on. */
export interface StoredDraft<A> {
  scope: string;
  key: string;
  baseVersion: number;
  answer: A;
  editedAt: string;
}

export interface DraftStore<A> {
  list(scope: string): Promise<Array<StoredDraft<A>>>;
  put(draft: StoredDraft<A>): Promise<void>;
  remove(scope: string, key: string): Promise<void>;
  /** False when the browser keeps nothing across a reload (drafts then live only while the page is open). */
  readonly isDurable: boolean;
}

/** Anything with zod's `safeParse`: how a stored answer is checked before it is trusted. */
interface AnswerSchema<A> {
  safeParse(value: unknown): { success: true; data: A } | { success: false };
}

const DB_NAME = 'keybed-surveys';
const DRAFTS = 'drafts';
const SNAPSHOTS = 'snapshots';
const VERSION = 1;

const StoredRow = z.object({ id: z.string(), scope: z.string(), key: z.string(), baseVersion: z.number(), answer: z.unknown(), editedAt: z.string() });

function done<T>(request: IDBRequest<T>): Promise<T> {
  return new Promise((resolve, reject) => {
    request.onsuccess = () => resolve(request.result);
    request.onerror = () => reject(request.error ?? new Error('IndexedDB request failed'));
  });
}

let database: Promise<IDBDatabase> | null = null;

/** One connection for the page; a refusal (private mode, storage off) is remembered as a failure. */
export function openSurveyDatabase(): Promise<IDBDatabase> {
  database ??= new Promise<IDBDatabase>((resolve, reject) => {
    if (typeof indexedDB === 'undefined') return reject(new Error('No IndexedDB'));
    const request = indexedDB.open(DB_NAME, VERSION);
    request.onupgradeneeded = () => {
      const db = request.result;
      if (!db.objectStoreNames.contains(DRAFTS)) db.createObjectStore(DRAFTS, { keyPath: 'id' }).createIndex('scope', 'scope');
      if (!db.objectStoreNames.contains(SNAPSHOTS)) db.createObjectStore(SNAPSHOTS, { keyPath: 'id' });
    };
    done(request).then(resolve, reject);
  });
  return database;
}

const rowId = (scope: string, key: string) => `${scope}|${key}`;

function parseRows<A>(rows: unknown[], schema: AnswerSchema<A>): Array<StoredDraft<A>> {
  return rows.flatMap((row) => {
    const parsed = StoredRow.safeParse(row);
    if (!parsed.success) return [];
    const answer = schema.safeParse(parsed.data.answer);
    return answer.success ? [{ scope: parsed.data.scope, key: parsed.data.key, baseVersion: parsed.data.baseVersion, answer: answer.data, editedAt: parsed.data.editedAt }] : [];
  });
}

function indexedDbStore<A>(db: IDBDatabase, schema: AnswerSchema<A>): DraftStore<A> {
  const store = (mode: IDBTransactionMode) => db.transaction(DRAFTS, mode).objectStore(DRAFTS);
  return {
    isDurable: true,
    list: async (scope) => parseRows(await done(store('readonly').index('scope').getAll(scope)), schema),
    put: async (draft) => void (await done(store('readwrite').put({ id: rowId(draft.scope, draft.key), ...draft }))),
    remove: async (scope, key) => void (await done(store('readwrite').delete(rowId(scope, key)))),
  };
}

/** Where IndexedDB is refused but localStorage works (some private modes). */
function localStorageStore<A>(schema: AnswerSchema<A>): DraftStore<A> {
  const prefix = 'keybed.survey-draft.';
  return {
    isDurable: true,
    async list(scope) {
      const rows: unknown[] = [];
      for (let i = 0; i < localStorage.length; i++) {
        const name = localStorage.key(i);
        if (!name?.startsWith(`${prefix}${scope}|`)) continue;
        try {
          rows.push(JSON.parse(localStorage.getItem(name) ?? 'null'));
        } catch {
          // A damaged entry is skipped, never trusted.
        }
      }
      return parseRows(rows, schema);
    },
    put: async (draft) => localStorage.setItem(`${prefix}${rowId(draft.scope, draft.key)}`, JSON.stringify({ id: rowId(draft.scope, draft.key), ...draft })),
    remove: async (scope, key) => localStorage.removeItem(`${prefix}${rowId(scope, key)}`),
  };
}

export function memoryDraftStore<A>(): DraftStore<A> {
  const rows = new Map<string, StoredDraft<A>>();
  return {
    isDurable: false,
    list: async (scope) => [...rows.values()].filter((d) => d.scope === scope),
    put: async (draft) => void rows.set(rowId(draft.scope, draft.key), draft),
    remove: async (scope, key) => void rows.delete(rowId(scope, key)),
  };
}

function canUseLocalStorage(): boolean {
  try {
    localStorage.setItem('keybed.probe', '1');
    localStorage.removeItem('keybed.probe');
    return true;
  } catch {
    return false;
  }
}

/** Drafts in IndexedDB, else localStorage, else memory (then the page says unsent answers need it open). */
export async function openDraftStore<A>(schema: AnswerSchema<A>): Promise<DraftStore<A>> {
  try {
    return indexedDbStore(await openSurveyDatabase(), schema);
  } catch {
    if (typeof localStorage !== 'undefined' && canUseLocalStorage()) return localStorageStore(schema);
    return memoryDraftStore();
  }
}
