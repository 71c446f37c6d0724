import type { QueryClient } from '@tanstack/react-query';
import { bookingsApi } from '@shared/api/bookings.api';
import { clientsApi } from '@shared/api/clients.api';
import { consultationsApi } from '@shared/api/consultations.api';
import { deskCheckoutApi } from '@shared/api/desk-checkout.api';
import type { Answer, Endpoint } from '@shared/api/endpoint';
import { followUpRulesApi } from '@shared/api/follow-up-rules.api';
import { hairHistoryApi } from '@shared/api/hair-history.api';
import { mailboxApi } from '@shared/api/mailbox.api';
import { messagesApi } from '@shared/api/messages.api';
import { mixLogsApi } from '@shared/api/mix-logs.api';
import { onlineBookingApi } from '@shared/api/online-booking.api';
import { paymentsApi } from '@shared/api/payments.api';
import { photosApi } from '@shared/api/photos.api';
import { replanApi } from '@shared/api/replan.api';
import { retailProductsApi } from '@shared/api/retail-products.api';
import { sessionApi } from '@shared/api/session.api';
import { standbyApi } from '@shared/api/standby.api';
import { testRecordsApi } from '@shared/api/test-records.api';
import { offersApi, windowsApi } from '@shared/api/windows.api';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import type { MyPreferences } from '@shared/schemas/contact.schemas';
import type { BookChangedEvent } from '@shared/schemas/live-events.schemas';
import type { Hold } from '@shared/schemas/online-booking.schemas';
import type { BookingPayments, DepositDetails } from '@shared/schemas/payments.schemas';
import type { Takings } from '@shared/schemas/takings.schemas';
import { takingsApi } from '@shared/api/takings.api';
import type { DeskCheckout } from '@shared/schemas/desk-checkout.schemas';
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

/** The days and weeks of the book, as the desk and the stylists read them. */
const BOOK_VIEWS = [bookingsApi.deskDay, bookingsApi.stylistDay, bookingsApi.deskWeek];

// ——— Bookings: the desk's changes to bookings, a client's own bookings, and held times online ———

/**
 * A booking was written at the desk (booked, moved, re-planned, cancelled, or booked into a window): its own page
 * gets the server's answer, and every view whose times it may touch is read again — its history and free times to
 * move to, the days and weeks of the book (a move can change dates, so all of them), and the hands-free windows.
 */
export function bookingChanged(queryClient: QueryClient, booking: BookingView): Promise<unknown> {
  queryClient.setQueryData(apiKey(bookingsApi.one, { params: { id: booking.id } }), booking);
  return Promise.all([
    refreshRecord(queryClient, [bookingsApi.history, bookingsApi.moveTimes], booking.id),
    refreshEndpoints(queryClient, [...BOOK_VIEWS, windowsApi.list, bookingsApi.options]),
  ]);
}

/** A new booking at the desk: as any change, and the client's card lists it. */
export const bookingMade = (queryClient: QueryClient, booking: BookingView): Promise<unknown> =>
  Promise.all([bookingChanged(queryClient, booking), refreshRecord(queryClient, [clientsApi.one], booking.client.id)]);

/** A client cancelled or moved one of their own bookings: their list is read again. */
export const myBookingChanged = (queryClient: QueryClient): Promise<unknown> => refreshEndpoints(queryClient, [bookingsApi.mine]);

/** A time was just held: the hold's own read starts from the answer. */
export function timeHeld(queryClient: QueryClient, hold: Hold): void {
  queryClient.setQueryData(apiKey(onlineBookingApi.hold, { params: { id: hold.holdId } }), hold);
}

/** Someone took a free time meanwhile (409): every list of free times, online and at the desk, is stale. */
export const freeTimesTaken = (queryClient: QueryClient): Promise<unknown> =>
  refreshEndpoints(queryClient, [onlineBookingApi.availability, bookingsApi.options]);

