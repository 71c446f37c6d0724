import { apiPaths } from '../../../shared/api/api-paths';
import {
  BookingHistorySchema,
  BookingOptionsRequestSchema,
  BookingOptionsResponseSchema,
  CancelBookingSchema,
  CreateBookingSchema,
  DeskMoveTimesQuerySchema,
  MoveSittingSchema,
  ChangePlanSchema,
} from '../../../shared/schemas/booking.schemas';
import { AvailabilitySchema, CancelTermsSchema } from '../../../shared/schemas/online-booking.schemas';
import { BookingViewSchema } from '../../../shared/schemas/booking-view.schemas';
import { BookingStatusSchema, IdParamsSchema } from '../../../shared/schemas/common.schemas';
import type { AppDeps } from '../../app-deps';
import type { Db } from '../../db/database';
import { DESK } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { notFound } from '../../lib/app-error';
import { findSalon } from '../salon/salon.repository';
import { listAudit } from '../audit/audit.repository';
import { loadBookingViews } from './booking-views.repository';
import { findBookingOptions } from './booking-options.service';
import { createBooking } from './create-booking.service';
import { moveSitting } from './move-booking.service';
import { cancelBooking, deskCancelTerms } from './cancel-booking.service';
import { changePlan } from './change-plan.service';
import { deskMoveTimes } from './move-times.service';

/** One booking as the desk sees it (any status). */
export async function deskBookingView(db: Db, salonId: string, timeZone: string, bookingId: string) {
  const [view] = await loadBookingViews(db, { salonId, bookingId, statuses: BookingStatusSchema.options }, timeZone);
  if (!view) throw notFound('That booking');
  return view;
}

export function registerBookingChangeRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'post', path: apiPaths.bookingOptions, access: DESK, summary: 'Options for a service: earliest plans per stylist and day', body: BookingOptionsRequestSchema, response: BookingOptionsResponseSchema },
    async ({ user, body }) => findBookingOptions(db, await findSalon(db, user.salonId), body, new Date()),
  );
  apiRoute(
    table,
    { method: 'post', path: apiPaths.bookings, access: DESK, summary: 'Book one option (all its sittings) — idempotent per key', body: CreateBookingSchema, response: BookingViewSchema, status: 201 },
    async ({ user, body }) => {
      const salon = await findSalon(db, user.salonId);
      const id = await createBooking(db, salon, user, body, new Date());
      return deskBookingView(db, salon.id, salon.timeZone, id);
    },
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/bookings/:id/move', access: DESK, summary: 'Move one sitting to a new time (and stylist)', params: IdParamsSchema, body: MoveSittingSchema, response: BookingViewSchema },
    async ({ user, params, body }) => {
      const salon = await findSalon(db, user.salonId);
      await moveSitting(db, salon, user.id, { bookingId: params.id, sitting: body.sitting, start: new Date(body.start), stylistId: body.stylistId, chairId: body.chairId, allowWaitingOnTest: true }, new Date());
      return deskBookingView(db, salon.id, salon.timeZone, params.id);
    },
  );
  apiRoute(
    table,
    {
      method: 'post', path: '/api/bookings/:id/plan', access: DESK, params: IdParamsSchema, body: ChangePlanSchema, response: BookingViewSchema,
      summary: "Replace a booking's step plan, each sitting kept at its start (the engine, skin-test and processing rules decide)",
    },
    async ({ user, params, body }) => {
      const salon = await findSalon(db, user.salonId);
      await changePlan(db, salon, user.id, params.id, body.stepPlan, new Date());
      return deskBookingView(db, salon.id, salon.timeZone, params.id);
    },
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/bookings/:id/move-times', access: DESK, summary: 'Free times to move one sitting to (the engine, as the move itself checks)', params: IdParamsSchema, query: DeskMoveTimesQuerySchema, response: AvailabilitySchema },
    async ({ user, params, query }) => {
      const salon = await findSalon(db, user.salonId);
      return deskMoveTimes(db, salon, params.id, { sitting: Number(query.sitting), stylistId: query.stylistId, from: query.from }, new Date());
    },
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/bookings/:id/cancel-terms', access: DESK, summary: 'What cancelling now does to the deposit, and why', params: IdParamsSchema, response: CancelTermsSchema },
    async ({ user, params }) => deskCancelTerms(db, await findSalon(db, user.salonId), params.id, new Date()),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/bookings/:id/cancel', access: DESK, summary: 'Cancel with a reason; the deposit policy decides kept or refunded', params: IdParamsSchema, body: CancelBookingSchema, response: BookingViewSchema },
    async ({ user, params, body }) => {
      const salon = await findSalon(db, user.salonId);
      await cancelBooking(db, salon, user.id, params.id, body.reason, new Date());
      return deskBookingView(db, salon.id, salon.timeZone, params.id);
    },
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/bookings/:id/history', access: DESK, summary: "A booking's changes: who, when, what, before and after", params: IdParamsSchema, response: BookingHistorySchema },
    async ({ user, params }) => {
      const entries = await listAudit(db, user.salonId, 'booking', params.id);
      if (!entries.length) await deskBookingView(db, user.salonId, 'UTC', params.id); // 404 for unknown ids
      return { entries: entries.map((e) => ({ at: e.at.toISOString(), actor: e.actor, action: e.action, before: e.before ?? null, after: e.after ?? null })) };
    },
  );
}
