import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { FlexPartInput, FlexPartView } from '../shared/schemas/alloy';
import { api } from './api-client';

export const flexPartKeys = {
  all: ['flex-parts'] as const,
  list: (includeInactive: boolean) => [...flexPartKeys.all, 'list', { includeInactive }] as const,
};

/** Readers see active parts; an admin also sees the deactivated ones, to bring them back. */
export function useFlexPartsQuery(includeInactive: boolean) {
  return useQuery({
    queryKey: flexPartKeys.list(includeInactive),
    queryFn: async () =>
      (await api.get<{ items: FlexPartView[] }>(`/flex-parts${includeInactive ? '?includeInactive=true' : ''}`)).items,
  });
}

export function useCreateFlexPartMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: FlexPartInput) => (await api.post<{ flexPart: FlexPartView }>('/flex-parts', input)).flexPart,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: flexPartKeys.all }),
  });
}

export function useUpdateFlexPartMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, changes }: { id: string; changes: Partial<FlexPartInput> }) =>
      (await api.patch<{ flexPart: FlexPartView }>(`/flex-parts/${encodeURIComponent(id)}`, changes)).flexPart,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: flexPartKeys.all }),
  });
}
