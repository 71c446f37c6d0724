import { queryOptions } from '@tanstack/react-query';
import { firstLoadAddresses } from '@shared/api/first-load-addresses';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { apiKey, callApi } from '@client/lib/api-client';
import { isApiError } from '@client/lib/api-error';

/** Who is signed in: the user, or null when nobody is (a 401 is an answer here, not an error). */
async function fetchSessionUser(): Promise<SessionUser | null> {
  try {
    return (await callApi(firstLoadAddresses.session)).user;
  } catch (error) {
    if (isApiError(error, 'UNAUTHENTICATED') || (isApiError(error) && error.status === 401)) return null;
    throw error;
  }
}

export const sessionQueries = {
  current: () =>
    queryOptions({
      queryKey: apiKey(firstLoadAddresses.session),
      queryFn: fetchSessionUser,
      staleTime: 5 * 60_000,
      meta: { isSession: true },
    }),
};
