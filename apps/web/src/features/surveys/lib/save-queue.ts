import type { FieldErrors } from '@keybed/shared';
import { isApiError } from '@/lib/api-client';
import type { DraftStore } from './draft-store';

/** What the server holds for one thing being edited: its version and the answer at that version. */
export interface Saved<A> {
  version: number;
  answer: A;
}

/** Where an answer stands, as the assessor sees it beside the thing they edited. */
export type SaveState<A> =
  /** The server holds exactly this answer. */
  | { kind: 'saved' }
  /** Waiting for typing to pause, or on its way. */
  | { kind: 'saving' }
  /** Could not be sent (no connection, server trouble, signed out); kept on the device and tried again. */
  | { kind: 'retrying'; attempt: number; isSignedOut: boolean }
  /** Fails our own check (a reason missing, a number unreadable); kept on the device, not sent until fixed. */
  | { kind: 'invalid'; fields: FieldErrors }
  /** The server refused it for good (bad input, gone); kept on the device until changed. */
  | { kind: 'refused'; message: string; fields: FieldErrors }
  /** Someone else saved first; the assessor decides whose answer stands. */
  | { kind: 'conflict'; theirs: Saved<A> };

export interface QueueEntry<A> {
  key: string;
  /** The answer as edited on this device. */
  answer: A;
  /** The server's answer the edit is based on. */
  base: Saved<A>;
  state: SaveState<A>;
}

/** How one kind of answer is checked, compared, sent, and read back from a version conflict. */
export interface QueueAdapter<A> {
  check(key: string, answer: A): FieldErrors | null;
  isSame(key: string, a: A, b: A): boolean;
  send(key: string, answer: A, baseVersion: number): Promise<Saved<A>>;
  conflictOf(key: string, error: unknown): Saved<A> | undefined;
}

export interface Timers {
  set(run: () => void, ms: number): unknown;
  clear(handle: unknown): void;
}

const realTimers: Timers = { set: (run, ms) => setTimeout(run, ms), clear: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>) };

interface QueueOptions<A> {
  /** Which drafts in the store belong to this queue (one survey's components, say). */
  scope: string;
  adapter: QueueAdapter<A>;
  store: DraftStore<A>;
  timers?: Timers;
  now?: () => Date;
  /** Pause after the last keystroke before sending. */
  debounceMs?: number;
  /** Waits before each retry; the last repeats. */
  retryDelaysMs?: readonly number[];
}

/** Codes worth trying again later: the request may well succeed once the connection or server is back. */
const RETRYABLE = new Set(['network_error', 'internal', 'service_unavailable', 'rate_limited', 'bad_response']);

export interface QueueSummary {
  /** Answers the server does not hold yet. */
  unsentCount: number;
  retryingCount: number;
  conflictCount: number;
  isSignedOut: boolean;
  /** False once the device refused to keep drafts: unsent answers then need the page kept open. */
  isDurable: boolean;
}

/**
 * Saving as you go. Every edit is written to the device's draft store first, then sent after a
 * short pause with the version it was based on. One request per key is in flight at a time; an
 * edit made meanwhile goes next. Failures keep the draft: connection trouble retries with growing
 * waits, a version conflict waits for the assessor's decision, a refusal waits for a change. On
 * start, drafts left by an earlier visit are sent again, or shown as conflicts when the server
 * has moved on since they were made.
 */
export class SaveQueue<A> {
  private readonly entriesByKey = new Map<string, QueueEntry<A>>();
  private readonly timersByKey = new Map<string, unknown>();
  private readonly inFlight = new Map<string, A>();
  private readonly listeners = new Set<() => void>();
  private readonly o: Required<Omit<QueueOptions<A>, 'timers' | 'now'>> & { timers: Timers; now: () => Date };
  private summaryCache: QueueSummary | null = null;
  private isDisposed = false;
  /** Goes up on every change, so views can tell cheaply that something moved. */
  revision = 0;
  /** False once the store failed a write: unsent answers then live only while the page is open. */
  isDurable: boolean;

  constructor(options: QueueOptions<A>) {
    this.o = { debounceMs: 700, retryDelaysMs: [2_000, 5_000, 15_000, 30_000], timers: realTimers, now: () => new Date(), ...options };
    this.isDurable = options.store.isDurable;
  }

