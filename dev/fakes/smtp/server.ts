/**
 * A local stand-in for a mail relay, for development, the demo and tests: an SMTP server
 * (smtp-server) on 127.0.0.1 that accepts every message, parses it with mailparser and keeps it
 * in the database (db/sharing/outbox), where owners read it at /outbox and tests follow its links.
 * It listens on an ephemeral port unless BAYWRIGHT_FAKE_SMTP_PORT says otherwise, and publishes
 * the port for the app's mail transport (./address).
 *
 * Must never listen on anything but loopback, never relay mail anywhere, and never run in a
 * deployment that talks to a real relay (SMTP_URL set), or in production unless asked (server/local-mode).
 */
import 'server-only';
import { log } from '@/lib/log';
import { localStandInsAllowed } from '@/server/local-mode';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import { simpleParser } from 'mailparser';
import { storeReceivedMail, type ReceivedMail } from '@/db/sharing/outbox';
import { setFakeSmtpAddress } from '../../../server/local-mode';

/** Larger messages are refused with SMTP 552 (our own mail is a few kB). */
export const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

export interface FakeSmtp {
  host: string;
  port: number;
  close: () => Promise<void>;
}

export interface FakeSmtpOptions {
  port?: number;
  /** Where received mail goes; the database outbox by default. */
  store?: (mail: ReceivedMail) => Promise<unknown>;
  /** Publish the address for this process's mail transport (default true). */
  publish?: boolean;
}

async function readStream(stream: SMTPServerDataStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

export async function receivedMailFrom(raw: Buffer, session: Pick<SMTPServerSession, 'envelope'>): Promise<ReceivedMail> {
  const parsed = await simpleParser(raw);
  const studio = parsed.headers.get('x-baywright-studio');
  const from = session.envelope.mailFrom;
  return {
    studioId: typeof studio === 'string' ? studio.trim() : null,
    messageId: parsed.messageId ?? null,
    mailFrom: from ? from.address : '',
    rcptTo: session.envelope.rcptTo.map((r) => r.address),
    subject: parsed.subject ?? '',
    text: parsed.text ?? '',
    raw: raw.toString('utf8'),
  };
}

export async function startFakeSmtp(options: FakeSmtpOptions = {}): Promise<FakeSmtp> {
  const host = '127.0.0.1';
  const store = options.store ?? storeReceivedMail;
  const server = new SMTPServer({
    name: 'baywright-dev-mail',
    banner: 'Baywright development mail server: mail is kept, never delivered',
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, session, callback) {
      readStream(stream)
        .then(async (raw) => {
          if (stream.sizeExceeded) {
            const err = Object.assign(new Error('Message too large for the development mail server'), { responseCode: 552 });
            return callback(err);
          }
          await store(await receivedMailFrom(raw, session));
          callback();
        })
        .catch((err) => {
          log.error('development mail server could not keep a message', { error: err });
          callback(Object.assign(new Error('Could not store the message; try again'), { responseCode: 451 }));
        });
    },
  });
  server.on('error', (err) => log.error('development mail server failed', { error: err }));
  const port = await new Promise<number>((resolve, reject) => {
    const onError = (err: Error) => reject(err);
    server.server.once('error', onError);
    server.listen(options.port ?? 0, host, () => {
      server.server.off('error', onError);
      const addr = server.server.address();
      resolve(typeof addr === 'object' && addr ? addr.port : options.port ?? 0);
    });
  });
  if (options.publish !== false) setFakeSmtpAddress({ host, port });
  return {
    host,
    port,
    close: () =>
      new Promise<void>((resolve) => {
        if (options.publish !== false) setFakeSmtpAddress(null);
        server.close(() => resolve());
      }),
  };
}

type GlobalWithServer = typeof globalThis & { __baywrightFakeSmtpServer?: Promise<FakeSmtp> };
const g = globalThis as GlobalWithServer;

/** Whether this process should run the development mail server at all. */
export function fakeSmtpWanted(env: Record<string, string | undefined> = process.env): boolean {
  return !env.SMTP_URL && localStandInsAllowed(env);
}

/** Starts the server once per process (dev reloads call this again and get the same one). */
export function startFakeSmtpOnce(): Promise<FakeSmtp> {
  if (!g.__baywrightFakeSmtpServer) {
    const port = process.env.BAYWRIGHT_FAKE_SMTP_PORT ? Number(process.env.BAYWRIGHT_FAKE_SMTP_PORT) : 0;
    g.__baywrightFakeSmtpServer = startFakeSmtp({ port }).then((s) => {
      log.info('development mail server listening (mail is kept in the outbox, never delivered)', { address: `smtp://${s.host}:${s.port}` });
      return s;
    }).catch((err) => {
      g.__baywrightFakeSmtpServer = undefined;
      throw err;
    });
  }
  return g.__baywrightFakeSmtpServer;
}
