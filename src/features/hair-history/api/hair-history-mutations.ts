import { useMutation, useQueryClient } from '@tanstack/react-query';
import { hairHistoryApi } from '@shared/api/hair-history.api';
import type { HairHistory, HairHistoryResponse } from '@shared/schemas/hair-history.schemas';
import { callApi } from '@client/lib/api-client';
import { hairHistoryChanged } from '@client/lib/cache-rules';
import type { RecordOwner } from '@client/lib/record-owner';
import { hairHistoryQueries } from './hair-history-queries';

export function useSaveHairHistory(owner: RecordOwner) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (answers: HairHistory): Promise<HairHistoryResponse> =>
      owner === 'me'
        ? callApi(hairHistoryApi.saveMine, { body: answers })
        : callApi(hairHistoryApi.saveOfClient, { params: { id: owner.clientId }, body: answers }),
    onSuccess: (saved) => {
      queryClient.setQueryData(hairHistoryQueries.detail(owner).queryKey, saved);
      // The same record may be cached under the client's id too (staff view); refresh every copy.
      return hairHistoryChanged(queryClient);
    },
  });
}
