import type { QueryClient } from '@tanstack/react-query';
import type { Endpoint } from '../../shared/api/endpoint';
import { bookingsApi } from '../../shared/api/bookings.api';
import { onlineBookingApi } from '../../shared/api/online-booking.api';
import { photosApi } from '../../shared/api/photos.api';
import type { BookingView } from '../../shared/schemas/booking-view.schemas';
import type { Hold } from '../../shared/schemas/online-booking.schemas';
import { apiKey } from './api-client';

/*
 * What a write makes stale, in one place. Every cached answer is keyed by its endpoint
 * (`['api', path, params, query]`, see apiKey), so a rule names endpoints, never another feature's
 * key factory; features call these after their writes instead of invalidating each other's caches.
 */

/** Every cached answer of these endpoints, whatever their params and query. */
export function refreshEndpoints(queryClient: QueryClient, endpoints: readonly Endpoint[]): Promise<unknown> {
  return Promise.all(endpoints.map((e) => queryClient.invalidateQueries({ queryKey: apiKey(e).slice(0, 2) })));
}

/** The cached answers of these endpoints about one record (their `:id` param), whatever their query. */
export function refreshRecord(queryClient: QueryClient, endpoints: readonly Endpoint[], id: string): Promise<unknown> {
  return Promise.all(endpoints.map((e) => queryClient.invalidateQueries({ queryKey: apiKey(e, { params: { id } }).slice(0, 3) })));
}

/** A photo was added or removed: every photo list (the client's own, and the team's view of them). */
export const photosChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [photosApi.mine, photosApi.ofClient]);

// ——— Bookings: the desk's changes to bookings, a client's own bookings, and held times online ———

/*
 * Reads of other areas that a booking write makes stale, still keyed by their own features' names: they become
 * `refreshEndpoints` / `refreshRecord` with their endpoints (the windows list, a client card) once those reads go
 * through their contracts.
 */
const windowsListKey = ['windows'] as const;
const clientCardKey = (clientId: string) => ['clients', 'detail', clientId] as const;

/**
 * A booking was written at the desk (booked, moved, re-planned, cancelled, or booked into a window): its own page
 * gets the server's answer, and every view whose times it may touch is read again — its history and free times to
 * move to, the days and weeks of the book (a move can change dates, so all of them), and the hands-free windows.
 */
export function bookingChanged(queryClient: QueryClient, booking: BookingView): Promise<unknown> {
  queryClient.setQueryData(apiKey(bookingsApi.one, { params: { id: booking.id } }), booking);
  return Promise.all([
    refreshRecord(queryClient, [bookingsApi.history, bookingsApi.moveTimes], booking.id),
    refreshEndpoints(queryClient, [bookingsApi.deskDay, bookingsApi.stylistDay, bookingsApi.deskWeek]),
    queryClient.invalidateQueries({ queryKey: windowsListKey }),
  ]);
}

/** A new booking at the desk: as any change, and the client's card lists it. */
export const bookingMade = (queryClient: QueryClient, booking: BookingView): Promise<unknown> =>
  Promise.all([bookingChanged(queryClient, booking), queryClient.invalidateQueries({ queryKey: clientCardKey(booking.client.id) })]);

/** A client cancelled or moved one of their own bookings: their list is read again. */
export const myBookingChanged = (queryClient: QueryClient): Promise<unknown> => refreshEndpoints(queryClient, [bookingsApi.mine]);

/** A time was just held: the hold's own read starts from the answer. */
export function timeHeld(queryClient: QueryClient, hold: Hold): void {
  queryClient.setQueryData(apiKey(onlineBookingApi.hold, { params: { id: hold.holdId } }), hold);
}

/** Someone took a free time meanwhile (409): every list of free times is stale. */
export const freeTimesTaken = (queryClient: QueryClient): Promise<unknown> => refreshEndpoints(queryClient, [onlineBookingApi.availability]);

/** The client holds a time already (made in another tab): their open holds are read again to show it. */
export const openHoldsChanged = (queryClient: QueryClient): Promise<unknown> => refreshEndpoints(queryClient, [onlineBookingApi.myHolds]);

/** A held time was released: the lists that showed it, and the free times it returns to. */
export const holdReleased = (queryClient: QueryClient): Promise<unknown> =>
  refreshEndpoints(queryClient, [onlineBookingApi.myHolds, onlineBookingApi.availability, bookingsApi.mine]);

/** A write found the hold lapsed: its cached state is read again so every step sees it. */
export const holdLapsed = (queryClient: QueryClient, holdId: string): Promise<unknown> => refreshRecord(queryClient, [onlineBookingApi.hold], holdId);
