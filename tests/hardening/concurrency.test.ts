/**
 * No lost updates: 50 pairs of saves based on the same version, sent at once. In every pair
 * exactly one is accepted and the other gets 412; every accepted save is the stored state at
 * its version, and the final document is the last accepted one. Simultaneous sign-ups of one
 * address: one account, the rest 409. The whole file's log holds no password, hash or token.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as one from '@/app/api/layouts/[id]/route';
import { layouts } from '@/db/schema';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import * as signUp from '@/app/api/sign-up/route';
import { captureLog, KNOWN_TEST_PASSWORDS, leakedSecrets, storedHashes, type LogCapture } from '../helpers/log-capture';

let db: Db;
let w: World;
let captured: LogCapture;
beforeAll(async () => {
  captured = captureLog();
  db = await useFreshDb();
  w = await buildWorld(db);
});

describe('conflicting saves', () => {
  it('lets exactly one of each of 50 pairs through and loses nothing acknowledged', async () => {
    const start = (await call(one.GET, { as: w.designer, params: { id: w.clientLayoutId } })).body;
    let version: number = start.version;
    let lastAccepted = start.doc;
    for (let pair = 0; pair < 50; pair++) {
      const docs = [0, 1].map((side) => ({ ...lastAccepted, occupants: { ...lastAccepted.occupants, standingHeight: 1600 + pair * 2 + side } }));
      const [a, b] = await Promise.all(
        docs.map((doc, side) =>
          call(one.PUT, { method: 'PUT', as: side ? w.owner : w.designer, params: { id: w.clientLayoutId }, headers: { 'if-match': String(version) }, json: { doc } }),
        ),
      );
      const statuses = [a.status, b.status].sort();
      expect(statuses).toEqual([200, 412]);
      const winner = a.status === 200 ? 0 : 1;
      const accepted = [a, b][winner].body;
      const refused = [a, b][1 - winner].body;
      expect(accepted.version).toBe(version + 1);
      expect(refused.current.version).toBe(version + 1);
      version = accepted.version;
      lastAccepted = docs[winner];
      const [row] = await db.select().from(layouts).where(eq(layouts.id, w.clientLayoutId));
      expect(row.version).toBe(version);
      expect(row.doc.occupants.standingHeight).toBe(docs[winner].occupants.standingHeight);
    }
    expect(version).toBe(start.version + 50);
  });
});

describe('simultaneous sign-ups of one address', () => {
  const password = 'race-password-kept-out-of-logs';
  it('make one account; every other answer is 409, none a 500', async () => {
    const answers = await Promise.all(
      Array.from({ length: 8 }, (_, i) =>
        call(signUp.POST, { method: 'POST', as: null, headers: { 'x-forwarded-for': `10.9.0.${i}` }, json: { name: `Racer ${i}`, email: 'racer@selfbuild.test', password } }),
      ),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409, 409, 409, 409, 409, 409, 409]);
  });

  afterAll(async () => {
    const secrets = [...KNOWN_TEST_PASSWORDS, password, ...(await storedHashes(db))];
    const leaks = leakedSecrets(captured.lines, secrets);
    captured.stop();
    expect(leaks).toEqual([]);
  });
});
