import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SourceInput, SourceView } from '../shared/schemas/alloy';
import { api } from './api-client';

export const sourceKeys = {
  all: ['sources'] as const,
  list: () => [...sourceKeys.all, 'list'] as const,
};

export function useSourcesQuery(enabled = true) {
  return useQuery({
    queryKey: sourceKeys.list(),
    queryFn: async () => (await api.get<{ items: SourceView[] }>('/sources')).items,
    enabled,
    staleTime: 5 * 60 * 1000,
  });
}

export function useCreateSourceMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SourceInput) => (await api.post<{ source: SourceView }>('/sources', input)).source,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sourceKeys.all }),
  });
}
