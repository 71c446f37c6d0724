import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { SessionResponseSchema, type SessionUser, type SignInBody, type SignUpBody } from '../../../../shared/schemas/auth.schemas';
import { apiWrite } from '../../../lib/api-client';
import { sessionQueries } from './session-queries';

/** A new person is signed in: nothing cached for the previous one may show. */
function startSession(queryClient: QueryClient, user: SessionUser | null) {
  queryClient.removeQueries({ predicate: (query) => query.meta?.isSession !== true });
  queryClient.setQueryData(sessionQueries.current().queryKey, user);
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => apiWrite('POST', apiPaths.session, body, SessionResponseSchema),
    onSuccess: ({ user }) => startSession(queryClient, user),
  });
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignUpBody) => apiWrite('POST', apiPaths.signUp, body, SessionResponseSchema),
    onSuccess: ({ user }) => startSession(queryClient, user),
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiWrite('DELETE', apiPaths.session),
    onSuccess: () => startSession(queryClient, null),
  });
}
