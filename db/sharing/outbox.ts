/**
 * The development outbox: mail the local mail server (dev/fakes/smtp) received, kept in the
 * database so several app processes on one database see the same mail. Owners read their own
 * studio's mail (our messages carry an X-Baywright-Studio header); nobody else reads any.
 * Must never be reachable in production unless the outbox is switched on (server/mail/outbox-mode).
 */
import 'server-only';
import { and, desc, eq } from 'drizzle-orm';
import { getDb } from '../client';
import { outboxMail } from '../schema';
import { ForbiddenError, NotFoundError } from '../errors';
import type { Actor } from '../actor';
import { isId } from '../ids';

export interface ReceivedMail {
  studioId: string | null;
  messageId: string | null;
  mailFrom: string;
  rcptTo: string[];
  subject: string;
  text: string;
  raw: string;
}

export interface OutboxItemDto {
  id: string;
  from: string;
  to: string[];
  subject: string;
  receivedAt: string;
}

export interface OutboxMailDto extends OutboxItemDto {
  messageId: string | null;
  text: string;
}

/** A stored message, whatever its size, is capped by the mail server's own limit first. */
export async function storeReceivedMail(mail: ReceivedMail): Promise<string> {
  const db = await getDb();
  const studioId = mail.studioId && isId(mail.studioId) ? mail.studioId : null;
  const [row] = await db
    .insert(outboxMail)
    .values({ ...mail, studioId, subject: mail.subject.slice(0, 998) })
    .returning({ id: outboxMail.id });
  return row.id;
}

function requireOwner(actor: Actor) {
  if (actor.role !== 'owner') throw new ForbiddenError('Only the studio owner can read the outbox.');
}

export async function listOutbox(actor: Actor, limit = 200): Promise<OutboxItemDto[]> {
  requireOwner(actor);
  const db = await getDb();
  const rows = await db
    .select({ id: outboxMail.id, from: outboxMail.mailFrom, to: outboxMail.rcptTo, subject: outboxMail.subject, receivedAt: outboxMail.receivedAt })
    .from(outboxMail)
    .where(eq(outboxMail.studioId, actor.studioId))
    .orderBy(desc(outboxMail.receivedAt))
    .limit(limit);
  return rows.map((r) => ({ ...r, receivedAt: r.receivedAt.toISOString() }));
}

async function ownMail(actor: Actor, id: string) {
  requireOwner(actor);
  if (!isId(id)) throw new NotFoundError('No such message.');
  const db = await getDb();
  const [row] = await db.select().from(outboxMail).where(and(eq(outboxMail.id, id), eq(outboxMail.studioId, actor.studioId))).limit(1);
  if (!row) throw new NotFoundError('No such message.');
  return row;
}

export async function getOutboxMail(actor: Actor, id: string): Promise<OutboxMailDto> {
  const r = await ownMail(actor, id);
  return { id: r.id, from: r.mailFrom, to: r.rcptTo, subject: r.subject, receivedAt: r.receivedAt.toISOString(), messageId: r.messageId, text: r.text };
}

/** The message as it arrived (RFC 5322), for tests and for opening in a mail program. */
export async function getOutboxRaw(actor: Actor, id: string): Promise<string> {
  return (await ownMail(actor, id)).raw;
}
