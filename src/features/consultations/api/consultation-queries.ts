import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { consultationPaths } from '../../../../shared/api/consultation-paths';
import {
  ConsultationListSchema, ConsultationViewSchema, ProposedQuoteSchema, type ConsultationInput, type CreateConsultation, type QuoteEdit,
} from '../../../../shared/schemas/consultation.schemas';
import { apiGet, apiWrite } from '../../../lib/api-client';

/** Pages of the consultation feature (beside the API paths so links and the router agree). */
export const consultationPagePaths = {
  create: (clientId: string) => `/consultations/new?client=${encodeURIComponent(clientId)}`,
  one: (id: string) => `/consultations/${id}`,
  bookQuote: (consultationId: string) => `/desk/book?consultation=${encodeURIComponent(consultationId)}`,
};

export const consultationQueries = {
  all: () => ['consultations'] as const,
  ofClient: (clientId: string) =>
    queryOptions({
      queryKey: [...consultationQueries.all(), 'client', clientId] as const,
      queryFn: () => apiGet(consultationPaths.ofClient(clientId), ConsultationListSchema),
    }),
  detail: (id: string) =>
    queryOptions({ queryKey: [...consultationQueries.all(), 'detail', id] as const, queryFn: () => apiGet(consultationPaths.one(id), ConsultationViewSchema) }),
};

/** Ask for a proposal: a POST that stores nothing. */
export function useProposeQuote() {
  return useMutation({
    mutationFn: (body: { consultation: ConsultationInput; serviceId: string | null; clientId: string }) => apiWrite('POST', consultationPaths.propose, body, ProposedQuoteSchema),
  });
}

export function useCreateConsultation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateConsultation) => apiWrite('POST', consultationPaths.create, body, ConsultationViewSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: consultationQueries.all() }),
  });
}

export function useEditQuote(consultationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: QuoteEdit) => apiWrite('PUT', consultationPaths.quote(consultationId), body, ConsultationViewSchema),
    onSuccess: (saved) => {
      queryClient.setQueryData(consultationQueries.detail(consultationId).queryKey, saved);
      return queryClient.invalidateQueries({ queryKey: consultationQueries.ofClient(saved.clientId).queryKey });
    },
  });
}

export function useSendQuote(consultationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiWrite('POST', consultationPaths.sendQuote(consultationId), {}, ConsultationViewSchema),
    onSuccess: (saved) => queryClient.setQueryData(consultationQueries.detail(consultationId).queryKey, saved),
  });
}

export const myQuoteQueries = {
  list: () => queryOptions({ queryKey: [...consultationQueries.all(), 'mine'] as const, queryFn: () => apiGet(consultationPaths.myQuotes, ConsultationListSchema) }),
};

export function useAcceptQuote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (quoteId: string) => apiWrite('POST', consultationPaths.acceptMyQuote(quoteId), {}, ConsultationViewSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: myQuoteQueries.list().queryKey }),
  });
}
