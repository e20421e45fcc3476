import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { JobCard } from '../jobs/job-card';
import { JobForm } from '../jobs/job-form';
import { canEditJobs } from '../jobs/roles';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadMore } from '../ui/load-more';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { type JobStatusFilter, useCreateJobMutation, useJobsQuery } from '../../hooks/use-jobs';
import { useSessionQuery } from '../../hooks/use-session';
import { useUnits } from '../../hooks/use-units';
import { useScreenTitle } from '../ui/use-screen-title';

const STATUS_OPTIONS = [
  { value: 'active', label: 'Active' },
  { value: 'archived', label: 'Archived' },
  { value: 'all', label: 'All' },
] as const;

export default function JobsScreen() {
  const router = useRouter();
  const { data: me } = useSessionQuery();
  const canEdit = canEditJobs(me);
  const units = useUnits();
  const [search, setSearch] = useState('');
  const [status, setStatus] = useState<JobStatusFilter>('active');
  const [creating, setCreating] = useState(false);
  const jobs = useJobsQuery({ search, status });
  const createJob = useCreateJobMutation();
  const filtered = search.trim() !== '' || status !== 'active';

  useScreenTitle('Jobs');
  return (
    <Screen>
      <View style={styles.header}>
        <View style={styles.titleRow}>
          <Text variant="title" headingLevel={1}>
            Jobs
          </Text>
          {canEdit && !creating ? <Button label="New job" compact onPress={() => setCreating(true)} /> : null}
        </View>
        <Text tone="muted">Each job is one customer’s system, built from its runs between fixed points, hottest first.</Text>
      </View>

      {creating ? (
        <Card>
          <Text variant="heading" headingLevel={2}>
            New job
          </Text>
          <JobForm
            submitLabel="Create job"
            onCancel={() => setCreating(false)}
            onSubmit={async (values) => {
              const job = await createJob.mutateAsync(values);
              setCreating(false);
              router.push(`/jobs/${job.id}`);
            }}
          />
        </Card>
      ) : null}

      <View style={styles.filters}>
        <TextField label="Search jobs" hint="Job name, customer or application" value={search} onChangeText={setSearch} autoCorrect={false} />
        <SegmentedControl label="Show" options={STATUS_OPTIONS} value={status} onChange={setStatus} />
      </View>

      {jobs.isPending ? (
        <LoadingState label="Loading jobs…" />
      ) : jobs.isError ? (
        <ErrorBanner title="The jobs did not load" message={messageOf(jobs.error)} onRetry={() => void jobs.refetch()} />
      ) : jobs.items.length === 0 ? (
        <EmptyState
          title={filtered ? 'No jobs match' : 'No jobs yet'}
          message={
            filtered
              ? 'Clear the search or show all jobs.'
              : canEdit
                ? 'Create the first job, then add its runs.'
                : 'Jobs appear here once the shop creates them.'
          }
          action={
            filtered ? (
              <Button
                label="Show all jobs"
                variant="secondary"
                compact
                onPress={() => {
                  setSearch('');
                  setStatus('all');
                }}
              />
            ) : undefined
          }
        />
      ) : (
        <View style={styles.list}>
          <Text tone="muted" aria-live="polite">
            {jobs.total} {jobs.total === 1 ? 'job' : 'jobs'}
          </Text>
          <View role="list" aria-label="Jobs" style={styles.list}>
            {jobs.items.map((job) => (
              <View key={job.id} role="listitem">
                <JobCard job={job} units={units} />
              </View>
            ))}
          </View>
          <LoadMore
            noun="jobs"
            shown={jobs.items.length}
            total={jobs.total}
            hasMore={jobs.hasNextPage}
            loading={jobs.isFetchingNextPage}
            onLoadMore={() => void jobs.fetchNextPage()}
          />
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  titleRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md },
  filters: { gap: spacing.md },
  list: { gap: spacing.md },
});
