import { useMutation, useQueryClient } from '@tanstack/react-query';
import { setupPaths } from '../../../../shared/api/setup-paths';
import { SalonSettingsSchema, type SalonSettings } from '../../../../shared/schemas/salon-settings.schemas';
import {
  AffectedBookingListSchema,
  SetupServiceSchema,
  StaffMemberSchema,
  UnitListSchema,
  type OutOfServiceInput,
  type ServiceInput,
  type StaffDetails,
  type StaffInvite,
  type TimeOffInput,
  type UnitKind,
} from '../../../../shared/schemas/setup.schemas';
import { apiWrite } from '../../../lib/api-client';

/**
 * A set-up write. How the salon works feeds the menu, the stylists, free times and the book itself,
 * so every cached answer is refreshed afterwards rather than guessing which ones changed.
 */
function useSetupWrite<V, R>(write: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: write, onSuccess: () => queryClient.invalidateQueries() });
}

export const useSaveSalonSettings = () => useSetupWrite((body: SalonSettings) => apiWrite('PUT', setupPaths.salon, body, SalonSettingsSchema));

export const useInviteStaff = () => useSetupWrite((body: StaffInvite) => apiWrite('POST', setupPaths.staff, body, StaffMemberSchema));
export const useSaveStaff = () =>
  useSetupWrite(({ id, body }: { id: string; body: StaffDetails }) => apiWrite('PUT', setupPaths.staffMember(id), body, StaffMemberSchema));
export const useAddTimeOff = () =>
  useSetupWrite(({ id, body }: { id: string; body: TimeOffInput }) => apiWrite('POST', setupPaths.staffTimeOff(id), body, StaffMemberSchema));
export const useRemoveTimeOff = () => useSetupWrite(({ id, entryId }: { id: string; entryId: string }) => apiWrite('DELETE', setupPaths.staffTimeOffEntry(id, entryId)));
export const useReassign = () =>
  useSetupWrite(({ id, bookingId, toStaffId }: { id: string; bookingId: string; toStaffId: string }) =>
    apiWrite('POST', setupPaths.staffReassign(id), { bookingId, toStaffId }, AffectedBookingListSchema),
  );
export const useDeactivateStaff = () => useSetupWrite((id: string) => apiWrite('POST', setupPaths.staffDeactivate(id), undefined, StaffMemberSchema));

export const useAddUnit = () => useSetupWrite(({ kind, name }: { kind: UnitKind; name: string }) => apiWrite('POST', setupPaths.unitsOf(kind), { name }, UnitListSchema));
export const useRenameUnit = () =>
  useSetupWrite(({ kind, id, name }: { kind: UnitKind; id: string; name: string }) => apiWrite('PUT', setupPaths.unit(kind, id), { name }, UnitListSchema));
export const useTakeOutOfService = () =>
  useSetupWrite(({ kind, id, body }: { kind: UnitKind; id: string; body: OutOfServiceInput }) =>
    apiWrite('POST', setupPaths.unitOutOfService(kind, id), body, AffectedBookingListSchema),
  );
export const useBackInService = () =>
  useSetupWrite(({ kind, id, entryId }: { kind: UnitKind; id: string; entryId: string }) => apiWrite('DELETE', `${setupPaths.unitOutOfService(kind, id)}/${entryId}`));

export const useSaveService = () =>
  useSetupWrite(({ id, body }: { id: string | null; body: ServiceInput }) =>
    id ? apiWrite('PUT', setupPaths.service(id), body, SetupServiceSchema) : apiWrite('POST', setupPaths.services, body, SetupServiceSchema),
  );
export const useRetireService = () => useSetupWrite((id: string) => apiWrite('DELETE', setupPaths.service(id)));
