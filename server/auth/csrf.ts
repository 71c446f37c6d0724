import type { Express } from 'express';
import { doubleCsrf } from 'csrf-csrf';
import type { Config } from '../config';
import { sessionApi } from '@shared/api/session.api';
import { API_ROOT } from '@shared/api/endpoint';
import { apiRoute, type RouteTable } from '../lib/api-route';

/**
 * Double-submit CSRF protection for every cookie-authenticated write (sign-in included):
 * `GET /api/csrf` returns `{ token }` and sets a cookie; writes send the token in `X-CSRF-Token`.
 * The token is bound to the session, so after sign-in or sign-out the client fetches a new one.
 */
export function installCsrf(app: Express, config: Config, table: RouteTable) {
  const { doubleCsrfProtection, generateCsrfToken } = doubleCsrf({
    getSecret: () => config.sessionSecret,
    getSessionIdentifier: (req) => req.session?.id ?? '',
    cookieName: config.secureCookies ? '__Host-dwell.csrf' : 'dwell.csrf',
    cookieOptions: { sameSite: 'lax', secure: config.secureCookies, httpOnly: true, path: '/' },
    getCsrfTokenFromRequest: (req) => req.headers['x-csrf-token'],
    errorConfig: { statusCode: 403, code: 'EBADCSRFTOKEN', message: 'Invalid CSRF token' },
  });
  app.use(API_ROOT, doubleCsrfProtection);
  apiRoute(table, sessionApi.csrf, async ({ req, res }) => {
    // An anonymous session must be saved for its id (what the token is bound to) to stay the same.
    req.session.csrfReady = true;
    return { token: generateCsrfToken(req, res, { overwrite: true }) };
  });
}
