import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sessionApi } from '@shared/api/session.api';
import type { SignInBody, SignUpBody } from '@shared/schemas/auth.schemas';
import { callApi } from '@client/lib/api-client';
import { sessionStarted } from '@client/lib/cache-rules';

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => callApi(sessionApi.signIn, { body }),
    onSuccess: ({ user }) => sessionStarted(queryClient, user),
  });
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignUpBody) => callApi(sessionApi.signUp, { body }),
    onSuccess: ({ user }) => sessionStarted(queryClient, user),
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => callApi(sessionApi.signOut),
    onSuccess: () => sessionStarted(queryClient, null),
  });
}
