import { BookChangedEventSchema } from '../schemas/live-events.schemas';
import { STAFF, endpoint } from './endpoint';

/** Live updates: staff screens hear of changes to their salon's book as they happen. */
export const eventsApi = {
  book: endpoint({
    method: 'get',
    path: '/api/events',
    access: STAFF,
    summary:
      "Server-sent events for the signed-in staff member's salon: one `book` event per change of the book, naming the local dates and bookings it touches (the data is this schema, as JSON); a heartbeat comment every 15 s",
    answers: 'event-stream',
    response: BookChangedEventSchema,
  }),
};
