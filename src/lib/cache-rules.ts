import type { QueryClient } from '@tanstack/react-query';
import type { Answer, Endpoint } from '../../shared/api/endpoint';
import { photosApi } from '../../shared/api/photos.api';
import { standbyApi } from '../../shared/api/standby.api';
import { offersApi, windowsApi } from '../../shared/api/windows.api';
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

/* Hands-free time: windows, the standby list and window offers. */

/** The hands-free windows of any day may have opened or closed (a booking was written, an offer went out). */
export const windowsChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [windowsApi.list]);

/** The standby list changed; the windows list the standby clients who want them, so they change with it. */
export const standbyChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [standbyApi.list, windowsApi.list]);

/**
 * A window was filled: the new booking sits in the day and week views (desk and stylist), the windows
 * change, and a standby client who got the time leaves the list.
 */
export function windowFilled(queryClient: QueryClient, { standbyClosed }: { standbyClosed: boolean }): Promise<unknown> {
  return Promise.all([refreshEndpoints(queryClient, standbyClosed ? [windowsApi.list, standbyApi.list] : [windowsApi.list]), refreshBookViews(queryClient)]);
}

// The day and week views belong to the bookings area, whose contracts are not written yet, so they are
// matched by path: every cached answer under the desk's and the stylist's paths (day, week, utilisation).
// merge: once bookingChanged(queryClient, booking) exists here, windowFilled calls it instead (it also
// seeds the new booking's own page), and the hand-written ['day'] and ['week'] roots go with their factories.
const BOOK_VIEW_PREFIXES = ['/api/desk/', '/api/stylist/'];
const LEGACY_BOOK_VIEW_ROOTS = ['day', 'week'];

function refreshBookViews(queryClient: QueryClient): Promise<unknown> {
  return queryClient.invalidateQueries({
    predicate: ({ queryKey: [root, path] }) =>
      (root === 'api' && typeof path === 'string' && BOOK_VIEW_PREFIXES.some((prefix) => path.startsWith(prefix))) ||
      LEGACY_BOOK_VIEW_ROOTS.includes(String(root)),
  });
}

/** An offer was taken through its link: its page shows the answer (taken) without asking again. */
export const offerTaken = (queryClient: QueryClient, token: string, offer: Answer<typeof offersApi.accept>) =>
  queryClient.setQueryData(apiKey(offersApi.view, { params: { token } }), offer);

/** Taking an offer was refused (gone or run out meanwhile): read the offer's real state. */
export const offerRefused = (queryClient: QueryClient, token: string) => queryClient.invalidateQueries({ queryKey: apiKey(offersApi.view, { params: { token } }) });
