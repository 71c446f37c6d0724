import { BookingViewSchema } from '../schemas/booking-view.schemas';
import {
  FillWindowSchema,
  OfferTokenParamsSchema,
  OfferViewSchema,
  OfferWindowResultSchema,
  OfferWindowSchema,
  WindowListSchema,
  WindowsQuerySchema,
} from '../schemas/window.schemas';
import { STAFF, endpoint } from './endpoint';

/** Hands-free windows: a stylist's free time while a colour develops, filled by a walk-in or offered to standby clients. */
export const windowsApi = {
  list: endpoint({
    method: 'get',
    path: '/api/windows',
    access: STAFF,
    summary: "A day's hands-free windows with the fits and standby clients for each",
    query: WindowsQuerySchema,
    response: WindowListSchema,
  }),
  fill: endpoint({
    method: 'post',
    path: '/api/windows/fill',
    access: STAFF,
    summary: 'Book a walk-in or standby client into a hands-free window',
    body: FillWindowSchema,
    response: BookingViewSchema,
    status: 201,
  }),
  offer: endpoint({
    method: 'post',
    path: '/api/windows/offer',
    access: STAFF,
    summary: 'Offer a window to standby clients by SMS and e-mail',
    body: OfferWindowSchema,
    response: OfferWindowResultSchema,
    status: 201,
  }),
};

/** A window offer as its link opens it: anyone holding the token may read it and take the time. */
export const offersApi = {
  view: endpoint({
    method: 'get',
    path: '/api/offers/:token',
    access: 'public',
    summary: 'A window offer as its link shows it',
    params: OfferTokenParamsSchema,
    response: OfferViewSchema,
  }),
  accept: endpoint({
    method: 'post',
    path: '/api/offers/:token/accept',
    access: 'public',
    summary: 'Take an offered window (first to accept wins)',
    params: OfferTokenParamsSchema,
    response: OfferViewSchema,
  }),
};
