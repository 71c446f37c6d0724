import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { testRecordsApi } from '@shared/api/test-records.api';
import type { RecordClearanceSchema, RecordSkinTestReading, RecordSkinTestSchema } from '@shared/schemas/skin-test.schemas';
import type { RecordStrandTest } from '@shared/schemas/strand-test.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';
import { skinTestsChanged, strandTestsChanged } from '@client/lib/cache-rules';

export const testRecordQueries = {
  skin: (clientId: string) => apiQuery(testRecordsApi.skinTests, { params: { id: clientId } }),
  strand: (clientId: string) => apiQuery(testRecordsApi.strandTests, { params: { id: clientId } }),
};

export function useRecordSkinTest(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof RecordSkinTestSchema>) => callApi(testRecordsApi.recordSkinTest, { params: { id: clientId }, body }),
    onSuccess: () => skinTestsChanged(queryClient),
  });
}

/** The owner's clearance of a positive skin test. */
export function useRecordClearance(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof RecordClearanceSchema>) => callApi(testRecordsApi.recordClearance, { params: { id: clientId }, body }),
    onSuccess: () => skinTestsChanged(queryClient),
  });
}

/** Records the reading of one pending skin test. */
export function useRecordSkinTestReading(clientId: string, testId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RecordSkinTestReading) => callApi(testRecordsApi.recordSkinTestReading, { params: { id: clientId, testId }, body }),
    onSuccess: () => skinTestsChanged(queryClient),
  });
}

export function useRecordStrandTest(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RecordStrandTest) => callApi(testRecordsApi.recordStrandTest, { params: { id: clientId }, body }),
    onSuccess: () => strandTestsChanged(queryClient, clientId),
  });
}
