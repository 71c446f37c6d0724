import { apiPaths } from '../../../shared/api/api-paths';
import { MailboxSchema } from '../../../shared/schemas/mailbox.schemas';
import { SmsOutboxSchema } from '../../../shared/schemas/sms.schemas';
import type { AppDeps } from '../../app-deps';
import { DESK } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { notFound } from '../../lib/app-error';

/** What the local e-mail and SMS fakes received, newest first (demo, dev and test only). */
export function registerMailboxRoutes({ table, smtpFake, smsFake }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.devMailbox, access: DESK, summary: 'Messages the local e-mail fake received (demo/dev)', response: MailboxSchema },
    async () => {
      if (!smtpFake) throw notFound('The demo mailbox');
      return { messages: [...smtpFake.messages].reverse() };
    },
  );
  apiRoute(
    table,
    { method: 'get', path: apiPaths.devSms, access: DESK, summary: 'Text messages the local SMS fake received (demo/dev)', response: SmsOutboxSchema },
    async () => {
      if (!smsFake) throw notFound('The demo SMS box');
      return { messages: [...smsFake.messages].reverse() };
    },
  );
}
