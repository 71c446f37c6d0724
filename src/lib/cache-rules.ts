import type { QueryClient } from '@tanstack/react-query';
import type { Endpoint } from '../../shared/api/endpoint';
import { photosApi } from '../../shared/api/photos.api';
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
