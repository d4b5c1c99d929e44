/**
 * The absolute address links in mail point to. BAYWRIGHT_PUBLIC_URL (or AUTH_URL) when set; else,
 * outside production and in the demo, the address the request came in on. A production server
 * without either refuses to build mail links from a Host header an attacker could choose
 * (the "password-reset poisoning" trap; OWASP Forgot Password Cheat Sheet — secondary citation).
 * Must never trust X-Forwarded-Host.
 */
import { outboxEnabled } from './outbox-mode';

export class PublicUrlMissing extends Error {
  constructor() {
    super('Set BAYWRIGHT_PUBLIC_URL (the address clients open the app at) so mail can carry links.');
    this.name = 'PublicUrlMissing';
  }
}

export function publicOrigin(req: Request | null, env: Record<string, string | undefined> = process.env): string {
  const configured = env.BAYWRIGHT_PUBLIC_URL ?? env.AUTH_URL;
  if (configured) return new URL(configured).origin;
  if (req && (env.NODE_ENV !== 'production' || outboxEnabled(env))) return new URL(req.url).origin;
  throw new PublicUrlMissing();
}

export function publicUrl(req: Request | null, path: string, env?: Record<string, string | undefined>): string {
  if (!path.startsWith('/') || path.startsWith('//')) throw new Error(`a mail link must be a path on this site, got ${path.slice(0, 40)}`);
  return `${publicOrigin(req, env)}${path}`;
}
