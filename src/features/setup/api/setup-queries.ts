import { setupApi } from '@shared/api/setup.api';
import type { UnitKind } from '@shared/schemas/setup.schemas';
import { apiQuery } from '@client/lib/api-client';

export const setupQueries = {
  salon: () => apiQuery(setupApi.salon),
  staff: () => apiQuery(setupApi.staff),
  staffBookings: (id: string) => apiQuery(setupApi.staffBookings, { params: { id } }),
  units: () => apiQuery(setupApi.units),
  unitAffected: (kind: UnitKind, id: string, from: string, to: string) => apiQuery(setupApi.unitAffected, { params: { kind, id }, query: { from, to } }),
  services: () => apiQuery(setupApi.services),
};
