import type { QueryClient } from '@tanstack/react-query';
import type { Endpoint } from '../../shared/api/endpoint';
import { clientsApi } from '../../shared/api/clients.api';
import { consultationsApi } from '../../shared/api/consultations.api';
import { hairHistoryApi } from '../../shared/api/hair-history.api';
import { mixLogsApi } from '../../shared/api/mix-logs.api';
import { photosApi } from '../../shared/api/photos.api';
import { testRecordsApi } from '../../shared/api/test-records.api';
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
