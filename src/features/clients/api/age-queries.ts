import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { clientsApi } from '@shared/api/clients.api';
import type { ClientAge, RecordGuardianConsentSchema } from '@shared/schemas/age.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';
import type { RecordOwner } from '@client/lib/record-owner';

export const ageQueries = {
  detail: (owner: RecordOwner) => (owner === 'me' ? apiQuery(clientsApi.myAge) : apiQuery(clientsApi.age, { params: { id: owner.clientId } })),
};

export function useSetDateOfBirth(owner: RecordOwner) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (dateOfBirth: string | null): Promise<ClientAge> =>
      owner === 'me'
        ? callApi(clientsApi.setMyDateOfBirth, { body: { dateOfBirth } })
        : callApi(clientsApi.setDateOfBirth, { params: { id: owner.clientId }, body: { dateOfBirth } }),
    onSuccess: (saved) => queryClient.setQueryData(ageQueries.detail(owner).queryKey, saved),
  });
}

export function useRecordGuardianConsent(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof RecordGuardianConsentSchema>) => callApi(clientsApi.addGuardianConsent, { params: { id: clientId }, body }),
    onSuccess: (saved) => queryClient.setQueryData(ageQueries.detail({ clientId }).queryKey, saved),
  });
}
