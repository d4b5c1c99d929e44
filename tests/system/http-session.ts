/**
 * Signing in to a running Baywright over HTTP, the way a browser does: fetch Auth.js's CSRF
 * token, post the credentials, keep the session cookie.
 */
export interface HttpSession {
  cookie: string;
  fetch: (path: string, init?: RequestInit) => Promise<Response>;
}

function cookiesFrom(res: Response): string[] {
  return res.headers.getSetCookie().map((c) => c.split(';')[0]);
}

export async function signInOverHttp(base: string, email: string, password: string): Promise<HttpSession> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const jar = cookiesFrom(csrfRes);
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: jar.join('; ') },
    body: new URLSearchParams({ csrfToken, email, password, callbackUrl: `${base}/layouts` }),
  });
  const all = [...jar, ...cookiesFrom(res)];
  const session = all.find((c) => c.startsWith('authjs.session-token='));
  if (!session) throw new Error(`sign-in as ${email} failed (status ${res.status})`);
  const cookie = all.join('; ');
  return {
    cookie,
    fetch: (path, init = {}) => fetch(`${base}${path}`, { ...init, headers: { ...(init.headers as Record<string, string>), cookie } }),
  };
}
