import { PasswordResetConfirmSchema, PasswordResetRequestSchema } from '../schemas/auth.schemas';
import { endpoint } from './endpoint';

/** A forgotten password: a one-time link by e-mail, then a new password with it. */
export const passwordResetApi = {
  request: endpoint({
    method: 'post',
    path: '/api/password-reset',
    access: 'public',
    summary: 'E-mail a password-reset link',
    body: PasswordResetRequestSchema,
    status: 202,
  }),
  confirm: endpoint({
    method: 'post',
    path: '/api/password-reset/confirm',
    access: 'public',
    summary: 'Set a new password with a reset link',
    body: PasswordResetConfirmSchema,
    status: 204,
  }),
};
