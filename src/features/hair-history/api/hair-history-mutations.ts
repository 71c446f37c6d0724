import { useMutation, useQueryClient } from '@tanstack/react-query';
import { HairHistoryResponseSchema, type HairHistory } from '../../../../shared/schemas/hair-history.schemas';
import { apiWrite } from '../../../lib/api-client';
import { hairHistoryQueries, historyPath, type HistoryOwner } from './hair-history-queries';

export function useSaveHairHistory(owner: HistoryOwner) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (answers: HairHistory) => apiWrite('PUT', historyPath(owner), answers, HairHistoryResponseSchema),
    onSuccess: (saved) => {
      queryClient.setQueryData(hairHistoryQueries.detail(owner).queryKey, saved);
      // The same record may be cached under the client's id too (staff view); refresh every copy.
      return queryClient.invalidateQueries({ queryKey: hairHistoryQueries.all() });
    },
  });
}
