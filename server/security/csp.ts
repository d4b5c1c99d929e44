/**
 * The Content-Security-Policy of every page: scripts only with this request's nonce (Next adds
 * it to its own scripts when it sees the header) and what they load ('strict-dynamic'); no
 * framing by other sites; no plugins. Styles allow inline because React style attributes and
 * the toast outlet use them; no script can run from a style.
 */
export function contentSecurityPolicy(nonce: string, dev = process.env.NODE_ENV !== 'production'): string {
  return [
    `default-src 'self'`,
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? ` 'unsafe-eval'` : ''}`,
    `style-src 'self' 'unsafe-inline'`,
    `img-src 'self' blob: data:`,
    `font-src 'self'`,
    `connect-src 'self'${dev ? ' ws: wss:' : ''}`,
    `object-src 'none'`,
    `base-uri 'self'`,
    `form-action 'self'`,
    `frame-ancestors 'none'`,
    ...(dev ? [] : ['upgrade-insecure-requests']),
  ].join('; ');
}

/** Headers every response carries (set in next.config.ts). */
export const SECURITY_HEADERS = [
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(), payment=()' },
];
