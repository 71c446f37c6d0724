import { useQuery } from '@tanstack/react-query';
import { typicalMinutesApi } from '@shared/api/typical-minutes.api';
import type { TypicalMinutes } from '@shared/schemas/typical-minutes.schemas';
import { apiQuery } from '@client/lib/api-client';
import { sessionQueries } from '@client/features/auth';

// Actual minutes move only as sittings finish: a few minutes old is fresh enough for a suggestion.
const FIVE_MINUTES = 5 * 60_000;

export const typicalMinutesQueries = {
  forService: (serviceId: string, stylistId?: string) => ({
    ...apiQuery(typicalMinutesApi.forService, { params: { id: serviceId }, query: { stylistId } }),
    staleTime: FIVE_MINUTES,
  }),
};

/**
 * A service's typical actual minutes for the owner or a stylist (a stylist's come for themselves); undefined for the
 * desk, which the API refuses, for no service yet, and while loading. A suggestion that fails to load is left out.
 */
export function useTypicalMinutes(serviceId: string | null | undefined, stylistId?: string): TypicalMinutes | undefined {
  const { data: user } = useQuery(sessionQueries.current());
  const allowed = user?.role === 'owner' || user?.role === 'stylist';
  const { data } = useQuery({ ...typicalMinutesQueries.forService(serviceId ?? '', stylistId), enabled: allowed && Boolean(serviceId) });
  return data;
}
