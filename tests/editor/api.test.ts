import { describe, expect, it, vi } from 'vitest';
import { saveLayout, saveCopy, postChecks, ChecksUnavailable, ChecksRateLimited, ChecksRefused } from '@/components/editor/api/layoutApi';
import { contentKey } from '@/components/editor/api/docKey';
import { createThrottle } from '@/components/editor/api/throttle';
import { flushOnLeave, keepaliveFetch, pendingFlush, KEEPALIVE_BODY_LIMIT } from '@/components/editor/api/leaveFlush';
import { revalidateSaved } from '@/components/editor/api/useLatestSaved';
import { isDirty } from '@/components/editor/store/editorStore';
import { testDoc, mod, harness } from './harness';

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

describe('save on leave', () => {
  it('sends an unsaved edit at once, with keepalive, and marks the store saved at the new version', async () => {
    const h = harness([mod('a')]);
    h.get().updateSystems({ note: 'Weighbridge booked' });
    expect(isDirty(h.get())).toBe(true);
    const fetchFn = vi.fn(reply(200, { id: 'L1', version: 2 }));
    const flushed = flushOnLeave(h.store, 'L1', fetchFn);
    expect(flushed).not.toBeNull();
    // The next screen can wait for it.
    expect(pendingFlush('L1')).toBe(flushed);
    expect(await flushed).toEqual({ kind: 'saved', version: 2, updatedAt: undefined });
    const [url, init] = fetchFn.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/layouts/L1');
    expect(init.method).toBe('PUT');
    expect(init.keepalive).toBe(true);
    expect((init.headers as Record<string, string>)['if-match']).toBe('1');
    expect(JSON.parse(init.body as string).doc.systems.note).toBe('Weighbridge booked');
    expect(isDirty(h.get())).toBe(false);
    expect(h.get().version).toBe(2);
    await Promise.resolve();
    expect(pendingFlush('L1')).toBeUndefined();
  });

  it('sends nothing when nothing is unsaved, or the screen is view only', () => {
    const fetchFn = vi.fn(reply(200, { id: 'L1', version: 2 }));
    expect(flushOnLeave(harness().store, 'L1', fetchFn)).toBeNull();
    const h = harness();
    h.get().updateSystems({ note: 'x' });
    h.store.setState({ readOnly: true });
    expect(flushOnLeave(h.store, 'L1', fetchFn)).toBeNull();
    expect(fetchFn).not.toHaveBeenCalled();
  });

  it('uses keepalive only for bodies within the 64 KiB allowance (Fetch standard), an ordinary request above it', async () => {
    const fetchFn = vi.fn(reply(200, {}));
    const send = keepaliveFetch(fetchFn);
    await send('/x', { method: 'PUT', body: 'a'.repeat(KEEPALIVE_BODY_LIMIT) });
    await send('/x', { method: 'PUT', body: 'a'.repeat(KEEPALIVE_BODY_LIMIT + 1) });
    // "é" is two bytes in UTF-8: 32 769 of them are 65 538 bytes, over the 65 536 allowance.
    await send('/x', { method: 'PUT', body: 'é'.repeat(32_769) });
    expect(fetchFn.mock.calls.map((c) => (c as unknown as [string, RequestInit])[1].keepalive)).toEqual([true, false, false]);
  });

  it('leaves the store unsaved when the server refuses, so the edit is not marked saved', async () => {
    const h = harness();
    h.get().updateSystems({ note: 'x' });
    expect((await flushOnLeave(h.store, 'L1', reply(412, { error: 'stale', current: { version: 5, doc: testDoc() } }))!).kind).toBe('conflict');
    expect(isDirty(h.get())).toBe(true);
    expect(h.get().version).toBe(1);
  });
});

