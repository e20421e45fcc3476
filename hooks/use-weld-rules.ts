import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { WeldRuleInput, WeldRulePatch, WeldRuleRevisionView, WeldRuleView } from '../shared/schemas/weld-rules';
import type { WeldPlan } from '../shared/welds/weld-plan';
import { api } from './api-client';
import { jobKeys } from './use-jobs';

export const weldRuleKeys = {
  all: ['weld-rules'] as const,
  list: () => [...weldRuleKeys.all, 'list'] as const,
  revisions: (id: string) => [...weldRuleKeys.all, 'revisions', id] as const,
};

/** Under the job's keys, so any change to the job or its runs refreshes its welds too. */
export const weldPlanKey = (jobId: string) => [...jobKeys.all, 'weld-plan', jobId] as const;

const rulePath = (id: string) => `/weld-rules/${encodeURIComponent(id)}`;

export function useWeldRulesQuery() {
  return useQuery({
    queryKey: weldRuleKeys.list(),
    queryFn: async () => (await api.get<{ items: WeldRuleView[] }>('/weld-rules')).items,
  });
}

export function useWeldRuleRevisionsQuery(id: string | null) {
  return useQuery({
    queryKey: weldRuleKeys.revisions(id ?? ''),
    queryFn: async () => (await api.get<{ items: WeldRuleRevisionView[] }>(`${rulePath(id!)}/revisions`)).items,
    enabled: Boolean(id),
  });
}

export function useWeldPlanQuery(jobId: string | undefined) {
  return useQuery({
    queryKey: weldPlanKey(jobId ?? ''),
    queryFn: async () => (await api.get<{ plan: WeldPlan }>(`/jobs/${encodeURIComponent(jobId!)}/weld-plan`)).plan,
    enabled: Boolean(jobId),
  });
}

/** A rule change changes the fillers of every job's welds. */
function useRefresh() {
  const queryClient = useQueryClient();
  return async () => {
    await Promise.all([queryClient.invalidateQueries({ queryKey: weldRuleKeys.all }), queryClient.invalidateQueries({ queryKey: [...jobKeys.all, 'weld-plan'] })]);
  };
}

export function useCreateWeldRuleMutation() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (input: WeldRuleInput) => (await api.post<{ rule: WeldRuleView }>('/weld-rules', input)).rule,
    onSuccess: refresh,
  });
}

export function useUpdateWeldRuleMutation(id: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (patch: WeldRulePatch) => (await api.patch<{ rule: WeldRuleView }>(rulePath(id), patch)).rule,
    onSuccess: refresh,
  });
}

export function useDeleteWeldRuleMutation() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(rulePath(id)),
    onSuccess: refresh,
  });
}
