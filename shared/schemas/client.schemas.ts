import { z } from 'zod';
import { IdSchema } from './common.schemas';
import { MessagePreferencesSchema } from './contact.schemas';
import { BookingViewSchema } from './booking-view.schemas';

export const ClientSummarySchema = z.object({
  id: IdSchema,
  name: z.string(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
});
export type ClientSummary = z.infer<typeof ClientSummarySchema>;
export const ClientListQuerySchema = z.object({ q: z.string().trim().max(100).optional() }).strict();
export const ClientListSchema = z.object({ clients: z.array(ClientSummarySchema) });

export const ClientDetailSchema = ClientSummarySchema.extend({
  notes: z.string(),
  ...MessagePreferencesSchema.shape,
  /** When the client replied STOP to a text; no SMS until they reply START. */
  smsStoppedAt: z.string().nullable(),
  /** The client's hair history says they have reacted to hair colour before (what they wrote, or null). */
  reportedReaction: z.string().nullable(),
  bookings: z.array(BookingViewSchema),
});
export type ClientDetail = z.infer<typeof ClientDetailSchema>;

/** The team's own notes on a client (what the client does not see): a few paragraphs at most. */
export const ClientNotesSchema = z.object({ notes: z.string().max(4000, 'At most 4,000 characters') }).strict();
export type ClientNotes = z.infer<typeof ClientNotesSchema>;
