import { z } from 'zod';

/** What the local e-mail fake received (demo and dev mode only). */
export const CapturedMailSchema = z.object({
  id: z.number().int(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  /** The HTML part, when the message had one. */
  html: z.string().nullable().default(null),
  receivedAt: z.string(),
  attachments: z.array(z.object({ filename: z.string(), contentType: z.string(), content: z.string() })).default([]),
});
export type CapturedMail = z.infer<typeof CapturedMailSchema>;
export const MailboxSchema = z.object({ messages: z.array(CapturedMailSchema) });
