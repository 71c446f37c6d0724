import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { MyPreferencesSchema, myPreferencesPath, type MyPreferencesBodySchema } from '../../../../shared/schemas/contact.schemas';
import { apiGet, apiWrite } from '../../../lib/api-client';

export const preferenceQueries = {
  mine: () => queryOptions({ queryKey: ['me', 'preferences'] as const, queryFn: () => apiGet(myPreferencesPath, MyPreferencesSchema) }),
};

export function useSaveMyPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof MyPreferencesBodySchema>) => apiWrite('PUT', myPreferencesPath, body, MyPreferencesSchema),
    onSuccess: (saved) => queryClient.setQueryData(preferenceQueries.mine().queryKey, saved),
  });
}
