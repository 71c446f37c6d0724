import { data, redirect } from 'react-router-dom';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { Role } from '@shared/schemas/common.schemas';
import { paths } from '../config/paths';
import { sessionQueries } from '../features/auth/api/session-queries';
import { queryClient } from '../lib/query-client';

/** Thrown (as a 403 route error) when a signed-in person opens another role's page. */
export type WrongRole = { allowed: readonly Role[] };

/**
 * Mirrors the server's role checks so people land on a helpful page instead of
 * an API error: signed out → sign in and come back; wrong role → "not for your role".
 */
export async function requireRole(request: Request, allowed: readonly Role[]): Promise<SessionUser> {
  const user = await queryClient.ensureQueryData(sessionQueries.current());
  if (!user) {
    const url = new URL(request.url);
    throw redirect(paths.signIn(url.pathname + url.search));
  }
  if (!allowed.includes(user.role)) throw data<WrongRole>({ allowed }, { status: 403 });
  return user;
}

/** The signed-in user, or null; for pages anyone may open. */
export function currentUser(): Promise<SessionUser | null> {
  return queryClient.ensureQueryData(sessionQueries.current());
}
