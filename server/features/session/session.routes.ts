import { sessionApi } from '@shared/api/session.api';
import { apiRoute } from '@server/lib/api-route';
import { rateLimited } from '@server/lib/rate-limit';
import type { AppDeps } from '@server/app-deps';
import { authenticate, endSession, startSession } from '@server/auth/sessions';
import { signUp } from './session.service';

export function registerSessionRoutes({ table, db }: AppDeps): void {
  const signUpLimiter = rateLimited(db, { name: 'sign-up', windowMs: 15 * 60_000, limit: 20, message: 'Too many sign-ups from here; try again later.' });
  apiRoute(table, sessionApi.signIn, async ({ req, res }) => {
    const user = await authenticate(req, res);
    await startSession(req, user);
    return { user };
  });
  apiRoute(table, sessionApi.current, async ({ user }) => ({ user }));
  apiRoute(table, sessionApi.signOut, async ({ req }) => {
    if (req.user) await endSession(req);
  });
  apiRoute(
    table,
    sessionApi.signUp,
    async ({ body, req }) => {
      const user = await signUp(db, body);
      await startSession(req, user);
      return { user };
    },
    [signUpLimiter],
  );
}