describe('the latest saved version (revalidation)', () => {
  it('asks with If-None-Match the store version; 304 changes nothing', async () => {
    const h = harness();
    const fetchFn = vi.fn(async () => new Response(null, { status: 304 }));
    expect(await revalidateSaved(h.store, 'L1', fetchFn)).toEqual({ kind: 'unchanged' });
    const [url, init] = fetchFn.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/layouts/L1');
    expect((init.headers as Record<string, string>)['if-none-match']).toBe('"1"');
    expect(h.get().version).toBe(1);
  });

  it('takes a newer saved copy when nothing here is unsaved (a page brought back from the browser cache)', async () => {
    const h = harness();
    const theirs = testDoc([mod('z')]);
    const r = await revalidateSaved(h.store, 'L1', reply(200, { version: 4, doc: theirs, updatedAt: '2026-12-04T12:00:00.000Z' }));
    expect(r).toEqual({ kind: 'replaced', version: 4, savedAt: '2026-12-04T12:00:00.000Z' });
    expect(h.get().version).toBe(4);
    expect(h.get().doc.modules.map((m) => m.id)).toEqual(['z']);
    expect(isDirty(h.get())).toBe(false);
  });

  it('keeps unsaved edits here (the next save meets theirs as a conflict), and ignores an older answer', async () => {
    const h = harness();
    h.get().updateSystems({ note: 'mine' });
    expect(await revalidateSaved(h.store, 'L1', reply(200, { version: 4, doc: testDoc() }))).toEqual({ kind: 'newer-elsewhere', version: 4 });
    expect(h.get().doc.systems?.note).toBe('mine');
    expect(h.get().version).toBe(1);
    const clean = harness();
    clean.store.getState().markSaved(clean.get().doc, 6);
    expect(await revalidateSaved(clean.store, 'L1', reply(200, { version: 5, doc: testDoc() }))).toEqual({ kind: 'unchanged' });
    expect(clean.get().version).toBe(6);
  });

  it('waits for a save on leave of the same layout before it reads', async () => {
    const left = harness();
    left.get().updateSystems({ note: 'left behind' });
    let release!: () => void;
    const gate = new Promise<void>((r) => { release = r; });
    const order: string[] = [];
    void flushOnLeave(left.store, 'L9', async () => { await gate; order.push('put'); return new Response(JSON.stringify({ version: 2 }), { status: 200 }); });
    const next = harness();
    const reading = revalidateSaved(next.store, 'L9', async () => { order.push('get'); return new Response(null, { status: 304 }); });
    release();
    await reading;
    expect(order).toEqual(['put', 'get']);
  });

  it('a failed or unreadable answer changes nothing', async () => {
    const h = harness();
    expect((await revalidateSaved(h.store, 'L1', async () => { throw new TypeError('offline'); })).kind).toBe('failed');
    expect((await revalidateSaved(h.store, 'L1', reply(404, { error: 'No such layout' }))).kind).toBe('failed');
    expect((await revalidateSaved(h.store, 'L1', reply(200, { version: 'x' }))).kind).toBe('failed');
    expect(h.get().version).toBe(1);
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
      expect(emitted).toEqual([]); // not inside the edit's own task
      await new Promise((r) => original(r, 5));
      expect(emitted).toEqual([1]);
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

  it('throttle: the first change after a quiet spell waits for the paint, takes the newest value, and can be called off', () => {
    let now = 0;
    const frames: (() => void)[] = [];
    let calledOff = 0;
    const emitted: number[] = [];
    const t = createThrottle<number>(150, (v) => emitted.push(v), {
      set: () => { throw new Error('no timer expected before the window'); },
      clear: () => undefined,
      now: () => now,
      afterPaint: (fn) => { frames.push(fn); return () => { calledOff++; }; },
    });
    t.push(1);
    t.push(2); // the same frame: folded in
    expect(emitted).toEqual([]);
    expect(frames).toHaveLength(1);
    frames.shift()!();
    expect(emitted).toEqual([2]);
    now = 500;
    t.push(3);
    t.cancel();
    expect(calledOff).toBe(1);
    expect(emitted).toEqual([2]);
  });
});
