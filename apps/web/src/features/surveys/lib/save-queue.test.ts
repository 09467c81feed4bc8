import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { memoryDraftStore, type DraftStore } from './draft-store';
import { SaveQueue, type QueueAdapter, type Saved } from './save-queue';

/** A stand-in answer: a grade word and a note. */
interface Answer {
  grade: string;
  note: string;
}

interface ServerCopy {
  version: number;
  answer: Answer;
}

/** A fake server holding one copy per key, refusing stale versions like the API does. */
function fakeServer(initial: Record<string, Answer>) {
  const copies = new Map<string, ServerCopy>(Object.entries(initial).map(([key, answer]) => [key, { version: 1, answer }]));
  const sent: Array<{ key: string; answer: Answer; baseVersion: number }> = [];
  let failWith: (() => unknown) | null = null;
  let hold: Promise<void> | null = null;
  const adapter: QueueAdapter<Answer> = {
    check: (_key, a) => (a.grade === 'bad' ? { grade: ['Choose a grade'] } : null),
    isSame: (_key, a, b) => a.grade === b.grade && a.note.trim() === b.note.trim(),
    async send(key, answer, baseVersion) {
      sent.push({ key, answer, baseVersion });
      if (hold) await hold;
      if (failWith) throw failWith();
      const copy = copies.get(key)!;
      if (copy.answer.grade === answer.grade && copy.answer.note === answer.note) return { ...copy };
      if (copy.version !== baseVersion) throw new ApiError({ status: 409, code: 'version_conflict', message: 'Someone saved first', details: { current: { ...copy } } });
      const next = { version: copy.version + 1, answer };
      copies.set(key, next);
      return { ...next };
    },
    conflictOf: (_key, error) => (error instanceof ApiError && error.code === 'version_conflict' ? (error.details.current as Saved<Answer>) : undefined),
  };
  return {
    adapter,
    copies,
    sent,
    failNextWith: (make: (() => unknown) | null) => (failWith = make),
    holdSends: () => {
      let release = () => {};
      hold = new Promise<void>((resolve) => (release = resolve));
      return () => {
        hold = null;
        release();
      };
    },
    /** Someone on another device saves this key. */
    saveElsewhere: (key: string, answer: Answer) => copies.set(key, { version: copies.get(key)!.version + 1, answer }),
  };
}

const blank: Answer = { grade: '', note: '' };
const networkDown = () => new ApiError({ status: 0, code: 'network_error', message: 'Could not reach the server' });

async function startQueue(server: ReturnType<typeof fakeServer>, store: DraftStore<Answer> = memoryDraftStore()) {
  const queue = new SaveQueue<Answer>({ scope: 'survey-1', adapter: server.adapter, store, debounceMs: 500, retryDelaysMs: [1_000, 4_000] });
  await queue.start([...server.copies].map(([key, copy]) => ({ key, saved: { ...copy } })));
  return queue;
}

beforeEach(() => vi.useFakeTimers());
afterEach(() => vi.useRealTimers());

