import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CreateUserInput, ManagedUser, UpdateUserInput } from '../shared/schemas/users';
import { api } from './api-client';
import { sessionKeys } from './use-session';

export const userKeys = {
  all: ['users'] as const,
  list: () => [...userKeys.all, 'list'] as const,
};

export function useUsersQuery(enabled = true) {
  return useQuery({
    queryKey: userKeys.list(),
    queryFn: async () => (await api.get<{ items: ManagedUser[] }>('/users')).items,
    enabled,
  });
}

export function useCreateUserMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: CreateUserInput) => (await api.post<{ user: ManagedUser }>('/users', input)).user,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}

export function useUpdateUserMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, changes }: { id: string; changes: UpdateUserInput }) =>
      (await api.patch<{ user: ManagedUser }>(`/users/${encodeURIComponent(id)}`, changes)).user,
    onSuccess: () => {
      // An admin may have changed their own name or role.
      void queryClient.invalidateQueries({ queryKey: userKeys.all });
      void queryClient.invalidateQueries({ queryKey: sessionKeys.me() });
    },
  });
}
