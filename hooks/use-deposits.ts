import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { DepositView, JobDepositView, RefundDepositInput } from '../shared/schemas/deposits';
import { api } from './api-client';
import { publicQuoteKeys } from './use-public-quote';
import { quoteKeys } from './use-quotes';

export const depositKeys = {
  all: ['deposits'] as const,
  ofJob: (jobId: string) => [...depositKeys.all, 'job', jobId] as const,
};

/** The customer opens the payment provider's page; the answer is its address. */
export function useStartDepositMutation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => (await api.post<{ url: string }>(`/public/quotes/${encodeURIComponent(token)}/deposit`)).url,
    onSettled: () => queryClient.invalidateQueries({ queryKey: publicQuoteKeys.byToken(token) }),
  });
}

export function useRefundDepositMutation(quoteId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: RefundDepositInput) => (await api.post<{ deposit: DepositView }>(`/quotes/${encodeURIComponent(quoteId)}/deposit/refund`, input)).deposit,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: depositKeys.all });
      void queryClient.invalidateQueries({ queryKey: ['outbox'] });
      return queryClient.invalidateQueries({ queryKey: quoteKeys.all });
    },
  });
}

/** The deposits of a job's quotes, for the job sheet. */
export function useJobDepositsQuery(jobId: string | undefined) {
  return useQuery({
    queryKey: depositKeys.ofJob(jobId ?? ''),
    queryFn: async () => (await api.get<{ items: JobDepositView[] }>(`/jobs/${encodeURIComponent(jobId!)}/deposits`)).items,
    enabled: Boolean(jobId),
  });
}
