import { describe, expect, it } from 'vitest';
import { createBoardCache, toBoardBody, type BoardBody } from './board-cache';

const W = 'workshop-a';

/** A build whose result the test hands over when it chooses, to interleave changes with it. */
function deferredBuild(value: unknown) {
  let release!: () => void;
  const gate = new Promise<void>((resolve) => (release = resolve));
  let calls = 0;
  const build = async (): Promise<BoardBody> => {
    calls++;
    await gate;
    return toBoardBody(value);
  };
  return { build, release, calls: () => calls };
}

function counter(value: unknown) {
  let calls = 0;
  return { build: async () => (calls++, toBoardBody(value)), calls: () => calls };
}

describe('board cache', () => {
  it('when caching is off (listener not yet listening), then every read builds the board', async () => {
    const cache = createBoardCache();
    const b = counter({ n: 1 });
    await cache.get(W, b.build);
    await cache.get(W, b.build);
    expect(b.calls()).toBe(2);
  });

  it('when read twice with no change, then the second read is served from the cache, bytes and validator alike', async () => {
    const cache = createBoardCache();
    cache.reset();
    const b = counter({ stages: [] });
    const first = await cache.get(W, b.build);
    const second = await cache.get(W, b.build);
    expect(b.calls()).toBe(1);
    expect(second.bytes.toString()).toBe('{"stages":[]}');
    expect(second.etag).toBe(first.etag);
  });

  it('when the workshop changes, then the next read builds again; other workshops keep theirs', async () => {
    const cache = createBoardCache();
    cache.reset();
    const a = counter({ a: 1 });
    const b = counter({ b: 1 });
    await cache.get(W, a.build);
    await cache.get('workshop-b', b.build);
    cache.invalidate(W);
    await cache.get(W, a.build);
    await cache.get('workshop-b', b.build);
    expect([a.calls(), b.calls()]).toEqual([2, 1]);
  });

  it('when a change lands while a board is being built, then that build is sent but not kept', async () => {
    const cache = createBoardCache();
    cache.reset();
    const slow = deferredBuild({ before: true });
    const pending = cache.get(W, slow.build);
    cache.invalidate(W);
    slow.release();
    expect((await pending).bytes.toString()).toBe('{"before":true}');
    const fresh = counter({ after: true });
    expect((await cache.get(W, fresh.build)).bytes.toString()).toBe('{"after":true}');
    expect(fresh.calls()).toBe(1);
  });

  it('when the listener reconnects during a build, then that build is not kept either', async () => {
    const cache = createBoardCache();
    cache.reset();
    const slow = deferredBuild({ before: true });
    const pending = cache.get(W, slow.build);
    cache.reset();
    slow.release();
    await pending;
    const fresh = counter({ after: true });
    await cache.get(W, fresh.build);
    expect(fresh.calls()).toBe(1);
  });

  it('when an entry is older than the time to live, then it is built again', async () => {
    let now = 0;
    const cache = createBoardCache({ ttlMs: 2000, clock: () => now });
    cache.reset();
    const b = counter({ n: 1 });
    await cache.get(W, b.build);
    now = 1999;
    await cache.get(W, b.build);
    now = 2000;
    await cache.get(W, b.build);
    expect(b.calls()).toBe(2);
  });

  it('when caching stops, then reads build again until it is reset', async () => {
    const cache = createBoardCache();
    cache.reset();
    const b = counter({ n: 1 });
    await cache.get(W, b.build);
    cache.stop();
    await cache.get(W, b.build);
    await cache.get(W, b.build);
    expect(b.calls()).toBe(3);
  });
});
