import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { consultationsApi } from '@shared/api/consultations.api';
import type { CreateConsultation, ProposeQuoteRequestSchema, QuoteEdit } from '@shared/schemas/consultation.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';
import { consultationsChanged, myQuotesChanged, quoteEdited } from '@client/lib/cache-rules';

export const consultationQueries = {
  ofClient: (clientId: string) => apiQuery(consultationsApi.ofClient, { params: { id: clientId } }),
  detail: (id: string) => apiQuery(consultationsApi.one, { params: { id } }),
};

/** Ask for a proposal: a POST that stores nothing. */
export function useProposeQuote() {
  return useMutation({
    mutationFn: (body: z.input<typeof ProposeQuoteRequestSchema>) => callApi(consultationsApi.propose, { body }),
  });
}

export function useCreateConsultation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateConsultation) => callApi(consultationsApi.create, { body }),
    onSuccess: () => consultationsChanged(queryClient),
  });
}

export function useEditQuote(consultationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: QuoteEdit) => callApi(consultationsApi.editQuote, { params: { id: consultationId }, body }),
    onSuccess: (saved) => {
      queryClient.setQueryData(consultationQueries.detail(consultationId).queryKey, saved);
      return quoteEdited(queryClient, saved.clientId);
    },
  });
}

export function useSendQuote(consultationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => callApi(consultationsApi.sendQuote, { params: { id: consultationId } }),
    onSuccess: (saved) => queryClient.setQueryData(consultationQueries.detail(consultationId).queryKey, saved),
  });
}

export const myQuoteQueries = {
  list: () => apiQuery(consultationsApi.myQuotes),
};

export function useAcceptQuote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (quoteId: string) => callApi(consultationsApi.acceptMyQuote, { params: { id: quoteId } }),
    onSuccess: () => myQuotesChanged(queryClient),
  });
}
