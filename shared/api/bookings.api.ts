import { IdParamsSchema } from '../schemas/common.schemas';
import { BookingViewSchema, DayQuerySchema, DayViewSchema, MyBookingsSchema, WeekQuerySchema, WeekViewSchema } from '../schemas/booking-view.schemas';
import {
  BookingHistorySchema,
  BookingOptionsRequestSchema,
  BookingOptionsResponseSchema,
  CancelBookingSchema,
  ChangePlanSchema,
  CreateBookingSchema,
  DeskMoveTimesQuerySchema,
  MoveSittingSchema,
} from '../schemas/booking.schemas';
import { AvailabilitySchema, CancelTermsSchema } from '../schemas/online-booking.schemas';
import { DESK, endpoint } from './endpoint';

/**
 * The salon's book: the calendar reads (the desk's day and week, a stylist's day, a client's own list), one
 * booking, and the desk's changes to bookings (options, book, move, change the plan, cancel, history).
 */
export const bookingsApi = {
  deskDay: endpoint({
    method: 'get',
    path: '/api/desk/day',
    access: DESK,
    summary: "The salon's book for one day",
    query: DayQuerySchema,
    response: DayViewSchema,
  }),
  deskWeek: endpoint({
    method: 'get',
    path: '/api/desk/week',
    access: DESK,
    summary: 'A week of the book, for one stylist or all',
    query: WeekQuerySchema,
    response: WeekViewSchema,
  }),
  stylistDay: endpoint({
    method: 'get',
    path: '/api/stylist/day',
    access: ['stylist'],
    summary: "The signed-in stylist's day",
    query: DayQuerySchema,
    response: DayViewSchema,
  }),
  mine: endpoint({ method: 'get', path: '/api/me/bookings', access: ['client'], summary: "The signed-in client's bookings", response: MyBookingsSchema }),
  one: endpoint({
    method: 'get',
    path: '/api/bookings/:id',
    access: 'signed_in',
    summary: 'One booking (staff of its salon, or its own client)',
    params: IdParamsSchema,
    response: BookingViewSchema,
  }),
  options: endpoint({
    method: 'post',
    path: '/api/booking-options',
    access: DESK,
    summary: 'Options for a service: earliest plans per stylist and day',
    body: BookingOptionsRequestSchema,
    response: BookingOptionsResponseSchema,
  }),
  create: endpoint({
    method: 'post',
    path: '/api/bookings',
    access: DESK,
    summary: 'Book one option (all its sittings) — idempotent per key',
    body: CreateBookingSchema,
    response: BookingViewSchema,
    status: 201,
  }),
  move: endpoint({
    method: 'post',
    path: '/api/bookings/:id/move',
    access: DESK,
    summary: 'Move one sitting to a new time (and stylist)',
    params: IdParamsSchema,
    body: MoveSittingSchema,
    response: BookingViewSchema,
  }),
  changePlan: endpoint({
    method: 'post',
    path: '/api/bookings/:id/plan',
    access: DESK,
    summary: "Replace a booking's step plan, each sitting kept at its start (the engine, skin-test and processing rules decide)",
    params: IdParamsSchema,
    body: ChangePlanSchema,
    response: BookingViewSchema,
  }),
  moveTimes: endpoint({
    method: 'get',
    path: '/api/bookings/:id/move-times',
    access: DESK,
    summary: 'Free times to move one sitting to (the engine, as the move itself checks)',
    params: IdParamsSchema,
    query: DeskMoveTimesQuerySchema,
    response: AvailabilitySchema,
  }),
  cancelTerms: endpoint({
    method: 'get',
    path: '/api/bookings/:id/cancel-terms',
    access: DESK,
    summary: 'What cancelling now does to the deposit, and why',
    params: IdParamsSchema,
    response: CancelTermsSchema,
  }),
  cancel: endpoint({
    method: 'post',
    path: '/api/bookings/:id/cancel',
    access: DESK,
    summary: 'Cancel with a reason; the deposit policy decides kept or refunded',
    params: IdParamsSchema,
    body: CancelBookingSchema,
    response: BookingViewSchema,
  }),
  history: endpoint({
    method: 'get',
    path: '/api/bookings/:id/history',
    access: DESK,
    summary: "A booking's changes: who, when, what, before and after",
    params: IdParamsSchema,
    response: BookingHistorySchema,
  }),
};
