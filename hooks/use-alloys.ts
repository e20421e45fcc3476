import { keepPreviousData, useInfiniteQuery, useMutation, useQueries, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import type { ImportJobView } from '../shared/catalogue/catalogue-csv';
import type { DiffEntry } from '../shared/catalogue/alloy-diff';
import type {
  AlloyDetail,
  AlloyFamily,
  AlloyInput,
  AlloyPatch,
  AlloySummary,
  AlloyVersionView,
  AlloyVersionSummary,
  ReviewQueueItem,
  RevisionView,
} from '../shared/schemas/alloy';
import { api, send } from './api-client';

export interface AlloyListParams {
  search?: string;
  family?: AlloyFamily;
  minServiceC?: number;
  sort?: 'designation' | 'limit' | 'expansion' | 'price';
  atC?: number;
  includeDrafts?: boolean;
  includeRetired?: boolean;
}

export interface AlloyReview {
  alloyId: string;
  published: AlloyVersionView | null;
  draft: AlloyVersionView;
  diff: DiffEntry[];
}

export type { ImportJobView, ImportReport } from '../shared/catalogue/catalogue-csv';

export const alloyKeys = {
  all: ['alloys'] as const,
  lists: () => [...alloyKeys.all, 'list'] as const,
  list: (params: AlloyListParams) => [...alloyKeys.lists(), params] as const,
  detail: (id: string) => [...alloyKeys.all, 'detail', id] as const,
  revisions: (id: string) => [...alloyKeys.all, 'revisions', id] as const,
  review: (id: string) => [...alloyKeys.all, 'review', id] as const,
  reviewQueue: () => [...alloyKeys.all, 'review-queue'] as const,
  versions: (id: string) => [...alloyKeys.all, 'versions', id] as const,
  version: (id: string, version: number) => [...alloyKeys.all, 'versions', id, version] as const,
  importJob: (id: string) => ['alloy-imports', id] as const,
};

/** Where the browser downloads the catalogue as CSV (a plain link: the server sends an attachment). */
export const CATALOGUE_CSV_URL = '/api/alloys/export.csv';

/** One page of the list as the server answers it. */
export interface AlloyPage {
  items: AlloySummary[];
  total: number;
}

function listQueryString(params: AlloyListParams, page = 1, pageSize = 200): string {
  const query = new URLSearchParams({ page: String(page), pageSize: String(pageSize) });
  for (const [key, value] of Object.entries(params)) {
    if (value === undefined || value === '' || (typeof value === 'number' && !Number.isFinite(value))) continue;
    query.set(key, String(value));
  }
  return query.toString();
}

/** The first 200 matches, for pickers that search as the user types. */
export function useAlloysQuery(params: AlloyListParams) {
  return useQuery({
    queryKey: alloyKeys.list(params),
    queryFn: () => api.get<AlloyPage>(`/alloys?${listQueryString(params)}`),
    // Typing in the search or temperature box keeps the last answer on screen until the next arrives.
    placeholderData: keepPreviousData,
  });
}

const LIST_PAGE_SIZE = 50;

/** The catalogue list page by page: the server searches, filters, sorts and pages; "Load more" asks for the next. */
export function useAlloyPagesQuery(params: AlloyListParams) {
  const query = useInfiniteQuery({
    queryKey: [...alloyKeys.list(params), 'pages'] as const,
    queryFn: ({ pageParam }) => api.get<AlloyPage>(`/alloys?${listQueryString(params, pageParam, LIST_PAGE_SIZE)}`),
    initialPageParam: 1,
    getNextPageParam: (last, pages) => (pages.length * LIST_PAGE_SIZE < last.total ? pages.length + 1 : undefined),
    placeholderData: keepPreviousData,
  });
  const items = query.data?.pages.flatMap((p) => p.items) ?? [];
  return { ...query, items, total: query.data?.pages[0]?.total ?? 0 };
}

const fetchAlloy = async (id: string) => (await api.get<{ alloy: AlloyDetail }>(`/alloys/${encodeURIComponent(id)}`)).alloy;

export function useAlloyQuery(id: string | undefined) {
  return useQuery({
    queryKey: alloyKeys.detail(id ?? ''),
    queryFn: () => fetchAlloy(id!),
    enabled: Boolean(id),
  });
}

/** Several alloys at once, for the comparison. */
export function useAlloyQueries(ids: string[]) {
  return useQueries({
    queries: ids.map((id) => ({ queryKey: alloyKeys.detail(id), queryFn: () => fetchAlloy(id) })),
  });
}

export function useAlloyRevisionsQuery(id: string | undefined) {
  return useQuery({
    queryKey: alloyKeys.revisions(id ?? ''),
    queryFn: async () => (await api.get<{ items: RevisionView[] }>(`/alloys/${encodeURIComponent(id!)}/revisions`)).items,
    enabled: Boolean(id),
  });
}

export function useAlloyReviewQuery(id: string | undefined, enabled = true) {
  return useQuery({
    queryKey: alloyKeys.review(id ?? ''),
    queryFn: () => api.get<AlloyReview>(`/alloys/${encodeURIComponent(id!)}/review`),
    enabled: Boolean(id) && enabled,
  });
}

function useInvalidateAlloys() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: alloyKeys.all });
}

export function useCreateAlloyMutation() {
  const invalidate = useInvalidateAlloys();
  return useMutation({
    mutationFn: async (input: AlloyInput & { note?: string }) => (await api.post<{ alloy: AlloyDetail }>('/alloys', input)).alloy,
    onSuccess: invalidate,
  });
}

