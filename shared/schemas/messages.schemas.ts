import { z } from 'zod';

export const MessageStatusSchema = z.enum(['queued', 'sending', 'sent', 'failed', 'dropped']);
export type MessageStatus = z.infer<typeof MessageStatusSchema>;

export const MessagesQuerySchema = z.object({ status: MessageStatusSchema.optional() });

export const SentMessageSchema = z.object({
  id: z.string(),
  kind: z.string(),
  channel: z.enum(['sms', 'email']),
  toAddress: z.string(),
  subject: z.string(),
  body: z.string(),
  sendAt: z.string(),
  status: MessageStatusSchema,
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  sentAt: z.string().nullable(),
  bookingId: z.string().nullable(),
});
export type SentMessage = z.infer<typeof SentMessageSchema>;
export const SentMessagesSchema = z.object({ messages: z.array(SentMessageSchema) });