  /** Loads what the server holds and any drafts this device kept; resends or flags those drafts. */
  async start(items: ReadonlyArray<{ key: string; saved: Saved<A> }>): Promise<void> {
    for (const { key, saved } of items) this.entriesByKey.set(key, { key, answer: saved.answer, base: saved, state: { kind: 'saved' } });
    const drafts = await this.o.store.list(this.o.scope).catch(() => []);
    const { adapter } = this.o;
    for (const draft of drafts) {
      const entry = this.entriesByKey.get(draft.key);
      if (!entry) continue;
      if (adapter.isSame(draft.key, draft.answer, entry.base.answer)) {
        this.forget(draft.key);
      } else if (draft.baseVersion === entry.base.version) {
        this.put(draft.key, { answer: draft.answer });
        this.checkThenSend(draft.key, 0);
      } else {
        this.put(draft.key, { answer: draft.answer, state: { kind: 'conflict', theirs: entry.base } });
      }
    }
    this.emit();
  }

  entry(key: string): QueueEntry<A> | undefined {
    return this.entriesByKey.get(key);
  }

  summary(): QueueSummary {
    if (this.summaryCache) return this.summaryCache;
    const states = [...this.entriesByKey.values()].map((e) => e.state);
    this.summaryCache = {
      unsentCount: states.filter((s) => s.kind !== 'saved').length,
      retryingCount: states.filter((s) => s.kind === 'retrying').length,
      conflictCount: states.filter((s) => s.kind === 'conflict').length,
      isSignedOut: states.some((s) => s.kind === 'retrying' && s.isSignedOut),
      isDurable: this.isDurable,
    };
    return this.summaryCache;
  }

  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => void this.listeners.delete(listener);
  };

  /** The assessor changed an answer. `isUrgent` (a tap, not typing) sends without the pause. */
  edit(key: string, answer: A, { isUrgent = false }: { isUrgent?: boolean } = {}): void {
    const entry = this.entriesByKey.get(key);
    if (!entry) return;
    this.put(key, { answer });
    if (entry.state.kind === 'conflict') {
      this.remember(key);
    } else if (!this.inFlight.has(key) && this.o.adapter.isSame(key, answer, entry.base.answer)) {
      this.cancelTimer(key);
      this.forget(key);
      this.put(key, { state: { kind: 'saved' } });
    } else {
      this.remember(key);
      this.checkThenSend(key, isUrgent ? 0 : this.o.debounceMs);
    }
    this.emit();
  }

  /** After a conflict: send this device's answer over theirs. */
  keepMine(key: string): void {
    const entry = this.entriesByKey.get(key);
    if (entry?.state.kind !== 'conflict') return;
    this.put(key, { base: entry.state.theirs, state: { kind: 'saving' } });
    this.remember(key);
    this.checkThenSend(key, 0);
    this.emit();
  }

  /** After a conflict: drop this device's answer and take the one the server holds. */
  takeTheirs(key: string): void {
    const entry = this.entriesByKey.get(key);
    if (entry?.state.kind !== 'conflict') return;
    const theirs = entry.state.theirs;
    this.forget(key);
    this.put(key, { base: theirs, answer: theirs.answer, state: { kind: 'saved' } });
    this.emit();
  }

  /** The connection is back: try every waiting answer now. */
  retryNow(): void {
    for (const entry of this.entriesByKey.values()) if (entry.state.kind === 'retrying') this.schedule(entry.key, 0);
  }

  /** The server's copy was read again; an idle key takes it (someone else's later save shows here). */
  refresh(key: string, saved: Saved<A>): void {
    const entry = this.entriesByKey.get(key);
    if (!entry || entry.state.kind !== 'saved' || this.inFlight.has(key) || this.timersByKey.has(key)) return;
    if (saved.version <= entry.base.version) return;
    this.put(key, { base: saved, answer: saved.answer });
    this.emit();
  }

  dispose(): void {
    this.isDisposed = true;
    for (const handle of this.timersByKey.values()) this.o.timers.clear(handle);
    this.timersByKey.clear();
    this.listeners.clear();
  }

  private checkThenSend(key: string, delayMs: number) {
    const entry = this.entriesByKey.get(key)!;
    const fields = this.o.adapter.check(key, entry.answer);
    if (fields) {
      this.cancelTimer(key);
      this.put(key, { state: { kind: 'invalid', fields } });
      return;
    }
    this.put(key, { state: { kind: 'saving' } });
    this.schedule(key, delayMs);
  }

  private schedule(key: string, delayMs: number) {
    this.cancelTimer(key);
    this.timersByKey.set(
      key,
      this.o.timers.set(() => {
        this.timersByKey.delete(key);
        void this.flush(key);
      }, delayMs),
    );
  }

  private cancelTimer(key: string) {
    const handle = this.timersByKey.get(key);
    if (handle !== undefined) this.o.timers.clear(handle);
    this.timersByKey.delete(key);
  }

  private async flush(key: string): Promise<void> {
    const entry = this.entriesByKey.get(key);
    if (!entry || this.isDisposed || this.inFlight.has(key)) return;
    if (entry.state.kind !== 'saving' && entry.state.kind !== 'retrying') return;
    const { adapter } = this.o;
    if (adapter.isSame(key, entry.answer, entry.base.answer)) {
      this.forget(key);
      this.put(key, { state: { kind: 'saved' } });
      return this.emit();
    }
    const sending = entry.answer;
    this.inFlight.set(key, sending);
    this.put(key, { state: { kind: 'saving' } });
    this.emit();
    let saved: Saved<A>;
    try {
      saved = await adapter.send(key, sending, entry.base.version);
    } catch (error) {
      this.inFlight.delete(key);
      if (!this.isDisposed) this.failed(key, error, entry.state.kind === 'retrying' ? entry.state.attempt : 0);
      return;
    }
    this.inFlight.delete(key);
    if (this.isDisposed) return;
    const now = this.entriesByKey.get(key)!;
    this.put(key, { base: saved });
    if (adapter.isSame(key, now.answer, sending)) {
      this.forget(key);
      this.put(key, { state: { kind: 'saved' } });
    } else {
      // Edited while the request was out: the newer answer goes next, based on the version just saved.
      this.remember(key);
      this.checkThenSend(key, this.timersByKey.has(key) ? this.o.debounceMs : 0);
    }
    this.emit();
  }

  private failed(key: string, error: unknown, previousAttempt: number) {
    const entry = this.entriesByKey.get(key)!;
    const theirs = this.o.adapter.conflictOf(key, error);
    if (theirs) {
      if (this.o.adapter.isSame(key, entry.answer, theirs.answer)) {
        this.forget(key);
        this.put(key, { base: theirs, state: { kind: 'saved' } });
      } else {
        this.put(key, { state: { kind: 'conflict', theirs } });
      }
    } else if (isApiError(error) && (RETRYABLE.has(error.code) || error.code === 'unauthenticated')) {
      const attempt = previousAttempt + 1;
      const delays = this.o.retryDelaysMs;
      this.put(key, { state: { kind: 'retrying', attempt, isSignedOut: error.code === 'unauthenticated' } });
      this.schedule(key, delays[Math.min(attempt, delays.length) - 1] ?? 30_000);
    } else {
      const message = error instanceof Error ? error.message : 'This answer could not be saved';
      this.put(key, { state: { kind: 'refused', message, fields: (isApiError(error) && error.fields) || {} } });
    }
    this.emit();
  }

  /** Keeps the current answer and its base version on the device. */
  private remember(key: string) {
    const entry = this.entriesByKey.get(key)!;
    this.o.store
      .put({ scope: this.o.scope, key, baseVersion: entry.base.version, answer: entry.answer, editedAt: this.o.now().toISOString() })
      .catch(() => this.lostDurability());
  }

  private forget(key: string) {
    this.o.store.remove(this.o.scope, key).catch(() => this.lostDurability());
  }

  private lostDurability() {
    if (!this.isDurable) return;
    this.isDurable = false;
    this.emit();
  }

  private put(key: string, changes: Partial<QueueEntry<A>>) {
    const entry = this.entriesByKey.get(key);
    if (entry) this.entriesByKey.set(key, { ...entry, ...changes });
  }

  private emit() {
    this.summaryCache = null;
    this.revision += 1;
    for (const listener of this.listeners) listener();
  }
}
