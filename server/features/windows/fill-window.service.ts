import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Salon } from '@shared/schemas/salon.schemas';
import { windowsApi } from '@shared/api/windows.api';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { BookingStatusSchema } from '@shared/schemas/common.schemas';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { z } from 'zod';
import type { FillWindowSchema } from '@shared/schemas/window.schemas';
import { AppError, forbidden, notFound } from '@server/lib/app-error';
import { findClient, insertClient } from '../clients';
import { findService } from '../services';
import { findStaffIdForUser } from '../bookings';
import { lockStylists } from '../planning';
import { bookAt } from '../bookings';
import { oncePerKey } from '../bookings';
import { closeStandby } from '../standby';
import { findSalon } from '../salon';
import { loadBookingViews } from '../bookings';

type FillWindow = z.infer<typeof FillWindowSchema>;

/** A repeated request with the same key answers the first one's booking (oncePerKey); stored under the route it came by. */
const IDEMPOTENCY_ROUTE = `POST ${windowsApi.fill.path}`;

/** Books a walk-in or a standby client into a window with one action; the engine re-checks it fits. Answers the booking as the desk sees it. */
export async function fillWindow(db: Kysely<Database>, user: SessionUser, body: FillWindow, now: Date): Promise<BookingView> {
  const salon = await findSalon(db, user.salonId);
  const bookingId = await bookIntoWindow(db, salon, user, body, now);
  // Read as the desk's booking view reads it (any status), not through the bookings routes: a service
  // never imports routes. merge: use the bookings area's view service once deskBookingView moves into one.
  const [view] = await loadBookingViews(db, { salonId: salon.id, bookingId, statuses: BookingStatusSchema.options }, salon.timeZone);
  if (!view) throw notFound('That booking');
  return view;
}

async function bookIntoWindow(db: Kysely<Database>, salon: Salon, user: SessionUser, body: FillWindow, now: Date): Promise<string> {
  if (user.role === 'stylist' && (await findStaffIdForUser(db, user.id)) !== body.stylistId) throw forbidden();
  const service = await findService(db, salon.id, body.serviceId);
  if (!service) throw notFound('That service');
  if (service.stepPlan.sittings.length !== 1) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { serviceId: 'Only one-sitting services go into a window.' });
  }
  if (body.clientId && !(await findClient(db, salon.id, body.clientId))) throw notFound('That client');
  const once = { userId: user.id, key: body.idempotencyKey, route: IDEMPOTENCY_ROUTE, request: body };
  const booked = await db.transaction().execute((trx) =>
    oncePerKey(trx, once, async () => {
      await lockStylists(trx, [body.stylistId]);
      const clientId =
        body.clientId ??
        (await insertClient(trx, {
          salonId: salon.id,
          userId: null,
          name: body.walkIn!.name,
          email: null,
          phone: body.walkIn!.phone || null,
          notes: 'Walk-in',
        }));
      const bookingId = await bookAt(trx, {
        salon,
        clientId,
        service,
        plan: service.stepPlan,
        stylistId: body.stylistId,
        start: new Date(body.start),
        latestStart: body.latestStart ? new Date(body.latestStart) : undefined,
        actorUserId: user.id,
        now,
        allowWaitingOnTest: true,
      });
      if (body.standbyEntryId) await closeStandby(trx, salon.id, body.standbyEntryId);
      return { bookingId };
    }),
  );
  return booked.bookingId;
}
