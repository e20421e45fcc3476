import type { ActivityView } from '../shared/schemas/activity';
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CompareView, RunCreateInput, RunPatchInput, RunView } from '../shared/schemas/jobs';
import { api } from './api-client';
import { jobKeys } from './use-jobs';

export const runKeys = {
  all: ['runs'] as const,
  detail: (id: string) => [...runKeys.all, 'detail', id] as const,
  compare: (id: string, alloyIds: string[]) => [...runKeys.all, 'compare', id, alloyIds] as const,
  activity: (id: string) => [...runKeys.all, 'activity', id] as const,
};

const runPath = (id: string) => `/runs/${encodeURIComponent(id)}`;

/** Who changed what on the run. */
export function useRunActivityQuery(id: string | undefined) {
  return useQuery({
    queryKey: runKeys.activity(id ?? ''),
    queryFn: async () => (await api.get<{ items: ActivityView[] }>(`${runPath(id!)}/activity`)).items,
    enabled: Boolean(id),
  });
}

/** A run's change shows in its job, the job list's totals and every comparison of it. */
function useInvalidateRuns() {
  const queryClient = useQueryClient();
  return (run?: RunView) => {
    if (run) queryClient.setQueryData(runKeys.detail(run.id), run);
    void queryClient.invalidateQueries({ queryKey: jobKeys.all });
    void queryClient.invalidateQueries({ queryKey: runKeys.all });
  };
}

export function useRunQuery(id: string | undefined) {
  return useQuery({
    queryKey: runKeys.detail(id ?? ''),
    queryFn: async () => (await api.get<{ run: RunView }>(runPath(id!))).run,
    enabled: Boolean(id),
  });
}

export function useCreateRunMutation(jobId: string) {
  const invalidate = useInvalidateRuns();
  return useMutation({
    mutationFn: async (input: RunCreateInput) =>
      (await api.post<{ run: RunView }>(`/jobs/${encodeURIComponent(jobId)}/runs`, input)).run,
    onSuccess: invalidate,
  });
}

export function useUpdateRunMutation(id: string) {
  const invalidate = useInvalidateRuns();
  return useMutation({
    mutationFn: async (patch: RunPatchInput) => (await api.patch<{ run: RunView }>(runPath(id), patch)).run,
    onSuccess: invalidate,
  });
}

export function useDeleteRunMutation() {
  const invalidate = useInvalidateRuns();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(runPath(id)),
    onSuccess: () => invalidate(),
  });
}

export function useDuplicateRunMutation() {
  const invalidate = useInvalidateRuns();
  return useMutation({
    mutationFn: async (id: string) => (await api.post<{ run: RunView }>(`${runPath(id)}/duplicate`)).run,
    onSuccess: invalidate,
  });
}

/** The run computed with each candidate alloy; waits until 2–4 are chosen. */
export function useCompareQuery(runId: string | undefined, alloyIds: string[]) {
  return useQuery({
    queryKey: runKeys.compare(runId ?? '', alloyIds),
    queryFn: () =>
      api.get<CompareView>(`${runPath(runId!)}/compare?alloyIds=${alloyIds.map(encodeURIComponent).join(',')}`),
    enabled: Boolean(runId) && alloyIds.length >= 2 && alloyIds.length <= 4,
    placeholderData: keepPreviousData,
  });
}