/** The client holds a time already (made in another tab): their open holds are read again to show it. */
export const openHoldsChanged = (queryClient: QueryClient): Promise<unknown> => refreshEndpoints(queryClient, [onlineBookingApi.myHolds]);

/** A held time was released: the lists that showed it, and the free times it returns to. */
export const holdReleased = (queryClient: QueryClient): Promise<unknown> =>
  refreshEndpoints(queryClient, [onlineBookingApi.myHolds, onlineBookingApi.availability, bookingsApi.mine]);

/** A write found the hold lapsed: its cached state is read again so every step sees it. */
export const holdLapsed = (queryClient: QueryClient, holdId: string): Promise<unknown> => refreshRecord(queryClient, [onlineBookingApi.hold], holdId);

// ——— Deposits: taken at the desk, asked for by a link ———

/**
 * A booking's deposit changed at the desk (taken, or a request sent): its panel gets the answer; the booking's page,
 * the days and weeks of the book and the client's card show where the deposit stands, so they are read again.
 */
export function depositChanged(queryClient: QueryClient, details: DepositDetails): Promise<unknown> {
  queryClient.setQueryData(apiKey(paymentsApi.deposit, { params: { id: details.bookingId } }), details);
  return Promise.all([
    refreshRecord(queryClient, [bookingsApi.one, bookingsApi.history], details.bookingId),
    refreshEndpoints(queryClient, [...BOOK_VIEWS, clientsApi.one, ...SENT]),
  ]);
}

/**
 * A refund was made at the desk: the booking's money gets the server's answer; its deposit, page and history, the
 * views that show deposits, the day's takings and the send log (the client is told) are read again.
 */
export function refundMade(queryClient: QueryClient, money: BookingPayments): Promise<unknown> {
  queryClient.setQueryData(apiKey(paymentsApi.payments, { params: { id: money.bookingId } }), money);
  return Promise.all([
    refreshRecord(queryClient, [bookingsApi.one, bookingsApi.history, paymentsApi.deposit], money.bookingId),
    refreshEndpoints(queryClient, [...BOOK_VIEWS, clientsApi.one, takingsApi.day, ...SENT]),
  ]);
}

/** A day was closed or reopened: that day's takings are the server's answer. */
export function dayCloseChanged(queryClient: QueryClient, takings: Takings): void {
  queryClient.setQueryData(apiKey(takingsApi.day, { query: { date: takings.date } }), takings);
}

/** A visit checked out (or its card part paid): the booking's status, its deposit, the book, the receipt e-mail. */
export function checkoutChanged(queryClient: QueryClient, checkout: DeskCheckout): Promise<unknown> {
  queryClient.setQueryData(apiKey(deskCheckoutApi.view, { params: { id: checkout.bookingId } }), checkout);
  return Promise.all([
    refreshRecord(queryClient, [bookingsApi.one, bookingsApi.history, paymentsApi.deposit, paymentsApi.payments], checkout.bookingId),
    refreshEndpoints(queryClient, [...BOOK_VIEWS, clientsApi.one, retailProductsApi.list, takingsApi.day, ...SENT]),
  ]);
}

/** Views of one date (`?date=`; today when it is left out). */
const DAY_VIEWS = [bookingsApi.deskDay, bookingsApi.stylistDay, windowsApi.list, replanApi.dayConflicts, replanApi.stylistDayRun];
/** A booking's own page and what it opens. */
const BOOKING_PAGES = [bookingsApi.one, bookingsApi.history, bookingsApi.cancelTerms, paymentsApi.deposit, paymentsApi.payments];
/** What a change of the book may send or queue: the send log and the Outbox of the local fakes. */
const SENT = [messagesApi.sendLog, mailboxApi.mail, mailboxApi.sms];

/**
 * Someone else changed the book (a live update, src/lib/live-book.ts), or this screen was out of touch and catches
 * up (`everyDate`): the day views of the dates it names (and today's), the weeks that hold one of them, the pages of
 * the bookings it names, free times to book or move to, and the send log. A change that reaches every date refreshes
 * all of these. Only screens on show fetch again; the rest are read afresh when next opened.
 */
