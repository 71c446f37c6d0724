import { queryOptions } from '@tanstack/react-query';
import { setupPaths } from '../../../../shared/api/setup-paths';
import { SalonSettingsSchema } from '../../../../shared/schemas/salon-settings.schemas';
import { AffectedBookingListSchema, SetupServiceListSchema, StaffListSchema, UnitListSchema, type UnitKind } from '../../../../shared/schemas/setup.schemas';
import { apiGet } from '../../../lib/api-client';

export const setupQueries = {
  all: () => ['setup'] as const,
  salon: () => queryOptions({ queryKey: [...setupQueries.all(), 'salon'] as const, queryFn: () => apiGet(setupPaths.salon, SalonSettingsSchema) }),
  staff: () => queryOptions({ queryKey: [...setupQueries.all(), 'staff'] as const, queryFn: () => apiGet(setupPaths.staff, StaffListSchema) }),
  staffBookings: (id: string) =>
    queryOptions({ queryKey: [...setupQueries.all(), 'staff', id, 'bookings'] as const, queryFn: () => apiGet(setupPaths.staffBookings(id), AffectedBookingListSchema) }),
  units: () => queryOptions({ queryKey: [...setupQueries.all(), 'units'] as const, queryFn: () => apiGet(setupPaths.units, UnitListSchema) }),
  unitAffected: (kind: UnitKind, id: string, from: string, to: string) =>
    queryOptions({
      queryKey: [...setupQueries.all(), 'units', kind, id, from, to] as const,
      queryFn: () => apiGet(setupPaths.unitAffected(kind, id, from, to), AffectedBookingListSchema),
    }),
  services: () => queryOptions({ queryKey: [...setupQueries.all(), 'services'] as const, queryFn: () => apiGet(setupPaths.services, SetupServiceListSchema) }),
};
