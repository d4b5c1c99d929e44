import { describe, expect, it, vi } from 'vitest';
import { saveLayout, saveCopy, postChecks, ChecksUnavailable, ChecksRateLimited, ChecksRefused } from '@/components/editor/api/layoutApi';
import { contentKey } from '@/components/editor/api/docKey';
import { createThrottle } from '@/components/editor/api/throttle';
import { testDoc, mod } from './harness';

const reply = (status: number, body: unknown, headers: Record<string, string> = {}) => async () => new Response(typeof body === 'string' ? body : JSON.stringify(body), { status, headers });

describe('saving', () => {
  it('sends the version in If-Match and the document as { doc }', async () => {
    const fetchFn = vi.fn(reply(200, { id: 'L1', version: 8, updatedAt: '2026-01-01T00:00:00Z' }));
    const doc = testDoc();
    const r = await saveLayout(fetchFn, 'L1', doc, 7);
    expect(r).toEqual({ kind: 'saved', version: 8, updatedAt: '2026-01-01T00:00:00Z' });
    const [url, init] = fetchFn.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/layouts/L1');
    expect(init.method).toBe('PUT');
    expect((init.headers as Record<string, string>)['if-match']).toBe('7');
    expect(JSON.parse(init.body as string)).toEqual({ doc });
  });

  it('turns a 412 into a conflict carrying their version', async () => {
    const theirs = testDoc([mod('x')]);
    const r = await saveLayout(reply(412, { error: 'stale', current: { version: 9, doc: theirs, updatedAt: 't' } }), 'L1', testDoc(), 7);
    expect(r).toEqual({ kind: 'conflict', current: { version: 9, doc: theirs, updatedAt: 't', updatedBy: null } });
  });

  it('names who saved first when the server says (the build plan and the editor share this save)', async () => {
    const theirs = testDoc([mod('x')]);
    const r = await saveLayout(reply(412, { error: 'stale', current: { version: 9, doc: theirs, updatedBy: 'Maren Holt' } }), 'L1', testDoc(), 7);
    expect(r).toEqual({ kind: 'conflict', current: { version: 9, doc: theirs, updatedAt: undefined, updatedBy: 'Maren Holt' } });
  });

  it('400 gives the issues, 403 says read-only, 500 and network errors retry, junk never throws', async () => {
    expect(await saveLayout(reply(400, { error: 'bad', issues: [{ path: 'modules.0.x', message: 'too big' }] }), 'L1', testDoc(), 1)).toEqual({ kind: 'invalid', message: 'bad', issues: [{ path: 'modules.0.x', message: 'too big' }] });
    expect((await saveLayout(reply(403, {}), 'L1', testDoc(), 1)).kind).toBe('forbidden');
    expect(await saveLayout(reply(500, 'not json'), 'L1', testDoc(), 1)).toMatchObject({ kind: 'error', retry: true });
    expect(await saveLayout(async () => { throw new TypeError('offline'); }, 'L1', testDoc(), 1)).toMatchObject({ kind: 'error', retry: true });
    expect(await saveLayout(reply(200, { id: 'L1' }), 'L1', testDoc(), 1)).toMatchObject({ kind: 'error', retry: false });
    expect(await saveLayout(reply(412, { error: 'stale' }), 'L1', testDoc(), 1)).toMatchObject({ kind: 'error' });
  });

  it('saves a copy under a new name', async () => {
    const fetchFn = vi.fn(reply(201, { id: 'L2' }));
    expect(await saveCopy(fetchFn, 'Mine (my copy)', testDoc())).toEqual({ ok: true, id: 'L2' });
    const body = JSON.parse((fetchFn.mock.calls[0] as unknown as [string, RequestInit])[1].body as string);
    expect(body.name).toBe('Mine (my copy)');
    expect(body.doc.name).toBe('Mine (my copy)');
    expect(await saveCopy(reply(400, { error: 'name taken' }), 'x', testDoc())).toEqual({ ok: false, message: 'name taken' });
  });
});

describe('live checks client', () => {
  it('accepts a well-formed report and refuses to pass on anything else', async () => {
    const report = { ok: false, findings: [{ id: 'fit.inside', status: 'fail', message: 'm', moduleIds: ['a'] }] };
    expect(await postChecks(reply(200, report), testDoc())).toEqual(report);
    await expect(postChecks(reply(200, { findings: 'nope' }), testDoc())).rejects.toBeInstanceOf(ChecksUnavailable);
    await expect(postChecks(reply(404, 'missing'), testDoc())).rejects.toBeInstanceOf(ChecksUnavailable);
    await expect(postChecks(async () => { throw new TypeError('down'); }, testDoc())).rejects.toBeInstanceOf(ChecksUnavailable);
    await expect(postChecks(reply(400, { error: 'bad doc', issues: [] }), testDoc())).rejects.toBeInstanceOf(ChecksRefused);
    const limited = await postChecks(reply(429, { error: 'slow down', retryAfter: 1 }), testDoc()).catch((e) => e);
    expect(limited).toBeInstanceOf(ChecksRateLimited);
    expect(limited.retryAfterMs).toBe(1000);
  });

  it('keys documents by content: same content same key, any change a new key', () => {
    const a = testDoc([mod('a')]);
    const b = JSON.parse(JSON.stringify(a));
    expect(contentKey(a)).toBe(contentKey(b));
    b.modules[0].x += 1;
    expect(contentKey(a)).not.toBe(contentKey(b));
  });

  it('throttle with real timers: folds a burst into a trailing call (the browser calls setTimeout unbound)', async () => {
    const original = globalThis.setTimeout;
    // Like a browser: setTimeout called as a method of some other object is an "Illegal invocation".
    const strict = function (this: unknown, fn: () => void, ms?: number) {
      if (this !== undefined && this !== globalThis) throw new TypeError('Illegal invocation');
      return original(fn, ms);
    };
    vi.stubGlobal('setTimeout', strict);
    try {
      const emitted: number[] = [];
      const t = createThrottle<number>(30, (v) => emitted.push(v));
      t.push(1);
      t.push(2);
      t.push(3);
      expect(emitted).toEqual([1]);
      await new Promise((r) => original(r, 60));
      expect(emitted).toEqual([1, 3]);
      t.cancel();
    } finally {
      vi.unstubAllGlobals();
    }
  });

  it('throttle: the first change goes at once, a burst folds into one trailing call', () => {
    let now = 0;
    const timers: { at: number; fn: () => void }[] = [];
    const emitted: number[] = [];
    const t = createThrottle<number>(150, (v) => emitted.push(v), {
      set: (fn: () => void, ms: number) => { timers.push({ at: now + ms, fn }); return timers.length; },
      clear: () => undefined,
      now: () => now,
    });
    t.push(1);
    expect(emitted).toEqual([1]);
    now = 20; t.push(2);
    now = 60; t.push(3);
    now = 100; t.push(4);
    expect(emitted).toEqual([1]);
    expect(timers).toHaveLength(1);
    const trailing = timers.shift()!;
    now = trailing.at; trailing.fn();
    expect(emitted).toEqual([1, 4]);
    // Ten pushes a second for a second never emit more than ~7 (under the server's 10/s).
    for (let i = 0; i < 100; i++) {
      now += 10;
      t.push(i);
      for (const tm of timers.splice(0)) if (tm.at <= now) tm.fn(); else timers.push(tm);
    }
    expect(emitted.length - 2).toBeLessThanOrEqual(8);
  });
});