export function useUpdateAlloyMutation(id: string) {
  const invalidate = useInvalidateAlloys();
  return useMutation({
    mutationFn: async (patch: AlloyPatch) =>
      (await api.patch<{ alloy: AlloyDetail }>(`/alloys/${encodeURIComponent(id)}`, patch)).alloy,
    onSuccess: invalidate,
  });
}

export type AlloyStatusAction = 'publish' | 'retire' | 'restore';

/** Publish the draft, retire or restore: admin only, each with a note for the history. */
export function useAlloyStatusMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ action, note }: { action: AlloyStatusAction; note: string }) =>
      (await api.post<{ alloy: AlloyDetail }>(`/alloys/${encodeURIComponent(id)}/${action}`, { note })).alloy,
    // The answer is the alloy as it now is. After publishing there is no draft: the review is never refetched (it would
    // answer 409). A review screen still showing it stops its query first (`useAlloyReviewQuery(id, false)`); removing the
    // query under a mounted screen would make that screen fetch it again.
    onSuccess: (alloy) => {
      queryClient.setQueryData(alloyKeys.detail(id), alloy);
      if (!alloy.draft) queryClient.removeQueries({ queryKey: alloyKeys.review(id), type: 'inactive' });
      return queryClient.invalidateQueries({
        queryKey: alloyKeys.all,
        predicate: (query) => query.queryKey[1] !== 'review' && !(query.queryKey[1] === 'detail' && query.queryKey[2] === id),
      });
    },
  });
}

/** Every version of an alloy, newest first (drafts for editors only). */
export function useAlloyVersionsQuery(id: string | undefined) {
  return useQuery({
    queryKey: alloyKeys.versions(id ?? ''),
    queryFn: async () => (await api.get<{ items: AlloyVersionSummary[] }>(`/alloys/${encodeURIComponent(id!)}/versions`)).items,
    enabled: Boolean(id),
  });
}

/** One version's full data, as it was. */
export function useAlloyVersionQuery(id: string | undefined, version: number | undefined) {
  return useQuery({
    queryKey: alloyKeys.version(id ?? '', version ?? 0),
    queryFn: async () => (await api.get<{ version: AlloyVersionView }>(`/alloys/${encodeURIComponent(id!)}/versions/${version}`)).version,
    enabled: Boolean(id) && version !== undefined,
  });
}

/** Drafts waiting for an admin, with their count (admin only). */
export function useReviewQueueQuery(enabled = true) {
  return useQuery({
    queryKey: alloyKeys.reviewQueue(),
    queryFn: () => api.get<{ items: ReviewQueueItem[]; count: number }>('/alloys/review-queue'),
    enabled,
  });
}

export type ReviewStepAction = 'submit' | 'send-back';

/** An editor submits the draft for review; an admin sends it back with a note. */
export function useReviewStepMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ action, note }: { action: ReviewStepAction; note: string }) =>
      (await api.post<{ alloy: AlloyDetail }>(`/alloys/${encodeURIComponent(id)}/${action}`, { note })).alloy,
    onSuccess: (alloy) => {
      queryClient.setQueryData(alloyKeys.detail(id), alloy);
      return queryClient.invalidateQueries({ queryKey: alloyKeys.all, predicate: (query) => query.queryKey[1] !== 'review' && query.queryKey[1] !== 'detail' });
    },
  });
}

const IMPORT_POLL_MS = 400;
const isRunning = (job: ImportJobView | undefined) => job !== undefined && job.phase !== 'done' && job.phase !== 'failed';

/** The state of a background import, polled until it is done or failed. */
export function useImportJobQuery(id: string | undefined) {
  return useQuery({
    queryKey: alloyKeys.importJob(id ?? ''),
    queryFn: async () => (await api.get<{ import: ImportJobView }>(`/alloys/imports/${encodeURIComponent(id!)}`)).import,
    enabled: Boolean(id),
    refetchInterval: (query) => (isRunning(query.state.data) ? IMPORT_POLL_MS : false),
  });
}

/**
 * Sends a CSV (reporting the upload), then follows the import the server runs in the background;
 * the catalogue lists refresh when it finishes.
 */
export function useCsvImport() {
  const queryClient = useQueryClient();
  const [jobId, setJobId] = useState<string>();
  const [uploadFraction, setUploadFraction] = useState<number>();
  const start = useMutation({
    mutationFn: async (csvText: string) => {
      setUploadFraction(0);
      const { import: job } = await send<{ import: ImportJobView }>('/alloys/import', csvText, { contentType: 'text/csv', onProgress: setUploadFraction });
      queryClient.setQueryData(alloyKeys.importJob(job.id), job);
      return job;
    },
    onSuccess: (job) => setJobId(job.id),
    onSettled: () => setUploadFraction(undefined),
  });
  const job = useImportJobQuery(jobId);
  const finished = job.data?.phase === 'done' || job.data?.phase === 'failed';
  useEffect(() => {
    if (finished) void queryClient.invalidateQueries({ queryKey: alloyKeys.all });
  }, [finished, queryClient]);
  return {
    start: (csvText: string) => {
      setJobId(undefined);
      return start.mutateAsync(csvText);
    },
    uploadFraction,
    job: jobId ? job.data : undefined,
    /** Why the upload or the polling failed (a failed import says so in `job.error`). */
    failure: start.error ?? job.error ?? undefined,
    busy: start.isPending || isRunning(job.data),
  };
}

export type CsvImport = ReturnType<typeof useCsvImport>;
