import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PublicQuoteView } from '../shared/schemas/quotes';
import { api, isApiError } from './api-client';

export const publicQuoteKeys = {
  all: ['public-quote'] as const,
  byToken: (token: string) => [...publicQuoteKeys.all, token] as const,
};

const path = (token: string) => `/public/quotes/${encodeURIComponent(token)}`;

/** A wrong (404) or expired (410) link will not mend itself: only offline and 5xx are retried. */
function retryPublic(failureCount: number, error: unknown): boolean {
  if (failureCount >= 2) return false;
  return !isApiError(error) || error.kind === 'offline' || error.status >= 500;
}

export function usePublicQuoteQuery(token: string | undefined) {
  return useQuery({
    queryKey: publicQuoteKeys.byToken(token ?? ''),
    queryFn: async () => (await api.get<{ quote: PublicQuoteView }>(path(token!))).quote,
    enabled: Boolean(token),
    retry: retryPublic,
  });
}

export type PublicDecision = { accept: true; optionIndex: number; name: string } | { accept: false; name: string; reason: string };

export function usePublicDecisionMutation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (decision: PublicDecision) => {
      const body = decision.accept ? { optionIndex: decision.optionIndex, name: decision.name } : { name: decision.name, reason: decision.reason };
      return (await api.post<{ quote: PublicQuoteView }>(`${path(token)}/${decision.accept ? 'accept' : 'decline'}`, body)).quote;
    },
    onSuccess: (quote) => {
      queryClient.setQueryData(publicQuoteKeys.byToken(token), quote);
      return queryClient.invalidateQueries({ queryKey: publicQuoteKeys.byToken(token) });
    },
  });
}
