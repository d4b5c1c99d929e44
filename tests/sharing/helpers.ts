/**
 * Shared pieces of the sharing tests: every role of the test world by name, a development mail
 * server running in the test process (storing into the test database, as the app's does), and
 * reading received mail back with mailparser.
 */
import { desc } from 'drizzle-orm';
import { simpleParser, type ParsedMail } from 'mailparser';
import type { Db } from '../../db/client';
import { outboxMail } from '../../db/schema';
import { startFakeSmtp, type FakeSmtp } from '../../dev/fakes/smtp/server';
import type { World } from '../helpers/world';
import type { SessionUser } from '../helpers/http';

export type Who = 'anonymous' | 'client' | 'otherClient' | 'designer' | 'owner' | 'foreignOwner' | 'foreignClient';
export const EVERYONE: Who[] = ['anonymous', 'client', 'otherClient', 'designer', 'owner', 'foreignOwner', 'foreignClient'];
/** Who must not learn that a layout shared with `client` exists. */
export const STRANGERS: Who[] = ['otherClient', 'foreignOwner', 'foreignClient'];

export function as(w: World, who: Who): SessionUser | null {
  return who === 'anonymous' ? null : w[who];
}

export async function startMailSink(): Promise<FakeSmtp> {
  return startFakeSmtp();
}

export interface ReceivedMessage {
  to: string[];
  parsed: ParsedMail;
}

/** Every message received so far, newest first, parsed from its raw form. */
export async function receivedMail(db: Db): Promise<ReceivedMessage[]> {
  const rows = await db.select().from(outboxMail).orderBy(desc(outboxMail.receivedAt));
  return Promise.all(rows.map(async (r) => ({ to: r.rcptTo, parsed: await simpleParser(r.raw) })));
}

export async function mailFor(db: Db, email: string): Promise<ReceivedMessage[]> {
  return (await receivedMail(db)).filter((m) => m.to.includes(email));
}

/** The first link to this app in a message's text body. */
export function linkIn(mail: ParsedMail, pathPrefix: string): URL {
  const match = (mail.text ?? '').match(new RegExp(`https?://[^\\s>]+${pathPrefix.replace(/[/]/g, '\\/')}[^\\s>]*`));
  if (!match) throw new Error(`no ${pathPrefix} link in the mail "${mail.subject}"`);
  return new URL(match[0]);
}
