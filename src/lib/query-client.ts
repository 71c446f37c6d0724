import { QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError, isApiError } from './api-error';

declare module '@tanstack/react-query' {
  interface Register {
    defaultError: ApiError;
    queryMeta: { isSession?: boolean };
  }
}

/** One cache for the whole app; route loaders fill it and components read it. */
export const queryClient: QueryClient = new QueryClient({
  queryCache: new QueryCache({
    onError: (error) => {
      // A session that ended on the server: re-read who is signed in so the header and guards catch up.
      if (isApiError(error, 'UNAUTHENTICATED')) {
        void queryClient.invalidateQueries({ predicate: (query) => query.meta?.isSession === true });
      }
    },
  }),
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      // 4xx answers will not change on a retry; network and 5xx errors might.
      retry: (failureCount, error) => failureCount < 2 && !(error instanceof ApiError && error.status >= 400 && error.status < 500),
    },
  },
});
