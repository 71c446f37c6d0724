import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import {
  FollowUpRuleSchema, FollowUpRulesSchema, followUpRulePath, followUpRulesPath, type FollowUpRuleBodySchema,
} from '../../../../shared/schemas/follow-up-rules.schemas';
import { apiGet, apiWrite } from '../../../lib/api-client';

export const followUpQueries = {
  all: () => ['follow-up-rules'] as const,
  list: () => queryOptions({ queryKey: followUpQueries.all(), queryFn: () => apiGet(followUpRulesPath, FollowUpRulesSchema) }),
};

type Body = z.output<typeof FollowUpRuleBodySchema>;

/** Adds a rule, or changes the one with `id`. */
export function useSaveFollowUpRule(id: string | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Body) => (id ? apiWrite('PUT', followUpRulePath(id), body, FollowUpRuleSchema) : apiWrite('POST', followUpRulesPath, body, FollowUpRuleSchema)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: followUpQueries.all() }),
  });
}

export function useRemoveFollowUpRule() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiWrite('DELETE', followUpRulePath(id)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: followUpQueries.all() }),
  });
}
