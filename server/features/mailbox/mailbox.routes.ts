import { mailboxApi } from '@shared/api/mailbox.api';
import { messagesApi } from '@shared/api/messages.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { notFound } from '@server/lib/app-error';
import { sendLog } from '../messages';

/** What the local e-mail and SMS fakes received, newest first (demo, dev and test only). */
export function registerMailboxRoutes({ table, db, smtpFake, smsFake }: AppDeps): void {
  // The send log itself is real data (every mode): what Dwell planned, sent, dropped or gave up on.
  apiRoute(table, messagesApi.sendLog, async ({ user, query }) => sendLog(db, user.salonId, query.status));
  apiRoute(table, mailboxApi.mail, async () => {
    if (!smtpFake) throw notFound('The demo mailbox');
    return { messages: [...smtpFake.messages].reverse() };
  });
  apiRoute(table, mailboxApi.sms, async () => {
    if (!smsFake) throw notFound('The demo SMS box');
    return { messages: [...smsFake.messages].reverse() };
  });
}
