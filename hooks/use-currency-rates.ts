import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CurrencyRatesView } from '../shared/schemas/currency-rate';
import { api } from './api-client';

export const currencyRatesKeys = {
  all: ['currency-rates'] as const,
  table: () => [...currencyRatesKeys.all, 'table'] as const,
};

export function useCurrencyRatesQuery() {
  return useQuery({
    queryKey: currencyRatesKeys.table(),
    queryFn: () => api.get<CurrencyRatesView>('/currency-rates'),
  });
}

/** Rates change every cost shown in the shop's currency: job totals, runs and draft quotes. */
function useRefresh() {
  const queryClient = useQueryClient();
  return async (table: CurrencyRatesView) => {
    queryClient.setQueryData(currencyRatesKeys.table(), table);
    await Promise.all(['jobs', 'runs', 'quotes'].map((key) => queryClient.invalidateQueries({ queryKey: [key] })));
  };
}

export function useSetCurrencyRateMutation() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: ({ from, rate }: { from: string; rate: number }) => api.put<CurrencyRatesView>(`/currency-rates/${encodeURIComponent(from)}`, { rate }),
    onSuccess: refresh,
  });
}

export function useRemoveCurrencyRateMutation() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (from: string) => api.delete<CurrencyRatesView>(`/currency-rates/${encodeURIComponent(from)}`),
    onSuccess: refresh,
  });
}
