import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiPaths } from '../../../../shared/api/api-paths';
import { ClientAgeSchema, type RecordGuardianConsentSchema } from '../../../../shared/schemas/age.schemas';
import { apiGet, apiWrite } from '../../../lib/api-client';

/** Whose age record: the signed-in client's own ('me'), or a client of the salon by id (staff). */
export type AgeOwner = 'me' | { clientId: string };

export const ageQueries = {
  all: () => ['client-age'] as const,
  detail: (owner: AgeOwner) =>
    queryOptions({
      queryKey: [...ageQueries.all(), owner === 'me' ? 'me' : owner.clientId] as const,
      queryFn: () => apiGet(owner === 'me' ? apiPaths.myAge : apiPaths.clientAge(owner.clientId), ClientAgeSchema),
    }),
};

export function useSetDateOfBirth(owner: AgeOwner) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (dateOfBirth: string | null) =>
      apiWrite('PUT', owner === 'me' ? apiPaths.myDateOfBirth : apiPaths.clientDateOfBirth(owner.clientId), { dateOfBirth }, ClientAgeSchema),
    onSuccess: (saved) => queryClient.setQueryData(ageQueries.detail(owner).queryKey, saved),
  });
}

export function useRecordGuardianConsent(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof RecordGuardianConsentSchema>) => apiWrite('POST', apiPaths.guardianConsents(clientId), body, ClientAgeSchema),
    onSuccess: (saved) => queryClient.setQueryData(ageQueries.detail({ clientId }).queryKey, saved),
  });
}
