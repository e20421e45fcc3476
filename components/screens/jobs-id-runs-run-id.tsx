import { useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { TextLink } from '../ui/text-link';
import { LoadFailed } from '../jobs/load-failed';
import { canEditJobs } from '../jobs/roles';
import { alloyName } from '../jobs/run-card';
import { fieldsOf } from '../runs/new-run';
import { RunEditor } from '../runs/run-editor';
import { ActivitySection } from '../ui/activity-list';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { UnitSwitch } from '../units/unit-switch';
import { spacing } from '../../constants/theme';
import { useJobQuery } from '../../hooks/use-jobs';
import { useRunActivityQuery, useRunQuery, useUpdateRunMutation } from '../../hooks/use-runs';
import { useSessionQuery } from '../../hooks/use-session';
import { useUnits } from '../../hooks/use-units';
import { useScreenTitle } from '../ui/use-screen-title';

export default function RunScreen() {
  const { id, runId } = useLocalSearchParams<{ id: string; runId: string }>();
  const { data: me } = useSessionQuery();
  const units = useUnits();
  const run = useRunQuery(runId);
  const job = useJobQuery(id);
  const update = useUpdateRunMutation(runId ?? '');
  const activity = useRunActivityQuery(runId);

  useScreenTitle(run.data ? `Run ${run.data.position}` : 'Run', run.data?.name, job.data?.name);
  if (run.isPending) return <LoadingState label="Loading the run…" />;
  if (run.isError) {
    return <LoadFailed title="The run did not load" error={run.error} onRetry={() => void run.refetch()} backHref={`/jobs/${id}`} backLabel="Back to the job" />;
  }
  const saved = run.data;
  const archived = job.data?.status === 'archived';
  const editable = canEditJobs(me) && !archived;

  return (
    <Screen wide>
      <View style={styles.header}>
        <TextLink href={`/jobs/${saved.jobId}`} label={`← ${job.data?.name ?? 'Job'}`} accessibilityLabel="Back to the job" />
        <Text variant="overline" tone="muted">
          Run {saved.position}
        </Text>
        <Text variant="title" headingLevel={1}>
          {saved.name}
        </Text>
        <Text tone="muted">
          Saved with {alloyName(saved)}
          {saved.alloy ? `, data version ${saved.alloy.version}` : ''}
          {saved.alloy?.status === 'retired' ? ' (retired from the catalogue: choose another alloy)' : ''}
        </Text>
        {saved.problem ? <ErrorBanner title="The saved run has no result" message={saved.problem.message} /> : null}
        {archived ? <Text tone="warning">This job is archived: unarchive it to change the run.</Text> : null}
        <View style={styles.links}>
          <TextLink href={`/jobs/${saved.jobId}/runs/${saved.id}/compare`} label="Compare alloys for this run" />
        </View>
      </View>
      <UnitSwitch />
      <RunEditor
        key={saved.id}
        defaultValues={fieldsOf(saved)}
        units={units}
        alloyLabel={saved.alloy ? `${saved.alloy.designation} (${saved.alloy.uns})` : null}
        editable={editable}
        saveLabel="Save changes"
        onSave={(values) => update.mutateAsync(values)}
      />
      <ActivitySection intro="Who created and changed this run." query={activity} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  links: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xl },
});
