import { BookingViewSchema } from '../../../shared/schemas/booking-view.schemas';
import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { AvailabilitySchema, CancelTermsSchema, ConfirmationSendsSchema, ClientCancelSchema, ClientMoveSchema, MoveTimesQuerySchema } from '../../../shared/schemas/online-booking.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { deskBookingView } from '../bookings/booking-changes.routes';
import { cancelBooking } from '../bookings/cancel-booking.service';
import { moveSitting } from '../bookings/move-booking.service';
import { findSalonBySlug } from './public-salon.service';
import { freeTimes } from './availability.service';
import { bookingIcs } from './booking-ics';
import { assertClientMovable, cancelTerms, insideDepositWindow, ownBooking } from './my-bookings.service';
import { AppError } from '../../lib/app-error';
import { confirmationSends } from './confirmation';

export function registerMyBookingRoutes({ table, db }: AppDeps): void {
  apiRoute(table, { method: 'get', path: '/api/me/bookings/:id/calendar.ics', access: ['client'], summary: 'One of my bookings as a calendar file (RFC 5545)', params: IdParamsSchema, answers: 'file' }, async ({ user, params, res }) => {
    const { hold, salon } = await ownBooking(db, user, params.id);
    const ics = bookingIcs({ uid: `${hold.id}@dwell`, title: `${hold.serviceName} at ${salon.name}`, description: `${hold.serviceName} with ${hold.stylistName}`, location: salon.address, start: hold.start, end: hold.end });
    res.type('text/calendar').attachment('booking.ics').send(ics);
  });
  apiRoute(
    table,
    { method: 'get', path: '/api/me/bookings/:id/confirmation', access: ['client'], summary: "How my booking's confirmation stands on each channel", params: IdParamsSchema, response: ConfirmationSendsSchema },
    async ({ user, params }) => confirmationSends(db, user, params.id, new Date()),
  );
  apiRoute(table, { method: 'get', path: '/api/me/bookings/:id/cancel-terms', access: ['client'], summary: 'What cancelling now means for the deposit', params: IdParamsSchema, response: CancelTermsSchema }, async ({ user, params }) =>
    cancelTerms(db, user, params.id, new Date()),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/me/bookings/:id/cancel', access: ['client'], summary: 'Cancel one of my bookings', params: IdParamsSchema, body: ClientCancelSchema, response: BookingViewSchema },
    async ({ user, params, body }) => {
      const { salon } = await ownBooking(db, user, params.id);
      await cancelBooking(db, salon, user.id, params.id, body.reason, new Date());
      return deskBookingView(db, salon.id, salon.timeZone, params.id);
    },
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/me/bookings/:id/move-times', access: ['client'], summary: 'Free times to move one of my bookings to', params: IdParamsSchema, query: MoveTimesQuerySchema, response: AvailabilitySchema },
    async ({ user, params, query }) => {
      const { salon, service, hold } = await assertClientMovable(db, user, params.id, new Date());
      const row = await findSalonBySlug(db, salon.slug);
      const now = new Date();
      const times = await freeTimes(db, row, service, hold.stylist_id, query.from, now, params.id);
      // A deposit stays refundable only outside the cancellation window, so a client's own move never lands inside it;
      // and the appointment's own time is no move at all (the search leaves the booking out, so finds it free).
      const elsewhere = (start: Date) => start.getTime() !== hold.start.getTime();
      return { ...times, times: times.times.filter((t) => elsewhere(new Date(t.start)) && !insideDepositWindow(hold.deposit_cents, new Date(t.start), now, salon.cancellationWindowHours)) };
    },
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/me/bookings/:id/move', access: ['client'], summary: 'Move one of my bookings', params: IdParamsSchema, body: ClientMoveSchema, response: BookingViewSchema },
    async ({ user, params, body }) => {
      const { salon, hold } = await assertClientMovable(db, user, params.id, new Date());
      if (insideDepositWindow(hold.deposit_cents, new Date(body.start), new Date(), salon.cancellationWindowHours)) {
        throw new AppError('NOT_BOOKABLE', 409, `Times less than ${salon.cancellationWindowHours} hours away would make your deposit non-refundable; please call the salon to move this close.`);
      }
      await moveSitting(db, salon, user.id, { bookingId: params.id, sitting: 1, start: new Date(body.start) }, new Date());
      return deskBookingView(db, salon.id, salon.timeZone, params.id);
    },
  );
}
