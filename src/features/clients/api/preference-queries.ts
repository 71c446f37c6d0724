import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { messagesApi } from '@shared/api/messages.api';
import type { MyPreferencesBodySchema } from '@shared/schemas/contact.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';
import { myPreferencesSaved } from '@client/lib/cache-rules';

export const preferenceQueries = {
  mine: () => apiQuery(messagesApi.myPreferences),
};

export function useSaveMyPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    // The form's parsed values go out as they always have (a cleared phone is null, which the body schema does not read).
    mutationFn: (body: z.output<typeof MyPreferencesBodySchema>) =>
      callApi(messagesApi.saveMyPreferences, { body: body as z.input<typeof MyPreferencesBodySchema> }),
    onSuccess: (saved) => myPreferencesSaved(queryClient, saved),
  });
}
