// The development mail server and the outbox: mail arrives over real SMTP, is stored with its
// studio, read back by that studio's owner only, and the outbox does not exist in production
// unless switched on.
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import nodemailer from 'nodemailer';
import { simpleParser } from 'mailparser';
import * as raw from '@/app/(app)/outbox/[id]/raw/route';
import { outboxMail } from '@/db/schema';
import { getOutboxMail, listOutbox } from '@/db/sharing/outbox';
import { sendMail } from '@/server/mail/transport';
import { fakeSmtpAddress } from '@/server/local-mode';
import { MAX_MESSAGE_BYTES, startFakeSmtp, type FakeSmtp } from '@/dev/fakes/smtp/server';
import type { Actor } from '@/db/actor';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;
let smtp: FakeSmtp;
const actor = (u: World['owner'], email: string): Actor => ({ userId: u.id, studioId: u.studioId, role: u.role!, email, name: 'n' });

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  smtp = await startFakeSmtp();
});
afterAll(() => smtp.close());
afterEach(() => vi.unstubAllEnvs());

describe('the development mail server', () => {
  it('listens on loopback, publishes its address and keeps what it receives with its studio', async () => {
    expect(smtp.host).toBe('127.0.0.1');
    expect(fakeSmtpAddress()).toEqual({ host: '127.0.0.1', port: smtp.port });
    const id = await sendMail({ to: { email: 'priya@client.test', name: 'Priya' }, studioId: w.owner.studioId, subject: 'Hello from the workshop', text: 'Plain words', html: '<p>Plain words</p>' });
    expect(id).toMatch(/^<.+>$/);
    const rows = await db.select().from(outboxMail);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ studioId: w.owner.studioId, rcptTo: ['priya@client.test'], subject: 'Hello from the workshop', messageId: id });
    const parsed = await simpleParser(rows[0].raw);
    expect(parsed.text?.trim()).toBe('Plain words');
    expect(parsed.html).toContain('<p>Plain words</p>');
  });

  it('refuses a message above its size limit with an SMTP error, storing nothing', async () => {
    const t = nodemailer.createTransport({ host: smtp.host, port: smtp.port, secure: false, ignoreTLS: true });
    const before = (await db.select().from(outboxMail)).length;
    await expect(t.sendMail({ from: 'a@b.test', to: 'c@d.test', subject: 'big', text: 'x'.repeat(MAX_MESSAGE_BYTES + 1000) })).rejects.toThrow(/552|too large|size/i);
    expect((await db.select().from(outboxMail)).length).toBe(before);
  });

  it('keeps mail without a studio header out of every studio’s outbox', async () => {
    const t = nodemailer.createTransport({ host: smtp.host, port: smtp.port, secure: false, ignoreTLS: true });
    await t.sendMail({ from: 'stranger@else.test', to: 'maren@saltmarsh.test', subject: 'Unmarked', text: 'x' });
    const seen = await listOutbox(actor(w.owner, 'maren@saltmarsh.test'));
    expect(seen.map((m) => m.subject)).toEqual(['Hello from the workshop']);
  });
});

describe('the outbox', () => {
  it('is read by the studio’s owner only', async () => {
    const owner = actor(w.owner, 'maren@saltmarsh.test');
    const [item] = await listOutbox(owner);
    expect((await getOutboxMail(owner, item.id)).text.trim()).toBe('Plain words');
    await expect(listOutbox(actor(w.designer, 'ivo@saltmarsh.test'))).rejects.toMatchObject({ status: 403 });
    await expect(listOutbox(actor(w.client, 'priya@client.test'))).rejects.toMatchObject({ status: 403 });
    expect(await listOutbox(actor(w.foreignOwner, 'olu@harbour.test'))).toEqual([]);
    await expect(getOutboxMail(actor(w.foreignOwner, 'olu@harbour.test'), item.id)).rejects.toMatchObject({ status: 404 });
  });

  it('serves the raw message to the owner, and not at all in production unless switched on', async () => {
    const [item] = await listOutbox(actor(w.owner, 'maren@saltmarsh.test'));
    const params = { id: item.id };
    const ok = await call(raw.GET, { params, as: w.owner });
    expect(ok.status).toBe(200);
    expect(ok.headers.get('content-type')).toBe('message/rfc822');
    expect((await simpleParser(String(ok.body))).subject).toBe('Hello from the workshop');
    expect((await call(raw.GET, { params, as: w.designer })).status).toBe(403);
    expect((await call(raw.GET, { params, as: null })).status).toBe(401);
    expect((await call(raw.GET, { params: { id: 'x' }, as: w.owner })).status).toBe(404);
    vi.stubEnv('NODE_ENV', 'production');
    expect((await call(raw.GET, { params, as: w.owner })).status).toBe(404);
    vi.stubEnv('BAYWRIGHT_OUTBOX', '1');
    expect((await call(raw.GET, { params, as: w.owner })).status).toBe(200);
  });
});
