import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { SessionResponseSchema, type SessionUser } from '../../../../shared/schemas/auth.schemas';
import { apiGet } from '../../../lib/api-client';
import { isApiError } from '../../../lib/api-error';

/** Who is signed in: the user, or null when nobody is (a 401 is an answer here, not an error). */
async function fetchSessionUser(): Promise<SessionUser | null> {
  try {
    return (await apiGet(apiPaths.session, SessionResponseSchema)).user;
  } catch (error) {
    if (isApiError(error, 'UNAUTHENTICATED') || (isApiError(error) && error.status === 401)) return null;
    throw error;
  }
}

export const sessionQueries = {
  all: () => ['session'] as const,
  current: () =>
    queryOptions({
      queryKey: [...sessionQueries.all(), 'current'] as const,
      queryFn: fetchSessionUser,
      staleTime: 5 * 60_000,
      meta: { isSession: true },
    }),
};
