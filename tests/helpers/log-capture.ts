/**
 * Captures everything a test file logs: the app's logger (lib/log) and anything written to the
 * console directly. `leakedSecrets` lists which of the given secrets, or which password hash or
 * session token, turned up in it.
 */
import { vi } from 'vitest';
import { setLogSink } from '@/lib/log';
import { mintedSessionTokens } from './http';

export interface LogCapture {
  lines: string[];
  stop: () => void;
}

export function captureLog(): LogCapture {
  const lines: string[] = [];
  const previous = setLogSink((line) => lines.push(line));
  const spies = (['error', 'warn', 'log', 'info', 'debug'] as const).map((m) =>
    vi.spyOn(console, m).mockImplementation((...args: unknown[]) => {
      lines.push(args.map((a) => (a instanceof Error ? `${a.name}: ${a.message}\n${a.stack}\n${String((a as { cause?: unknown }).cause ?? '')}` : typeof a === 'string' ? a : JSON.stringify(a))).join(' '));
    }),
  );
  return {
    lines,
    stop: () => {
      setLogSink(previous);
      for (const s of spies) s.mockRestore();
    },
  };
}

/** Password hashes of any common scheme. */
const HASH = /\$2[abxy]?\$\d{2}\$[./A-Za-z0-9]{53}|\$argon2(id|i|d)\$|\$scrypt\$/;

export function leakedSecrets(lines: string[], secrets: string[]): string[] {
  const text = lines.join('\n');
  const found = secrets.filter((s) => s && text.includes(s));
  if (HASH.test(text)) found.push('a password hash');
  for (const token of mintedSessionTokens) if (text.includes(token.slice(0, 40))) found.push('a session token');
  return found;
}

/** The passwords the shared test rows and the demo use; never to be seen in a log. */
export const KNOWN_TEST_PASSWORDS = ['baywright-demo', 'matrix-long-password', 'member-long-password', 'leaver-long-password'];

/** Every password hash stored in the database right now. */
export async function storedHashes(db: import('@/db/client').Db): Promise<string[]> {
  const { users } = await import('@/db/schema');
  const rows = await db.select({ hash: users.passwordHash }).from(users);
  return rows.map((r) => r.hash).filter((h): h is string => Boolean(h));
}
