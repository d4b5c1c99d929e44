/**
 * The address links back into the app are built on (the checkout's return, the quote and receipt
 * mail). Must never let a request choose the address where a public URL is configured or where
 * server/mail/public-url refuses the request as a stand-in (production without the demo).
 */
import 'server-only';
import { publicOrigin } from '@/server/mail/public-url';

/**
 * Where the checkout sends the client back to: the configured public address when there is one
 * (server/mail/public-url decides whether the request may stand in); otherwise the host the browser
 * itself used, so its session cookie comes along (the server may see itself as localhost while the
 * browser is on 127.0.0.1). Origin was already checked against Host by the route's `handle`.
 */
export function returnOrigin(req: Request, env: Record<string, string | undefined> = process.env): string {
  const base = publicOrigin(req, env);
  if (env.BAYWRIGHT_PUBLIC_URL ?? env.AUTH_URL) return base;
  const host = req.headers.get('host');
  return host && /^[A-Za-z0-9.-]+(:\d{1,5})?$|^\[[0-9a-fA-F:]+\](:\d{1,5})?$/.test(host) ? `${new URL(req.url).protocol}//${host}` : base;
}

