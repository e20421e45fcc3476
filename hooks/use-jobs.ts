import { keepPreviousData, useInfiniteQuery, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ActivityView } from '../shared/schemas/activity';
import type { JobCreateInput, JobDetail, JobPatchInput, JobSummary } from '../shared/schemas/jobs';
import { api } from './api-client';

export type JobStatusFilter = 'active' | 'archived' | 'all';

export interface JobListParams {
  search?: string;
  status: JobStatusFilter;
}

export const jobKeys = {
  all: ['jobs'] as const,
  lists: () => [...jobKeys.all, 'list'] as const,
  list: (params: JobListParams) => [...jobKeys.lists(), params] as const,
  detail: (id: string) => [...jobKeys.all, 'detail', id] as const,
  activity: (id: string) => [...jobKeys.all, 'activity', id] as const,
};

const jobPath = (id: string) => `/jobs/${encodeURIComponent(id)}`;

/** Who changed what on the job and its runs. */
export function useJobActivityQuery(id: string | undefined) {
  return useQuery({
    queryKey: jobKeys.activity(id ?? ''),
    queryFn: async () => (await api.get<{ items: ActivityView[] }>(`${jobPath(id!)}/activity`)).items,
    enabled: Boolean(id),
  });
}

export interface JobPage {
  items: JobSummary[];
  total: number;
}

/** Jobs page by page, newest change first; "Load more" asks for the next page. */
export function useJobsQuery(params: JobListParams, pageSize = 25) {
  const query = useInfiniteQuery({
    queryKey: [...jobKeys.list(params), pageSize] as const,
    queryFn: ({ pageParam }) => {
      const query = new URLSearchParams({ status: params.status, page: String(pageParam), pageSize: String(pageSize) });
      if (params.search?.trim()) query.set('search', params.search.trim());
      return api.get<JobPage>(`/jobs?${query.toString()}`);
    },
    initialPageParam: 1,
    getNextPageParam: (last, pages) => (pages.length * pageSize < last.total ? pages.length + 1 : undefined),
    placeholderData: keepPreviousData,
  });
  const items = query.data?.pages.flatMap((p) => p.items) ?? [];
  return { ...query, items, total: query.data?.pages[0]?.total ?? 0 };
}

/**
 * The job, and whether its cached answer is one a write of this browser has made out of date while the
 * new one is on its way (`settling`). Screens that take defaults from the job or print it wait that out,
 * so a run added straight after another does not start from the job as it was before.
 */
export function useJobQuery(id: string | undefined) {
  const queryClient = useQueryClient();
  const query = useQuery({
    queryKey: jobKeys.detail(id ?? ''),
    queryFn: async () => (await api.get<{ job: JobDetail }>(jobPath(id!))).job,
    enabled: Boolean(id),
  });
  const invalidated = queryClient.getQueryState(jobKeys.detail(id ?? ''))?.isInvalidated ?? false;
  return { ...query, settling: query.isFetching && invalidated };
}

export function useCreateJobMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: JobCreateInput) => (await api.post<{ job: JobDetail }>('/jobs', input)).job,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.all }),
  });
}

export function useUpdateJobMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (patch: JobPatchInput) => (await api.patch<{ job: JobDetail }>(jobPath(id), patch)).job,
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(id), job);
      void queryClient.invalidateQueries({ queryKey: jobKeys.all });
    },
  });
}

export function useReorderRunsMutation(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (runIds: string[]) => (await api.put<{ job: JobDetail }>(`${jobPath(jobId)}/runs/order`, { runIds })).job,
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(jobId), job);
      void queryClient.invalidateQueries({ queryKey: jobKeys.all });
    },
  });
}
