import { z } from 'zod';

/** What the local SMS fake received (demo and dev mode only). */
export const CapturedSmsSchema = z.object({
  id: z.number().int(),
  sid: z.string(),
  to: z.string(),
  from: z.string(),
  body: z.string(),
  receivedAt: z.string(),
});
export type CapturedSms = z.infer<typeof CapturedSmsSchema>;
export const SmsOutboxSchema = z.object({ messages: z.array(CapturedSmsSchema) });
