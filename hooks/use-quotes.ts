import type { ActivityView } from '../shared/schemas/activity';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { LimitOverrideInput, QuoteInput, QuoteSummary, QuoteView } from '../shared/schemas/quotes';
import { api } from './api-client';

export interface EmailPreview {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export const quoteKeys = {
  all: ['quotes'] as const,
  list: () => [...quoteKeys.all, 'list'] as const,
  detail: (id: string) => [...quoteKeys.all, 'detail', id] as const,
  preview: (id: string) => [...quoteKeys.all, 'preview', id] as const,
  activity: (id: string) => [...quoteKeys.all, 'activity', id] as const,
};

const path = (id: string) => `/quotes/${encodeURIComponent(id)}`;

/** Who created, edited and sent the quote. */
export function useQuoteActivityQuery(id: string | undefined) {
  return useQuery({
    queryKey: quoteKeys.activity(id ?? ''),
    queryFn: async () => (await api.get<{ items: ActivityView[] }>(`${path(id!)}/activity`)).items,
    enabled: Boolean(id),
  });
}

export function useQuotesQuery() {
  return useQuery({
    queryKey: quoteKeys.list(),
    queryFn: async () => (await api.get<{ items: QuoteSummary[] }>('/quotes')).items,
  });
}

export function useQuoteQuery(id: string | undefined) {
  return useQuery({
    queryKey: quoteKeys.detail(id ?? ''),
    queryFn: async () => (await api.get<{ quote: QuoteView }>(path(id!))).quote,
    enabled: Boolean(id),
  });
}

export function useEmailPreviewQuery(id: string | undefined, enabled: boolean) {
  return useQuery({
    queryKey: quoteKeys.preview(id ?? ''),
    queryFn: async () => (await api.get<{ email: EmailPreview }>(`${path(id!)}/email-preview`)).email,
    enabled: Boolean(id) && enabled,
  });
}

export function useCreateQuoteMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: QuoteInput) => (await api.post<{ quote: QuoteView }>('/quotes', input)).quote,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: quoteKeys.all }),
  });
}

export function useUpdateQuoteMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: QuoteInput) => (await api.patch<{ quote: QuoteView }>(path(id), input)).quote,
    onSuccess: (quote) => {
      queryClient.setQueryData(quoteKeys.detail(id), quote);
      return queryClient.invalidateQueries({ queryKey: quoteKeys.all });
    },
  });
}

export function useSendQuoteMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => (await api.post<{ quote: QuoteView }>(`${path(id)}/send`)).quote,
    onSuccess: (quote) => {
      queryClient.setQueryData(quoteKeys.detail(id), quote);
      void queryClient.invalidateQueries({ queryKey: ['outbox'] });
      return queryClient.invalidateQueries({ queryKey: quoteKeys.all });
    },
  });
}

/** An engineer's or admin's override for an option over its temperature limit. */
export function useLimitOverrideMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: LimitOverrideInput) => (await api.post<{ quote: QuoteView }>(`${path(id)}/limit-overrides`, input)).quote,
    onSuccess: (quote) => {
      queryClient.setQueryData(quoteKeys.detail(id), quote);
      return queryClient.invalidateQueries({ queryKey: quoteKeys.all });
    },
  });
}
