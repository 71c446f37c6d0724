import { apiPaths } from '../../../shared/api/api-paths';
import { MailboxSchema } from '../../../shared/schemas/mailbox.schemas';
import { SmsOutboxSchema } from '../../../shared/schemas/sms.schemas';
import type { AppDeps } from '../../app-deps';
import { DESK } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { notFound } from '../../lib/app-error';
import { MessagesQuerySchema, SentMessagesSchema, messagesPath } from '../../../shared/schemas/messages.schemas';
import { listMessages } from '../messages/messages.repository';

/** What the local e-mail and SMS fakes received, newest first (demo, dev and test only). */
export function registerMailboxRoutes({ table, db, smtpFake, smsFake }: AppDeps): void {
  // The send log itself is real data (every mode): what Dwell planned, sent, dropped or gave up on.
  apiRoute(
    table,
    { method: 'get', path: messagesPath, access: DESK, summary: "The salon's send log: each message with status, attempts and last error", query: MessagesQuerySchema, response: SentMessagesSchema },
    async ({ user, query }) => {
      const rows = await listMessages(db, user.salonId, query.status);
      return { messages: rows.map((m) => ({ ...m, sendAt: m.sendAt.toISOString(), sentAt: m.sentAt?.toISOString() ?? null })) };
    },
  );
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
