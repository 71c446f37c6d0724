import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiPaths } from '../../../../shared/api/api-paths';
import type { PasswordResetConfirmSchema, PasswordResetRequestSchema } from '../../../../shared/schemas/auth.schemas';
import { apiWrite } from '../../../lib/api-client';

// Neither call changes anything the client has cached, so there is nothing to invalidate.

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (body: z.output<typeof PasswordResetRequestSchema>) => apiWrite('POST', apiPaths.passwordReset, body),
  });
}

export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: (body: z.output<typeof PasswordResetConfirmSchema>) =>
      apiWrite('POST', apiPaths.passwordResetConfirm, body),
  });
}
