import { MailboxSchema } from '../schemas/mailbox.schemas';
import { SmsOutboxSchema } from '../schemas/sms.schemas';
import { DESK, endpoint } from './endpoint';

/** What the local e-mail and SMS fakes received, newest first (demo, dev and test only). */
export const mailboxApi = {
  mail: endpoint({
    method: 'get',
    path: '/api/dev/mailbox',
    access: DESK,
    summary: 'Messages the local e-mail fake received (demo/dev)',
    response: MailboxSchema,
  }),
  sms: endpoint({
    method: 'get',
    path: '/api/dev/sms',
    access: DESK,
    summary: 'Text messages the local SMS fake received (demo/dev)',
    response: SmsOutboxSchema,
  }),
};
