import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PublicUser, SignInInput } from '../shared/schemas/auth';
import { api, isApiError } from './api-client';

export const sessionKeys = {
  all: ['session'] as const,
  me: () => [...sessionKeys.all, 'me'] as const,
};

/** The signed-in user, or null when signed out. Other failures (offline, server) stay errors. */
export function useSessionQuery() {
  return useQuery({
    queryKey: sessionKeys.me(),
    // Signed out, the server answers 200 { user: null }; a 401 is still read as signed out.
    queryFn: async (): Promise<PublicUser | null> => {
      try {
        const { user } = await api.get<{ user: PublicUser | null }>('/auth/me');
        return user ?? null;
      } catch (error) {
        if (isApiError(error) && error.kind === 'signed_out') return null;
        throw error;
      }
    },
    staleTime: 5 * 60 * 1000,
  });
}

export function useSignInMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SignInInput) => api.post<{ user: PublicUser }>('/auth/sign-in', input),
    onSuccess: ({ user }) => {
      queryClient.setQueryData(sessionKeys.me(), user);
    },
  });
}

export function useSignOutMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/auth/sign-out'),
    // Whatever the server said, nothing of the last user may stay in the cache.
    onSettled: () => {
      queryClient.clear();
      queryClient.setQueryData(sessionKeys.me(), null);
    },
  });
}