export function bookChangedElsewhere(queryClient: QueryClient, change: BookChangedEvent): Promise<unknown> {
  const freeTimes = [bookingsApi.options, bookingsApi.moveTimes];
  if (change.everyDate) return refreshEndpoints(queryClient, [...BOOK_VIEWS, ...DAY_VIEWS, ...BOOKING_PAGES, ...freeTimes, ...SENT]);
  const dayPaths = new Set<string>(DAY_VIEWS.map((e) => e.path));
  const touches = (date: string | undefined) => date === undefined || change.dates.includes(date);
  return Promise.all([
    queryClient.invalidateQueries({
      predicate: ({ queryKey, state }) => {
        const [root, path, , query] = queryKey as readonly [unknown, string, unknown, { date?: string } | undefined];
        if (root !== 'api') return false;
        if (dayPaths.has(path)) return touches(query?.date);
        if (path !== bookingsApi.deskWeek.path) return false;
        const week = state.data as { from: string; to: string } | undefined;
        return !week || change.dates.some((date) => date >= week.from && date < week.to);
      },
    }),
    ...change.bookingIds.map((id) => refreshRecord(queryClient, BOOKING_PAGES, id)),
    refreshEndpoints(queryClient, [...freeTimes, ...SENT]),
  ]);
}

// ——— Running the day: arrivals, no-shows, step taps and their undo ———

/**
 * A sitting was tapped (arrived, a no-show, a step started or finished, an undo): its booking's page and history,
 * and every day and week of the book, which show statuses and actual times; a no-show or an early finish frees time
 * for windows, and an actual time re-plans the day (the desk's "Running late", My day's times).
 */
export const sittingTapped = (queryClient: QueryClient, bookingId: string): Promise<unknown> =>
  Promise.all([
    refreshRecord(queryClient, [bookingsApi.one, bookingsApi.history], bookingId),
    refreshEndpoints(queryClient, [...BOOK_VIEWS, windowsApi.list, replanApi.dayConflicts, replanApi.stylistDayRun]),
  ]);

// ——— Running late: fixes from the re-plan, and telling a later client ———

/**
 * A fix was applied: the day's conflicts are the answer's, and the fix changed a booking like any desk change (its
 * page and history, the days and weeks, windows, free times) and may have queued a message (the send log).
 */
export function replanFixApplied(queryClient: QueryClient, bookingId: string, day: Answer<typeof replanApi.dayConflicts>): Promise<unknown> {
  queryClient.setQueryData(apiKey(replanApi.dayConflicts, { query: { date: day.date } }), day);
  return Promise.all([
    refreshRecord(queryClient, [...BOOKING_PAGES, bookingsApi.moveTimes], bookingId),
    refreshEndpoints(queryClient, [...BOOK_VIEWS, windowsApi.list, bookingsApi.options, replanApi.stylistDayRun, ...SENT]),
  ]);
}

/** A later client was told of a delay: the conflicts show who was told, and the send log has the message. */
export const runningLateTold = (queryClient: QueryClient): Promise<unknown> => refreshEndpoints(queryClient, [replanApi.dayConflicts, ...SENT]);

/* Hands-free time: windows, the standby list and window offers. */

/** The hands-free windows of any day may have opened or closed (a booking was written, an offer went out). */
export const windowsChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [windowsApi.list]);

/** The standby list changed; the windows list the standby clients who want them, so they change with it. */
export const standbyChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [standbyApi.list, windowsApi.list]);

/**
 * A window was filled: the new booking is written like any other (its page, the days and weeks, the
 * windows), and a standby client who got the time leaves the list.
 */
export function windowFilled(queryClient: QueryClient, booking: BookingView, { standbyClosed }: { standbyClosed: boolean }): Promise<unknown> {
  return Promise.all([bookingChanged(queryClient, booking), standbyClosed && refreshEndpoints(queryClient, [standbyApi.list])]);
}

