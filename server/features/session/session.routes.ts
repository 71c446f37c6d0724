import type { Request } from 'express';
import {
  SessionResponseSchema,
  SignInBodySchema,
  SignUpBodySchema,
  type SessionUser,
} from '../../../shared/schemas/auth.schemas';
import { apiPaths } from '../../../shared/api/api-paths';
import { apiRoute } from '../../lib/api-route';
import { rateLimited } from '../../lib/rate-limit';
import type { AppDeps } from '../../app-deps';
import { signIn, signUp } from './session.service';

/** passport's req.login regenerates the session (no fixation); wrapped as a promise for async routes. */
function startSession(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) =>
    req.login(user, (err) => {
      if (err) return reject(err);
      req.session.startedAt = Date.now();
      resolve();
    }),
  );
}

function endSession(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.logout((err) => (err ? reject(err) : resolve())));
}

export function registerSessionRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'post', path: apiPaths.session, access: 'public', summary: 'Sign in', body: SignInBodySchema, response: SessionResponseSchema },
    async ({ body, req }) => {
      const user = await signIn(db, body, req.ip ?? 'unknown');
      await startSession(req, user);
      return { user };
    },
  );
  apiRoute(
    table,
    { method: 'get', path: apiPaths.session, access: 'signed_in', summary: 'The signed-in user', response: SessionResponseSchema },
    async ({ user }) => ({ user }),
  );
  apiRoute(
    table,
    { method: 'delete', path: apiPaths.session, access: 'public', summary: 'Sign out', status: 204 },
    async ({ req }) => {
      if (req.user) await endSession(req);
    },
  );
  table.router.post(
    apiPaths.signUp,
    rateLimited({ windowMs: 15 * 60_000, limit: 20, message: 'Too many sign-ups from here; try again later.' }),
  );
  apiRoute(
    table,
    { method: 'post', path: apiPaths.signUp, access: 'public', summary: 'A client creates an account', body: SignUpBodySchema, response: SessionResponseSchema, status: 201 },
    async ({ body, req }) => {
      const user = await signUp(db, body);
      await startSession(req, user);
      return { user };
    },
  );
}
