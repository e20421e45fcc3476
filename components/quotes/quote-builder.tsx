import { messageOf } from '../../hooks/api-client';
import { useAlloysQuery } from '../../hooks/use-alloys';
import { useJobsQuery } from '../../hooks/use-jobs';
import type { QuoteInput, QuoteInputDraft } from '../../shared/schemas/quotes';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadMore } from '../ui/load-more';
import { LoadingState } from '../ui/loading-state';
import { QuoteForm } from './quote-form';

export interface QuoteBuilderProps {
  defaultValues: QuoteInputDraft;
  submitLabel: string;
  onSubmit: (values: QuoteInput) => Promise<unknown>;
  onDirtyChange?: (dirty: boolean) => void;
}

/** Loads the jobs and the published alloys the form picks from, then shows the form. */
export function QuoteBuilder(props: QuoteBuilderProps) {
  const jobs = useJobsQuery({ status: 'active' }, 100);
  const alloys = useAlloysQuery({});
  if (jobs.isPending || alloys.isPending) return <LoadingState label="Loading jobs and alloys…" />;
  if (jobs.isError) return <ErrorBanner title="The jobs did not load" message={messageOf(jobs.error)} onRetry={() => void jobs.refetch()} />;
  if (alloys.isError) return <ErrorBanner title="The catalogue did not load" message={messageOf(alloys.error)} onRetry={() => void alloys.refetch()} />;
  if (jobs.items.length === 0) return <EmptyState title="No jobs to quote yet" message="A fabricator creates a job with its runs of tube; then you can quote it." />;
  return (
    <>
      <QuoteForm jobs={jobs.items} alloys={alloys.data.items} {...props} />
      {jobs.hasNextPage ? (
        <LoadMore noun="jobs" shown={jobs.items.length} total={jobs.total} hasMore loading={jobs.isFetchingNextPage} onLoadMore={() => void jobs.fetchNextPage()} />
      ) : null}
    </>
  );
}
