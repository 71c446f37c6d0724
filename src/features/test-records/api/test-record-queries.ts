import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiPaths } from '../../../../shared/api/api-paths';
import { RecordClearanceSchema, RecordSkinTestSchema, SkinTestClearanceSchema, SkinTestListSchema, SkinTestSchema, type RecordSkinTestReading } from '../../../../shared/schemas/skin-test.schemas';
import { StrandTestListSchema, StrandTestSchema, type RecordStrandTest } from '../../../../shared/schemas/strand-test.schemas';
import { apiGet, apiWrite } from '../../../lib/api-client';

export const strandTestsPath = (clientId: string) => `/api/clients/${clientId}/strand-tests`;

export const testRecordQueries = {
  all: () => ['test-records'] as const,
  skin: (clientId: string) =>
    queryOptions({ queryKey: [...testRecordQueries.all(), 'skin', clientId] as const, queryFn: () => apiGet(apiPaths.skinTests(clientId), SkinTestListSchema) }),
  strand: (clientId: string) =>
    queryOptions({ queryKey: [...testRecordQueries.all(), 'strand', clientId] as const, queryFn: () => apiGet(strandTestsPath(clientId), StrandTestListSchema) }),
};

// A skin-test change can flag or clear any of the client's bookings (on every day and list they appear in), so
// everything cached is refreshed, not only the test list.
export function useRecordSkinTest(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof RecordSkinTestSchema>) => apiWrite('POST', apiPaths.skinTests(clientId), body, SkinTestSchema),
    onSuccess: () => queryClient.invalidateQueries(),
  });
}

/** The owner's clearance of a positive skin test. */
export function useRecordClearance(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof RecordClearanceSchema>) => apiWrite('POST', apiPaths.skinTestClearances(clientId), body, SkinTestClearanceSchema),
    onSuccess: () => queryClient.invalidateQueries(),
  });
}

/** Records the reading of one pending skin test. */
export function useRecordSkinTestReading(clientId: string, testId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RecordSkinTestReading) => apiWrite('POST', apiPaths.skinTestReading(clientId, testId), body, SkinTestSchema),
    onSuccess: () => queryClient.invalidateQueries(),
  });
}

export function useRecordStrandTest(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RecordStrandTest) => apiWrite('POST', strandTestsPath(clientId), body, StrandTestSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: testRecordQueries.strand(clientId).queryKey }),
  });
}
