import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { passwordResetApi } from '@shared/api/password-reset.api';
import type { PasswordResetConfirmSchema, PasswordResetRequestSchema } from '@shared/schemas/auth.schemas';
import { callApi } from '@client/lib/api-client';

// Neither call changes anything the client has cached, so there is nothing to invalidate.

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (body: z.output<typeof PasswordResetRequestSchema>) => callApi(passwordResetApi.request, { body }),
  });
}

export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: (body: z.output<typeof PasswordResetConfirmSchema>) => callApi(passwordResetApi.confirm, { body }),
  });
}
