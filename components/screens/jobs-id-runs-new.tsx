import { useLocalSearchParams, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { TextLink } from '../ui/text-link';
import { LoadFailed } from '../jobs/load-failed';
import { canEditJobs } from '../jobs/roles';
import { newRunFields } from '../runs/new-run';
import { RunEditor } from '../runs/run-editor';
import { EmptyState } from '../ui/empty-state';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { UnitSwitch } from '../units/unit-switch';
import { spacing } from '../../constants/theme';
import { useJobQuery } from '../../hooks/use-jobs';
import { useCreateRunMutation } from '../../hooks/use-runs';
import { useSessionQuery } from '../../hooks/use-session';
import { useUnits } from '../../hooks/use-units';
import { useScreenTitle } from '../ui/use-screen-title';

export default function NewRunScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const { data: me } = useSessionQuery();
  const units = useUnits();
  const job = useJobQuery(id);
  const create = useCreateRunMutation(id ?? '');

  useScreenTitle('New run', job.data?.name);
  if (job.isPending || job.settling) return <LoadingState label="Loading the job…" />;
  if (job.isError) {
    return <LoadFailed title="The job did not load" error={job.error} onRetry={() => void job.refetch()} backHref="/jobs" backLabel="Back to the jobs" />;
  }
  const detail = job.data;
  const lastAlloy = detail.runs[detail.runs.length - 1]?.alloy;
  const back = <TextLink href={`/jobs/${detail.id}`} label={`← ${detail.name}`} accessibilityLabel={`Back to ${detail.name}`} />;
  if (!canEditJobs(me) || detail.status !== 'active') {
    return (
      <Screen>
        {back}
        <EmptyState
          title="Runs cannot be added here"
          message={detail.status !== 'active' ? 'This job is archived: unarchive it to add runs.' : 'Your role reads jobs but does not change them.'}
        />
      </Screen>
    );
  }

  return (
    <Screen wide>
      <View style={styles.header}>
        {back}
        <Text variant="title" headingLevel={1}>
          New run
        </Text>
        <Text tone="muted">Run {detail.runs.length + 1} of {detail.name}: a length of tube between two fixed points.</Text>
      </View>
      <UnitSwitch />
      <RunEditor
        defaultValues={newRunFields(detail.runs)}
        units={units}
        alloyLabel={lastAlloy ? `${lastAlloy.designation} (${lastAlloy.uns})` : null}
        editable
        saveLabel="Save run"
        onSave={async (values) => {
          const run = await create.mutateAsync(values);
          router.replace(`/jobs/${detail.id}/runs/${run.id}`);
        }}
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
});
