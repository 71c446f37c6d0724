import { MyPreferencesBodySchema, MyPreferencesSchema } from '../schemas/contact.schemas';
import { InboundSmsSchema, SimulateInboundSmsResultSchema, SimulateInboundSmsSchema } from '../schemas/inbound-sms.schemas';
import { MessagesQuerySchema, SentMessagesSchema } from '../schemas/messages.schemas';
import { DESK, endpoint } from './endpoint';

/** The send log, how a client wants to be reached, and texts sent to the salon's number (STOP/START). */
export const messagesApi = {
  sendLog: endpoint({
    method: 'get',
    path: '/api/messages',
    access: DESK,
    summary: "The salon's send log: each message with status, attempts and last error",
    query: MessagesQuerySchema,
    response: SentMessagesSchema,
  }),
  myPreferences: endpoint({
    method: 'get',
    path: '/api/me/preferences',
    access: ['client'],
    summary: 'How the salon reaches me: channel, marketing opt-in, phone',
    response: MyPreferencesSchema,
  }),
  saveMyPreferences: endpoint({
    method: 'put',
    path: '/api/me/preferences',
    access: ['client'],
    summary: 'Set my message channel, marketing opt-in and phone',
    body: MyPreferencesBodySchema,
    response: MyPreferencesSchema,
  }),
  // Outside /api: the provider posts a signed form without a session or a CSRF token, and answers TwiML (XML).
  inboundSms: endpoint({
    method: 'post',
    path: '/webhooks/sms',
    access: 'public',
    summary: 'SMS provider webhook: a text to the salon (STOP turns SMS off, START on)',
    body: InboundSmsSchema,
    bodyType: 'form',
    answers: 'file',
  }),
  simulateInboundSms: endpoint({
    method: 'post',
    path: '/api/dev/sms/inbound',
    access: DESK,
    summary: 'Demo/dev: the SMS fake delivers a text from a phone to the webhook',
    body: SimulateInboundSmsSchema,
    response: SimulateInboundSmsResultSchema,
  }),
};
