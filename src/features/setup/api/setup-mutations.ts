import { useMutation, useQueryClient } from '@tanstack/react-query';
import { setupApi } from '@shared/api/setup.api';
import type { SalonSettings } from '@shared/schemas/salon-settings.schemas';
import type { OutOfServiceInput, ServiceInput, StaffDetails, StaffInvite, TimeOffInput, UnitKind } from '@shared/schemas/setup.schemas';
import { callApi } from '@client/lib/api-client';
import { setupChanged } from '@client/lib/cache-rules';

/** A set-up write; what it makes stale is the set-up cache rule's to say. */
function useSetupWrite<V, R>(write: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: write, onSuccess: () => setupChanged(queryClient) });
}

export const useSaveSalonSettings = () => useSetupWrite((body: SalonSettings) => callApi(setupApi.saveSalon, { body }));

export const useInviteStaff = () => useSetupWrite((body: StaffInvite) => callApi(setupApi.inviteStaff, { body }));
export const useSaveStaff = () => useSetupWrite(({ id, body }: { id: string; body: StaffDetails }) => callApi(setupApi.saveStaff, { params: { id }, body }));
export const useAddTimeOff = () => useSetupWrite(({ id, body }: { id: string; body: TimeOffInput }) => callApi(setupApi.addTimeOff, { params: { id }, body }));
export const useRemoveTimeOff = () =>
  useSetupWrite(({ id, entryId }: { id: string; entryId: string }) => callApi(setupApi.removeTimeOff, { params: { id, entryId } }));
export const useReassign = () =>
  useSetupWrite(({ id, bookingId, toStaffId }: { id: string; bookingId: string; toStaffId: string }) =>
    callApi(setupApi.reassign, { params: { id }, body: { bookingId, toStaffId } }),
  );
export const useDeactivateStaff = () => useSetupWrite((id: string) => callApi(setupApi.deactivateStaff, { params: { id } }));

export const useAddUnit = () =>
  useSetupWrite(({ kind, name }: { kind: UnitKind; name: string }) => callApi(setupApi.addUnit, { params: { kind }, body: { name } }));
export const useRenameUnit = () =>
  useSetupWrite(({ kind, id, name }: { kind: UnitKind; id: string; name: string }) => callApi(setupApi.renameUnit, { params: { kind, id }, body: { name } }));
export const useTakeOutOfService = () =>
  useSetupWrite(({ kind, id, body }: { kind: UnitKind; id: string; body: OutOfServiceInput }) =>
    callApi(setupApi.takeOutOfService, { params: { kind, id }, body }),
  );
export const useBackInService = () =>
  useSetupWrite(({ kind, id, entryId }: { kind: UnitKind; id: string; entryId: string }) => callApi(setupApi.backInService, { params: { kind, id, entryId } }));

export const useSaveService = () =>
  useSetupWrite(({ id, body }: { id: string | null; body: ServiceInput }) =>
    id ? callApi(setupApi.saveService, { params: { id }, body }) : callApi(setupApi.addService, { body }),
  );
export const useRetireService = () => useSetupWrite((id: string) => callApi(setupApi.retireService, { params: { id } }));
