import { eventsApi } from '@shared/api/events.api';
import { BOOK_CHANGED_EVENT } from '@shared/schemas/live-events.schemas';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { AppError } from '@server/lib/app-error';
import { openEventStream } from './event-stream';

const HEARTBEAT_MS = 15_000;
const RETRY_MS = 3_000;

/**
 * The live stream of the signed-in staff member's salon: one `book` event per change of its book, naming dates
 * and bookings only. Clients are refused by the contract's access (they never hear of another client's bookings).
 */
export function registerLiveEventRoutes({ table, liveHub }: AppDeps): void {
  apiRoute(table, eventsApi.book, async ({ req, res, user }) => {
    let stream: ReturnType<typeof openEventStream> | null = null;
    const subscription = liveHub.subscribe(user.salonId, (event) => stream?.send(BOOK_CHANGED_EVENT, event));
    if (!subscription) throw new AppError('BUSY', 503, 'This server has as many live screens open as it can hold; the screen will try again shortly.');
    // Answered once this server LISTENs: a change made after the answer's headers reaches the stream.
    await subscription.ready;
    if (req.socket.destroyed) return subscription.unsubscribe(); // the screen went while we waited
    stream = openEventStream(req, res, { heartbeatMs: HEARTBEAT_MS, retryMs: RETRY_MS, onClose: subscription.unsubscribe });
  });
}
