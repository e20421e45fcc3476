import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Preferences } from '../shared/schemas/preferences';
import { api } from './api-client';

export const preferenceKeys = {
  all: ['preferences'] as const,
  mine: () => [...preferenceKeys.all, 'me'] as const,
};

export function usePreferencesQuery() {
  return useQuery({
    queryKey: preferenceKeys.mine(),
    queryFn: async () => (await api.get<{ preferences: Preferences }>('/me/preferences')).preferences,
    staleTime: 5 * 60 * 1000,
  });
}

/** Switches at once on screen; a refused save puts the old choice back. */
export function useSetPreferencesMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: Preferences) => (await api.put<{ preferences: Preferences }>('/me/preferences', input)).preferences,
    onMutate: async (input) => {
      await queryClient.cancelQueries({ queryKey: preferenceKeys.mine() });
      const before = queryClient.getQueryData<Preferences>(preferenceKeys.mine());
      queryClient.setQueryData(preferenceKeys.mine(), input);
      return { before };
    },
    onError: (_error, _input, context) => {
      if (context?.before) queryClient.setQueryData(preferenceKeys.mine(), context.before);
    },
    onSuccess: (preferences) => queryClient.setQueryData(preferenceKeys.mine(), preferences),
    onSettled: () => queryClient.invalidateQueries({ queryKey: preferenceKeys.all }),
  });
}
