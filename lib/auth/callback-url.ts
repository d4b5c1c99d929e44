/**
 * Reduces a callbackUrl to a same-site path and query, so a host mismatch (localhost vs
 * 127.0.0.1) cannot lose it and an outside address can never be a redirect target.
 */
export function safeCallbackPath(raw: string | null | undefined, fallback = '/layouts'): string {
  if (!raw) return fallback;
  try {
    const url = new URL(raw, 'http://placeholder.invalid');
    const path = `${url.pathname}${url.search}`;
    if (!path.startsWith('/') || path.startsWith('//')) return fallback;
    if (path.startsWith('/sign-in') || path.startsWith('/sign-up') || path.startsWith('/api/')) return fallback;
    return path;
  } catch {
    return fallback;
  }
}

const CALLBACK_COOKIES = ['authjs.callback-url', '__Secure-authjs.callback-url'];

/** Auth.js's own rule for a callback: a path on this site, or an http(s) address. */
function acceptableCallback(raw: string, origin: string): boolean {
  if (raw.length > 2048) return false;
  try {
    const url = raw.startsWith('/') ? new URL(raw, origin) : new URL(raw);
    return url.protocol === 'http:' || url.protocol === 'https:';
  } catch {
    return false;
  }
}

function cookieValue(header: string, name: string): string | null {
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === name) {
      try {
        return decodeURIComponent(part.slice(eq + 1).trim());
      } catch {
        return part.slice(eq + 1).trim();
      }
    }
  }
  return null;
}

/**
 * For the Auth.js route: a 400 answer when the request carries a callbackUrl (in the query or
 * the callback cookie) that is not a web address (`javascript:`, `data:`, garbage), else null.
 * A bad cookie is cleared with the answer so the next visit works.
 */
export function refuseForeignCallback(req: Request): Response | null {
  const url = new URL(req.url);
  const fromQuery = url.searchParams.get('callbackUrl');
  const cookies = req.headers.get('cookie') ?? '';
  const badCookies = CALLBACK_COOKIES.filter((name) => {
    const v = cookieValue(cookies, name);
    return v !== null && !acceptableCallback(v, url.origin);
  });
  if ((fromQuery === null || acceptableCallback(fromQuery, url.origin)) && !badCookies.length) return null;
  const res = Response.json(
    { error: 'The return address (callbackUrl) must be a page of this site, such as /layouts.' },
    { status: 400, headers: { 'Cache-Control': 'no-store' } },
  );
  for (const name of badCookies) res.headers.append('Set-Cookie', `${name}=; Path=/; Max-Age=0; HttpOnly; SameSite=Lax${name.startsWith('__Secure-') ? '; Secure' : ''}`);
  return res;
}
