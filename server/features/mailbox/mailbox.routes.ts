import { apiPaths } from '../../../shared/api/api-paths';
import { MailboxSchema } from '../../../shared/schemas/mailbox.schemas';
import type { AppDeps } from '../../app-deps';
import { DESK } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { notFound } from '../../lib/app-error';

/** What the local e-mail fake received, newest first (demo, dev and test only). */
export function registerMailboxRoutes({ table, smtpFake }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.devMailbox, access: DESK, summary: 'Messages the local e-mail fake received (demo/dev)', response: MailboxSchema },
    async () => {
      if (!smtpFake) throw notFound('The demo mailbox');
      return { messages: [...smtpFake.messages].reverse() };
    },
  );
}
