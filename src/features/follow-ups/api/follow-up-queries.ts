import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { followUpRulesApi } from '@shared/api/follow-up-rules.api';
import type { FollowUpRuleBodySchema } from '@shared/schemas/follow-up-rules.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';
import { followUpRulesChanged } from '@client/lib/cache-rules';

export const followUpQueries = {
  list: () => apiQuery(followUpRulesApi.list),
};

type Body = z.output<typeof FollowUpRuleBodySchema>;

/** Adds a rule, or changes the one with `id`. */
export function useSaveFollowUpRule(id: string | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Body) => (id ? callApi(followUpRulesApi.change, { params: { id }, body }) : callApi(followUpRulesApi.add, { body })),
    onSuccess: () => followUpRulesChanged(queryClient),
  });
}

export function useRemoveFollowUpRule() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => callApi(followUpRulesApi.remove, { params: { id } }),
    onSuccess: () => followUpRulesChanged(queryClient),
  });
}
