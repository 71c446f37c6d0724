import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiPaths } from '../../../../shared/api/api-paths';
import type { CreateClientSchema } from '../../../../shared/schemas/booking.schemas';
import { ClientSummarySchema } from '../../../../shared/schemas/client.schemas';
import type { UpdateClientSchema } from '../../../../shared/schemas/contact.schemas';
import { apiWrite } from '../../../lib/api-client';
import { clientQueries } from './client-queries';

export type CreateClientInput = z.input<typeof CreateClientSchema>;
/** What the form hands over after parsing: the phone already in E.164, blanks as null. */
export type CreateClientValues = z.output<typeof CreateClientSchema>;

export function useCreateClient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateClientValues) => apiWrite('POST', apiPaths.clients, body, ClientSummarySchema),
    // A new client can match any earlier search.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clientQueries.lists() }),
  });
}

/** Saves the desk's edit of a client card; the card and any search showing the client are refreshed. */
export function useUpdateClient(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof UpdateClientSchema>) => apiWrite('PATCH', apiPaths.client(id), body, ClientSummarySchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clientQueries.all() }),
  });
}
