import { passwordResetApi } from '@shared/api/password-reset.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { rateLimited } from '@server/lib/rate-limit';
import { confirmReset, requestReset } from './password-reset.service';

export function registerPasswordResetRoutes({ table, db, mailer, config }: AppDeps): void {
  const requestLimiter = rateLimited(db, { name: 'password-reset', windowMs: 15 * 60_000, limit: 10, message: 'Too many reset requests; try again later.' });
  apiRoute(
    table,
    passwordResetApi.request,
    async ({ body, req }) => {
      const baseUrl = config.publicUrl ?? `${req.protocol}://${req.get('host')}`;
      await requestReset(db, mailer, body.email, baseUrl);
      return { ok: true };
    },
    [requestLimiter],
  );
  apiRoute(table, passwordResetApi.confirm, async ({ body }) => confirmReset(db, body.token, body.password));
}
