import { z } from 'zod';
import { IdSchema, LocalDateSchema } from './common.schemas';

/** The name of the event a live stream sends for each change of the book (the `event:` field of server-sent events). */
export const BOOK_CHANGED_EVENT = 'book';

/**
 * One change of the salon's book, as a live stream tells it: which local dates it touches and which bookings,
 * and nothing else (no names, no times), so a screen knows what to read again through the ordinary API.
 */
export const BookChangedEventSchema = z.object({
  /** The salon's local dates the change touches; empty when `everyDate`. */
  dates: z.array(LocalDateSchema),
  /** The change reaches every date (the salon's set-up, staff, a client's name), or some may have been missed. */
  everyDate: z.boolean(),
  /** The bookings it changed, where known. */
  bookingIds: z.array(IdSchema),
});
export type BookChangedEvent = z.infer<typeof BookChangedEventSchema>;
