import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ShopSettings } from '../shared/schemas/shop-settings';
import { api } from './api-client';

export const shopSettingsKeys = {
  all: ['shop-settings'] as const,
  current: () => [...shopSettingsKeys.all, 'current'] as const,
};

export function useShopSettingsQuery() {
  return useQuery({
    queryKey: shopSettingsKeys.current(),
    queryFn: async () => (await api.get<{ settings: ShopSettings }>('/settings')).settings,
  });
}

export function useSaveShopSettingsMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ShopSettings) => (await api.put<{ settings: ShopSettings }>('/settings', input)).settings,
    onSuccess: (settings) => {
      queryClient.setQueryData(shopSettingsKeys.current(), settings);
      // Draft quotes are priced with these rules.
      return queryClient.invalidateQueries({ queryKey: ['quotes'] });
    },
  });
}
