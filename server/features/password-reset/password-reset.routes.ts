import { apiPaths } from '../../../shared/api/api-paths';
import { PasswordResetConfirmSchema, PasswordResetRequestSchema } from '../../../shared/schemas/auth.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { rateLimited } from '../../lib/rate-limit';
import { confirmReset, requestReset } from './password-reset.service';

export function registerPasswordResetRoutes({ table, db, mailer, config }: AppDeps): void {
  table.router.post(
    apiPaths.passwordReset,
    rateLimited({ windowMs: 15 * 60_000, limit: 10, message: 'Too many reset requests; try again later.' }),
  );
  apiRoute(
    table,
    { method: 'post', path: apiPaths.passwordReset, access: 'public', summary: 'E-mail a password-reset link', body: PasswordResetRequestSchema, status: 202 },
    async ({ body, req }) => {
      const baseUrl = config.publicUrl ?? `${req.protocol}://${req.get('host')}`;
      await requestReset(db, mailer, body.email, baseUrl);
      return { ok: true };
    },
  );
  apiRoute(
    table,
    { method: 'post', path: apiPaths.passwordResetConfirm, access: 'public', summary: 'Set a new password with a reset link', body: PasswordResetConfirmSchema, status: 204 },
    async ({ body }) => confirmReset(db, body.token, body.password),
  );
}
