import { useQuery } from '@tanstack/react-query';
import { api } from './api-client';

/** A message the embedded SMTP server stored (GET /api/outbox). */
export interface OutboxMessage {
  id: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string;
  sizeBytes: number;
  receivedAt: string;
}

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
  message: (id: string) => [...outboxKeys.all, 'message', id] as const,
};

export function useOutboxQuery(enabled = true) {
  return useQuery({
    queryKey: outboxKeys.list(),
    queryFn: async () => {
      const { items } = await api.get<{ items: OutboxMessage[] }>('/outbox');
      return [...items].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
    },
    enabled,
  });
}

export function useOutboxMessageQuery(id: string | undefined) {
  return useQuery({
    queryKey: outboxKeys.message(id ?? ''),
    queryFn: async () => (await api.get<{ message: OutboxMessage }>(`/outbox/${encodeURIComponent(id!)}`)).message,
    enabled: Boolean(id),
  });
}