/** An offer was taken through its link: its page shows the answer (taken) without asking again. */
export const offerTaken = (queryClient: QueryClient, token: string, offer: Answer<typeof offersApi.accept>) =>
  queryClient.setQueryData(apiKey(offersApi.view, { params: { token } }), offer);

/** Taking an offer was refused (gone or run out meanwhile): read the offer's real state. */
export const offerRefused = (queryClient: QueryClient, token: string) =>
  queryClient.invalidateQueries({ queryKey: apiKey(offersApi.view, { params: { token } }) });

// Salon running: the session, the salon's set-up, follow-up rules and messages.

/** Someone signed in, up or out: nothing cached for the previous person may show; the session answer is known. */
export function sessionStarted(queryClient: QueryClient, user: SessionUser | null): void {
  queryClient.removeQueries({ predicate: (query) => query.meta?.isSession !== true });
  queryClient.setQueryData(apiKey(sessionApi.current), user);
}

/**
 * The owner changed the set-up. How the salon works feeds the menu, the stylists, free times and the book
 * itself, so every cached answer is refreshed rather than guessing which ones changed.
 */
export const setupChanged = (queryClient: QueryClient) => queryClient.invalidateQueries();

/** A retail product was added or changed, or a count refused because a sale moved the stock: the product list. */
export const retailProductsChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [retailProductsApi.list]);

/** A follow-up rule was added, changed or removed. */
export const followUpRulesChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [followUpRulesApi.list]);

/** A text reached the salon's number (the demo's simulated one): STOP/START changes clients, their messages and the send log. */
export const inboundSmsReceived = (queryClient: QueryClient) => queryClient.invalidateQueries();

/** A client saved how the salon reaches them; the answer is the saved preferences. */
export function myPreferencesSaved(queryClient: QueryClient, saved: MyPreferences): void {
  queryClient.setQueryData(apiKey(messagesApi.myPreferences), saved);
}

// ---- Client records: clients, their age, hair history, test records, consultations and quotes, mix logs ----

/** A client was added: every client search (a new client can match any of them). */
export const clientAdded = (queryClient: QueryClient) => refreshEndpoints(queryClient, [clientsApi.list]);

/** A client's card changed (contact details, preferences, their bookings): the card and every search that may show them. */
export const clientChanged = (queryClient: QueryClient, clientId: string) =>
  Promise.all([refreshEndpoints(queryClient, [clientsApi.list]), refreshRecord(queryClient, [clientsApi.one], clientId)]);

/** A hair history was saved: every copy (the client's own, and the team's under the client's id). */
export const hairHistoryChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [hairHistoryApi.mine, hairHistoryApi.ofClient]);

/**
 * A skin test, its reading or a clearance was recorded: it can flag or clear any of the client's bookings, on every
 * day and list they appear in, so everything cached is refreshed, not only the test list.
 */
export const skinTestsChanged = (queryClient: QueryClient) => queryClient.invalidateQueries();

/** A strand test was recorded: the client's strand tests. */
export const strandTestsChanged = (queryClient: QueryClient, clientId: string) => refreshRecord(queryClient, [testRecordsApi.strandTests], clientId);

/** A consultation was recorded: every consultation list and view. */
export const consultationsChanged = (queryClient: QueryClient) =>
  refreshEndpoints(queryClient, [consultationsApi.ofClient, consultationsApi.one, consultationsApi.myQuotes]);

/** A quote was edited: the list of its client's consultations (the view itself is answered by the write). */
export const quoteEdited = (queryClient: QueryClient, clientId: string) => refreshRecord(queryClient, [consultationsApi.ofClient], clientId);

/** The signed-in client accepted a quote: their quotes. */
export const myQuotesChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [consultationsApi.myQuotes]);

/** Bowls were written into a booking's mix log. */
export const mixLogChanged = (queryClient: QueryClient, bookingId: string) => refreshRecord(queryClient, [mixLogsApi.list], bookingId);
