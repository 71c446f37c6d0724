/** A signed-in session for scripts: cookie header and CSRF token, through the API as the browser does. */
export interface HttpSession {
  cookie: string;
  csrf: string;
}

function mergeCookies(jar: Map<string, string>, res: Response) {
  for (const c of res.headers.getSetCookie()) {
    const [pair = ''] = c.split(';');
    const [name = '', ...value] = pair.split('=');
    jar.set(name, value.join('='));
  }
}

/** A cookie jar and a CSRF token bound to its session, as a browser holds them. */
function browser(baseUrl: string) {
  const jar = new Map<string, string>();
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const csrf = async () => {
    const res = await fetch(`${baseUrl}/api/csrf`, { headers: { cookie: cookie() } });
    mergeCookies(jar, res);
    return ((await res.json()) as { token: string }).token;
  };
  return { jar, cookie, csrf };
}

/** Fetches a new CSRF token into `session` (a GET /api/csrf with hostile input also replaces the one it held). */
export async function refreshCsrf(baseUrl: string, session: HttpSession): Promise<void> {
  const { jar, cookie, csrf } = browser(baseUrl);
  for (const pair of session.cookie.split('; ').filter(Boolean)) {
    const [name = '', ...value] = pair.split('=');
    jar.set(name, value.join('='));
  }
  session.csrf = await csrf();
  session.cookie = cookie();
}

/** A signed-out session: the cookie and CSRF token of a browser that has not signed in. */
export async function anonymousSession(baseUrl: string): Promise<HttpSession> {
  const { cookie, csrf } = browser(baseUrl);
  const token = await csrf();
  return { cookie: cookie(), csrf: token };
}

export async function signIn(baseUrl: string, email: string, password: string): Promise<HttpSession> {
  const { jar, cookie, csrf } = browser(baseUrl);
  const res = await fetch(`${baseUrl}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': await csrf(), cookie: cookie() },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${await res.text()}`);
  mergeCookies(jar, res);
  const token = await csrf(); // bound to the new session
  return { cookie: cookie(), csrf: token };
}

/** A JSON request as the signed-in browser sends it (cookie and CSRF token); the answer's status and body. */
export async function sendJson(
  baseUrl: string,
  session: HttpSession,
  method: 'GET' | 'POST' | 'PUT',
  path: string,
  body?: object,
  headers: Record<string, string> = {},
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- bench scripts read whichever fields of an answer they need
): Promise<{ status: number; body: any }> {
  const res = await fetch(`${baseUrl}${path}`, {
    method,
    headers: { cookie: session.cookie, 'x-csrf-token': session.csrf, ...(body ? { 'content-type': 'application/json' } : {}), ...headers },
    body: body ? JSON.stringify(body) : undefined,
  });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}
