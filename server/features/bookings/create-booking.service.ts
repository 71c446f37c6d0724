import type { Kysely } from 'kysely';
import { bookingsApi } from '@shared/api/bookings.api';
import type { Database } from '@server/db/schema';
import type { CreateBooking } from '@shared/schemas/booking.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { findClientQuote } from '../consultations';
import { findClient } from '../clients';
import { findService } from '../services';
import { lockStylists } from '../planning';
import { assertWithinProcessingLimits } from '../planning';
import { bookAt } from './book-at.service';
import { oncePerKey } from './idempotent.service';
import { setDepositDueBy } from './change-booking.repository';

/** The route a stored answer is filed under: this endpoint's method and path. */
const idempotencyRoute = `${bookingsApi.create.method.toUpperCase()} ${bookingsApi.create.path}`;

/**
 * One booking with all its sittings, or the answer already given to this idempotency key (oncePerKey: a retry
 * racing its original waits for it and gets the original's booking; the key with another request is a 422).
 */
export async function createBooking(db: Kysely<Database>, salon: Salon, user: SessionUser, body: CreateBooking, now: Date): Promise<string> {
  const [client, service] = await Promise.all([findClient(db, salon.id, body.clientId), findService(db, salon.id, body.serviceId)]);
  if (!client) throw notFound('That client');
  if (!service) throw notFound('That service');
  // The desk's per-booking plan is held to the salon's processing limits like the menu's.
  assertWithinProcessingLimits(body.stepPlan, salon.processingLimits);
  const quote = body.quoteId ? await findClientQuote(db, salon.id, client.id, body.quoteId) : undefined;
  if (body.quoteId && !quote) throw new AppError('VALIDATION_FAILED', 400, 'That quote is not this client’s.', { quoteId: 'That quote is not this client’s.' });
  const once = { userId: user.id, key: body.idempotencyKey, route: idempotencyRoute, request: body };
  const booked = await db.transaction().execute((trx) =>
    oncePerKey(trx, once, async () => {
      await lockStylists(trx, [body.stylistId]);
      const bookingId = await bookAt(trx, {
        salon,
        clientId: client.id,
        service,
        plan: body.stepPlan,
        stylistId: body.stylistId,
        start: new Date(body.start),
        chairIds: body.chairIds,
        actorUserId: user.id,
        now,
        allowWaitingOnTest: true,
        quote: quote && { id: quote.id, priceCents: quote.price_cents, depositCents: quote.deposit_cents },
      });
      if (salon.unpaidDepositReleaseHours !== null) await setDepositDueBy(trx, bookingId, salon.unpaidDepositReleaseHours, now);
      return { bookingId };
    }),
  );
  return booked.bookingId;
}
