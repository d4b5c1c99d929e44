/**
 * The server's one logger. Every line is one JSON object on stderr (or on the sink a test
 * installs) with a level, a time, an event and fields that went through `redact` first.
 *
 * Never logs: query strings, session tokens or cookies, bearer and API keys, webhook secrets,
 * password hashes, e-mail bodies, or the parameters of a database query (drizzle and the
 * PostgreSQL drivers put them in their error messages). An error is logged as its class, its
 * SQLSTATE code and constraint when it has them, and a message with all of the above cut out.
 */
import crypto from 'node:crypto';

export type Level = 'error' | 'warn' | 'info';
export type Fields = Record<string, unknown>;
type Sink = (line: string, level: Level) => void;

const defaultSink: Sink = (line, level) => {
  if (level === 'info') process.stdout.write(`${line}\n`);
  else process.stderr.write(`${line}\n`);
};

const g = globalThis as typeof globalThis & { __baywrightLogSink?: Sink };

/** Tests capture the log; returns the sink that was in place. */
export function setLogSink(sink: Sink | null): Sink | null {
  const before = g.__baywrightLogSink ?? null;
  if (sink) g.__baywrightLogSink = sink;
  else delete g.__baywrightLogSink;
  return before;
}

/** Keys whose values are never written, whatever they hold. */
const SECRET_KEY = /pass(word)?|hash|token|secret|cookie|authori[sz]ation|api[-_]?key|params|^(text|html|body)$|signature|credential/i;

const PATTERNS: [RegExp, string][] = [
  // Query strings (they may carry callback URLs, tokens, e-mail addresses).
  [/(\bhttps?:\/\/[^\s?"'#]*|(?<![\w])\/[\w\-./[\]]*)\?[^\s"'#]*/g, '$1?[redacted]'],
  // bcrypt, argon2 and scrypt password hashes.
  [/\$2[abxy]?\$\d{2}\$[./A-Za-z0-9]{53}/g, '[redacted hash]'],
  [/\$argon2(id|i|d)\$[^\s"',]+/g, '[redacted hash]'],
  [/\$scrypt\$[^\s"',]+/g, '[redacted hash]'],
  // Cookies and authorisation headers.
  [/((?:__Secure-|__Host-)?authjs\.[\w.-]+=)[^\s;,"']+/gi, '$1[redacted]'],
  [/\b(Bearer|Basic)\s+[\w\-.~+/=]+/g, '$1 [redacted]'],
  // Payment API keys and webhook secrets.
  [/\b(sk|rk|pk)_(test|live)_[\w]+/g, '[redacted key]'],
  [/\bwhsec_[\w]+/g, '[redacted secret]'],
  // Compact JWT/JWE tokens.
  [/\beyJ[\w-]+(\.[\w-]*){1,4}/g, '[redacted token]'],
  // Anything else that looks like a random token: a long run of token characters that is not a UUID.
  [/(?<![\w-])(?![0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}(?![\w-]))[A-Za-z0-9_-]{32,}(?![\w-])/g, '[redacted token]'],
  // SMTP URLs with credentials.
  [/\b(smtps?:\/\/)[^@\s/]+@/gi, '$1[redacted]@'],
];

/** Cuts secrets out of a piece of text. */
export function redactText(text: string): string {
  // A query's parameter list, as drizzle ("params: …") and node-postgres write it, goes entirely.
  let out = text.replace(/\bparams:[\s\S]*$/i, 'params: [redacted]');
  for (const [pattern, replacement] of PATTERNS) out = out.replace(pattern, replacement);
  return out;
}

/** What an error may say in the log: its class, database code and constraint, a cleaned message. */
export function describeError(err: unknown): Fields {
  if (!(err instanceof Error)) return { errorClass: typeof err, message: redactText(String(err)).slice(0, 300) };
  const out: Fields = { errorClass: err.name && err.name !== 'Error' ? err.name : err.constructor?.name ?? 'Error' };
  // drizzle wraps the driver's error as `cause`; the SQLSTATE and constraint are what tell a fault apart.
  for (let e: unknown = err, depth = 0; e && depth < 4; e = (e as { cause?: unknown }).cause, depth++) {
    const { code, constraint } = e as { code?: unknown; constraint?: unknown };
    if (typeof code === 'string' && /^[0-9A-Z]{5}$/.test(code) && !out.sqlState) out.sqlState = code;
    if (typeof constraint === 'string' && !out.constraint) out.constraint = constraint;
  }
  // A failed query's message is its SQL text and parameters; the SQL text is ours and safe, the parameters are not.
  out.message = redactText(err.message).slice(0, 500);
  return out;
}

export function redact(value: unknown, depth = 0): unknown {
  if (value instanceof Error) return describeError(value);
  if (typeof value === 'string') return redactText(value);
  if (value === null || typeof value !== 'object') return value;
  if (depth > 4) return '[…]';
  if (Array.isArray(value)) return value.slice(0, 20).map((v) => redact(v, depth + 1));
  const out: Fields = {};
  for (const [k, v] of Object.entries(value)) out[k] = SECRET_KEY.test(k) ? '[redacted]' : redact(v, depth + 1);
  return out;
}

function write(level: Level, event: string, fields: Fields = {}): void {
  const line = JSON.stringify({ ...(redact(fields) as Fields), level, at: new Date().toISOString(), event: redactText(event) });
  (g.__baywrightLogSink ?? defaultSink)(line, level);
}

export const log = {
  error: (event: string, fields?: Fields) => write('error', event, fields),
  warn: (event: string, fields?: Fields) => write('warn', event, fields),
  info: (event: string, fields?: Fields) => write('info', event, fields),
};

/** A short id that ties a 500 answer to its log line. */
export function correlationId(): string {
  return crypto.randomBytes(6).toString('hex');
}

/** `METHOD /path` of a request, without its query string, for the log. */
export function routeOf(req: Request | undefined): string | undefined {
  if (!req) return undefined;
  try {
    return `${req.method} ${redactText(new URL(req.url).pathname)}`;
  } catch {
    return req.method;
  }
}