describe('SaveQueue: saving as you go', () => {
  it('when a grade is tapped, then it is sent at once with the version it was based on and shows as saved', async () => {
    const server = fakeServer({ hammers: blank });
    const queue = await startQueue(server);
    queue.edit('hammers', { grade: 'replace', note: '' }, { isUrgent: true });
    expect(queue.entry('hammers')?.state.kind).toBe('saving');
    await vi.advanceTimersByTimeAsync(0);
    expect(server.sent).toEqual([{ key: 'hammers', answer: { grade: 'replace', note: '' }, baseVersion: 1 }]);
    expect(queue.entry('hammers')?.state.kind).toBe('saved');
    expect(queue.entry('hammers')?.base.version).toBe(2);
  });

  it('when a note is typed key by key, then one request goes after the pause with the last text', async () => {
    const server = fakeServer({ hammers: blank });
    const queue = await startQueue(server);
    for (const note of ['D', 'De', 'Deep', 'Deep grooves']) {
      queue.edit('hammers', { grade: '', note });
      await vi.advanceTimersByTimeAsync(100);
    }
    await vi.advanceTimersByTimeAsync(500);
    expect(server.sent.map((s) => s.answer.note)).toEqual(['Deep grooves']);
  });

  it('when the answer is edited while a save is on its way, then the newer answer follows on the new version', async () => {
    const server = fakeServer({ hammers: blank });
    const queue = await startQueue(server);
    const release = server.holdSends();
    queue.edit('hammers', { grade: 'needs_work', note: '' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(0);
    queue.edit('hammers', { grade: 'replace', note: '' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(0);
    expect(server.sent).toHaveLength(1);
    release();
    await vi.advanceTimersByTimeAsync(0);
    await vi.advanceTimersByTimeAsync(0);
    expect(server.sent.map((s) => [s.answer.grade, s.baseVersion])).toEqual([
      ['needs_work', 1],
      ['replace', 2],
    ]);
    expect(server.copies.get('hammers')).toEqual({ version: 3, answer: { grade: 'replace', note: '' } });
    expect(queue.entry('hammers')?.state.kind).toBe('saved');
  });

  it('when the answer is put back to what the server holds, then nothing is sent', async () => {
    const server = fakeServer({ hammers: { grade: 'sound', note: '' } });
    const queue = await startQueue(server);
    queue.edit('hammers', { grade: 'sound', note: 'x' });
    queue.edit('hammers', { grade: 'sound', note: '' });
    await vi.advanceTimersByTimeAsync(1_000);
    expect(server.sent).toEqual([]);
    expect(queue.entry('hammers')?.state.kind).toBe('saved');
  });

  it('when our own check fails, then the answer is kept on the device and not sent until fixed', async () => {
    const server = fakeServer({ hammers: blank });
    const store = memoryDraftStore<Answer>();
    const queue = await startQueue(server, store);
    queue.edit('hammers', { grade: 'bad', note: '' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(1_000);
    expect(server.sent).toEqual([]);
    expect(queue.entry('hammers')?.state).toEqual({ kind: 'invalid', fields: { grade: ['Choose a grade'] } });
    expect(await store.list('survey-1')).toHaveLength(1);
  });
});

describe('SaveQueue: a slow or broken connection', () => {
  it('when the network is down, then the answer waits, is retried with growing pauses, and saves once it is back', async () => {
    const server = fakeServer({ hammers: blank });
    const queue = await startQueue(server);
    server.failNextWith(networkDown);
    queue.edit('hammers', { grade: 'replace', note: '' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(0);
    expect(queue.entry('hammers')?.state).toEqual({ kind: 'retrying', attempt: 1, isSignedOut: false });
    await vi.advanceTimersByTimeAsync(1_000);
    expect(server.sent).toHaveLength(2);
    expect(queue.entry('hammers')?.state).toEqual({ kind: 'retrying', attempt: 2, isSignedOut: false });
    server.failNextWith(null);
    await vi.advanceTimersByTimeAsync(3_999);
    expect(server.sent).toHaveLength(2);
    await vi.advanceTimersByTimeAsync(1);
    expect(queue.entry('hammers')?.state.kind).toBe('saved');
  });

  it('when the connection comes back, then retryNow sends the waiting answers without waiting out the pause', async () => {
    const server = fakeServer({ hammers: blank });
    const queue = await startQueue(server);
    server.failNextWith(networkDown);
    queue.edit('hammers', { grade: 'replace', note: '' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(0);
    server.failNextWith(null);
    queue.retryNow();
    await vi.advanceTimersByTimeAsync(0);
    expect(queue.entry('hammers')?.state.kind).toBe('saved');
  });

  it('when the response was lost after the server saved, then the retry of the same answer is harmless', async () => {
    const server = fakeServer({ hammers: blank });
    const queue = await startQueue(server);
    server.failNextWith(null);
    const release = server.holdSends();
    queue.edit('hammers', { grade: 'replace', note: '' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(0);
    // The server stores it, but the reply never arrives.
    server.saveElsewhere('hammers', { grade: 'replace', note: '' });
    server.failNextWith(networkDown);
    release();
    await vi.advanceTimersByTimeAsync(0);
    server.failNextWith(null);
    await vi.advanceTimersByTimeAsync(1_000);
    expect(queue.entry('hammers')?.state.kind).toBe('saved');
    expect(server.copies.get('hammers')?.version).toBe(2);
  });

  it('when the API refuses the answer, then it shows the message and is not retried', async () => {
    const server = fakeServer({ hammers: blank });
    const queue = await startQueue(server);
    server.failNextWith(() => new ApiError({ status: 400, code: 'validation_failed', message: 'Note is too long', fields: { note: ['Note is too long'] } }));
    queue.edit('hammers', { grade: 'sound', note: 'long' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(60_000);
    expect(server.sent).toHaveLength(1);
    expect(queue.entry('hammers')?.state).toEqual({ kind: 'refused', message: 'Note is too long', fields: { note: ['Note is too long'] } });
  });
});

describe('SaveQueue: someone else saved first', () => {
  it('when the server moved on, then the conflict shows theirs, and keeping mine sends mine on their version', async () => {
    const server = fakeServer({ hammers: blank });
    const queue = await startQueue(server);
    server.saveElsewhere('hammers', { grade: 'needs_work', note: 'Tom: recover them' });
    queue.edit('hammers', { grade: 'replace', note: 'New set' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(0);
    const state = queue.entry('hammers')?.state;
    expect(state).toEqual({ kind: 'conflict', theirs: { version: 2, answer: { grade: 'needs_work', note: 'Tom: recover them' } } });
    queue.keepMine('hammers');
    await vi.advanceTimersByTimeAsync(0);
    expect(server.copies.get('hammers')).toEqual({ version: 3, answer: { grade: 'replace', note: 'New set' } });
    expect(queue.entry('hammers')?.state.kind).toBe('saved');
  });

  it('when the assessor takes theirs, then the device drops its answer and shows the server’s', async () => {
    const server = fakeServer({ hammers: blank });
    const store = memoryDraftStore<Answer>();
    const queue = await startQueue(server, store);
    server.saveElsewhere('hammers', { grade: 'needs_work', note: '' });
    queue.edit('hammers', { grade: 'replace', note: '' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(0);
    queue.takeTheirs('hammers');
    await vi.advanceTimersByTimeAsync(0);
    expect(queue.entry('hammers')?.answer).toEqual({ grade: 'needs_work', note: '' });
    expect(queue.entry('hammers')?.state.kind).toBe('saved');
    expect(await store.list('survey-1')).toEqual([]);
  });
});

describe('SaveQueue: a reload keeps what was typed', () => {
  it('when the page is reloaded before a save went out, then the kept draft is sent on start', async () => {
    const server = fakeServer({ hammers: blank, dampers: blank });
    const store = memoryDraftStore<Answer>();
    server.failNextWith(networkDown);
    const first = await startQueue(server, store);
    first.edit('hammers', { grade: 'replace', note: 'Grooved' }, { isUrgent: true });
    await vi.advanceTimersByTimeAsync(0);
    first.dispose();

    server.failNextWith(null);
    const second = await startQueue(server, store);
    expect(second.entry('hammers')?.answer).toEqual({ grade: 'replace', note: 'Grooved' });
    await vi.advanceTimersByTimeAsync(0);
    expect(server.copies.get('hammers')?.answer).toEqual({ grade: 'replace', note: 'Grooved' });
    expect(second.entry('hammers')?.state.kind).toBe('saved');
    expect(await store.list('survey-1')).toEqual([]);
  });

  it('when the server changed since the kept draft was made, then the draft comes back as a conflict, not sent', async () => {
    const server = fakeServer({ hammers: blank });
    const store = memoryDraftStore<Answer>();
    await store.put({ scope: 'survey-1', key: 'hammers', baseVersion: 1, answer: { grade: 'replace', note: '' }, editedAt: '2026-03-02T10:00:00Z' });
    server.saveElsewhere('hammers', { grade: 'sound', note: '' });
    const queue = await startQueue(server, store);
    await vi.advanceTimersByTimeAsync(1_000);
    expect(server.sent).toEqual([]);
    expect(queue.entry('hammers')?.state).toEqual({ kind: 'conflict', theirs: { version: 2, answer: { grade: 'sound', note: '' } } });
    expect(queue.summary()).toMatchObject({ unsentCount: 1, conflictCount: 1 });
  });

  it('when the kept draft matches what the server holds, then it is dropped quietly', async () => {
    const server = fakeServer({ hammers: { grade: 'sound', note: '' } });
    const store = memoryDraftStore<Answer>();
    await store.put({ scope: 'survey-1', key: 'hammers', baseVersion: 0, answer: { grade: 'sound', note: '' }, editedAt: '2026-03-02T10:00:00Z' });
    const queue = await startQueue(server, store);
    expect(queue.entry('hammers')?.state.kind).toBe('saved');
    expect(await store.list('survey-1')).toEqual([]);
  });
});

describe('SaveQueue: reading the server again', () => {
  it('when an idle answer was saved on another device, then refresh shows it; a busy one keeps the local edit', async () => {
    const server = fakeServer({ hammers: blank, dampers: blank });
    const queue = await startQueue(server);
    queue.refresh('hammers', { version: 2, answer: { grade: 'sound', note: '' } });
    expect(queue.entry('hammers')?.answer.grade).toBe('sound');
    queue.edit('dampers', { grade: 'replace', note: '' });
    queue.refresh('dampers', { version: 2, answer: { grade: 'sound', note: '' } });
    expect(queue.entry('dampers')?.answer.grade).toBe('replace');
  });
});
