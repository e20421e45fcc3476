import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { JobHeader } from '../jobs/job-header';
import { LoadFailed } from '../jobs/load-failed';
import { JobTotalsCard } from '../jobs/job-totals';
import { canEditJobs } from '../jobs/roles';
import { RunCard } from '../jobs/run-card';
import { SystemSection } from '../jobs/system-section';
import { WeldPlanSection } from '../welds/weld-plan-section';
import { ActivitySection } from '../ui/activity-list';
import { Button } from '../ui/button';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { UnitSwitch } from '../units/unit-switch';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useJobActivityQuery, useJobQuery, useReorderRunsMutation, useUpdateJobMutation } from '../../hooks/use-jobs';
import { useDeleteRunMutation, useDuplicateRunMutation } from '../../hooks/use-runs';
import { useSessionQuery } from '../../hooks/use-session';
import { useUnits } from '../../hooks/use-units';
import { useScreenTitle } from '../ui/use-screen-title';

export default function JobScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const { data: me } = useSessionQuery();
  const units = useUnits();
  const job = useJobQuery(id);
  const activity = useJobActivityQuery(id);
  const update = useUpdateJobMutation(id ?? '');
  const reorder = useReorderRunsMutation(id ?? '');
  const duplicate = useDuplicateRunMutation();
  const remove = useDeleteRunMutation();
  const [actionError, setActionError] = useState<string>();

  useScreenTitle(job.data?.name ?? 'Job', 'Jobs');
  if (job.isPending) return <LoadingState label="Loading the job…" />;
  if (job.isError) {
    return <LoadFailed title="The job did not load" error={job.error} onRetry={() => void job.refetch()} backHref="/jobs" backLabel="Back to the jobs" />;
  }

  const detail = job.data;
  const canEdit = canEditJobs(me);
  const canChangeRuns = canEdit && detail.status === 'active';
  const busy = reorder.isPending || duplicate.isPending || remove.isPending;
  const ids = detail.runs.map((r) => r.id);

  const act = async (work: () => Promise<unknown>) => {
    setActionError(undefined);
    try {
      await work();
    } catch (error) {
      setActionError(messageOf(error));
    }
  };
  const move = (index: number, by: -1 | 1) => {
    const next = [...ids];
    [next[index], next[index + by]] = [next[index + by], next[index]];
    void act(() => reorder.mutateAsync(next));
  };

  return (
    <Screen>
      <JobHeader job={detail} canEdit={canEdit} onSave={(patch) => update.mutateAsync(patch)} />
      <JobTotalsCard totals={detail.totals} units={units} />

      <View style={styles.section}>
        <View style={styles.titleRow}>
          <Text variant="heading" headingLevel={2}>
            Runs
          </Text>
          {canChangeRuns ? (
            <Button label="Add run" compact onPress={() => router.push(`/jobs/${detail.id}/runs/new`)} />
          ) : null}
        </View>
        <Text tone="muted">In build order: the hottest run first, as the shop builds the system.</Text>
        {actionError ? <ErrorBanner title="The runs were not changed" message={actionError} /> : null}
        {detail.runs.length === 0 ? (
          <EmptyState
            title="No runs yet"
            message={canChangeRuns ? 'Add the first run: the length of tube between two fixed points.' : 'This job has no runs yet.'}
          />
        ) : (
          <View role="list" aria-label="Runs" style={styles.list}>
            {detail.runs.map((run, i) => (
              <View key={run.id} role="listitem">
                <RunCard
                  run={run}
                  jobId={detail.id}
                  units={units}
                  actions={
                    canChangeRuns
                      ? {
                          onMoveUp: i > 0 ? () => move(i, -1) : undefined,
                          onMoveDown: i < ids.length - 1 ? () => move(i, 1) : undefined,
                          onDuplicate: () => void act(() => duplicate.mutateAsync(run.id)),
                          onDelete: () => void act(() => remove.mutateAsync(run.id)),
                          busy,
                        }
                      : undefined
                  }
                />
              </View>
            ))}
          </View>
        )}
      </View>
      <SystemSection job={detail} units={units} />
      {detail.runs.length > 0 ? <WeldPlanSection jobId={detail.id} /> : null}
      <ActivitySection intro="Who changed what on this job and its runs, deleted runs included." query={activity} />
      <UnitSwitch />
    </Screen>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.md },
  titleRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md },
  list: { gap: spacing.md },
});
