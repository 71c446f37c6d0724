import type { QueryClient } from '@tanstack/react-query';
import type { Endpoint } from '../../shared/api/endpoint';
import { followUpRulesApi } from '../../shared/api/follow-up-rules.api';
import { messagesApi } from '../../shared/api/messages.api';
import { photosApi } from '../../shared/api/photos.api';
import { sessionApi } from '../../shared/api/session.api';
import type { SessionUser } from '../../shared/schemas/auth.schemas';
import type { MyPreferences } from '../../shared/schemas/contact.schemas';
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

/** A follow-up rule was added, changed or removed. */
export const followUpRulesChanged = (queryClient: QueryClient) => refreshEndpoints(queryClient, [followUpRulesApi.list]);

/** A text reached the salon's number (the demo's simulated one): STOP/START changes clients, their messages and the send log. */
export const inboundSmsReceived = (queryClient: QueryClient) => queryClient.invalidateQueries();

/** A client saved how the salon reaches them; the answer is the saved preferences. */
export function myPreferencesSaved(queryClient: QueryClient, saved: MyPreferences): void {
  queryClient.setQueryData(apiKey(messagesApi.myPreferences), saved);
}
