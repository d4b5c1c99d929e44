// The readiness route a load balancer polls: up when the database answers, 503 when it does not.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as health from '@/app/api/health/route';
import { installDbHandle, type Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';

let db: Db;
beforeAll(async () => {
  db = await useFreshDb();
});
afterAll(() => installDbHandle({ db, kind: 'pglite', close: async () => undefined }));

describe('GET /api/health', () => {
  it('answers 200 without a session and is never cached', async () => {
    const res = await call(health.GET, { as: null });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
    expect(res.headers.get('cache-control')).toBe('no-store');
  });

  it('answers 503 with a plain message, no driver error, when the database fails', async () => {
    const broken = { execute: async () => { throw new Error('connection refused at 10.0.0.7:5432'); } } as unknown as Db;
    installDbHandle({ db: broken, kind: 'pglite', close: async () => undefined });
    const res = await call(health.GET, { as: null });
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ error: 'The database is not answering.' });
    expect(JSON.stringify(res.body)).not.toContain('10.0.0.7');
  });
});
