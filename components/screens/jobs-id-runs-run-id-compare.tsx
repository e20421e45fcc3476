import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { CautionsNote } from '../ui/cautions-note';
import { CheckBox } from '../ui/check-box';
import { TextLink } from '../ui/text-link';
import { LoadFailed } from '../jobs/load-failed';
import { canEditJobs } from '../jobs/roles';
import { CompareTable } from '../runs/compare-table';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { UnitSwitch } from '../units/unit-switch';
import { layout, spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useAlloysQuery } from '../../hooks/use-alloys';
import { useJobQuery } from '../../hooks/use-jobs';
import { useCompareQuery, useRunQuery, useUpdateRunMutation } from '../../hooks/use-runs';
import { useSessionQuery } from '../../hooks/use-session';
import { useUnits } from '../../hooks/use-units';
import { COMPARE_MAX, COMPARE_MIN } from '../../shared/schemas/jobs';
import { useScreenTitle } from '../ui/use-screen-title';

export default function CompareRunScreen() {
  const { id, runId } = useLocalSearchParams<{ id: string; runId: string }>();
  const { data: me } = useSessionQuery();
  const units = useUnits();
  const wide = useWindowDimensions().width >= layout.wideBreakpoint;
  const run = useRunQuery(runId);
  const job = useJobQuery(id);
  const alloys = useAlloysQuery({});
  const [selected, setSelected] = useState<string[]>([]);
  const compare = useCompareQuery(runId, selected);
  const adopt = useUpdateRunMutation(runId ?? '');
  const [adopting, setAdopting] = useState<string | null>(null);
  const [notice, setNotice] = useState<string>();
  const [failure, setFailure] = useState<string>();

  useScreenTitle('Compare alloys', run.data ? `Run ${run.data.position}` : null, job.data?.name);
  if (run.isPending) return <LoadingState label="Loading the run…" />;
  if (run.isError) {
    return <LoadFailed title="The run did not load" error={run.error} onRetry={() => void run.refetch()} backHref={`/jobs/${id}`} backLabel="Back to the job" />;
  }
  const saved = run.data;
  const canAdopt = canEditJobs(me) && job.data?.status === 'active';
  const choices = (alloys.data?.items ?? []).filter((a) => a.id !== saved.alloyId);

  const toggle = (alloyId: string, on: boolean) =>
    setSelected((ids) => (on ? (ids.includes(alloyId) || ids.length >= COMPARE_MAX ? ids : [...ids, alloyId]) : ids.filter((x) => x !== alloyId)));

  const onAdopt = async (alloyId: string, designation: string) => {
    setFailure(undefined);
    setNotice(undefined);
    setAdopting(alloyId);
    try {
      const before = saved.alloyId;
      await adopt.mutateAsync({ alloyId });
      // The old alloy takes the new one's place among the candidates, so the same set stays compared.
      setSelected((ids) => ids.map((x) => (x === alloyId ? before : x)));
      setNotice(`${designation} is now the alloy of ${saved.name}.`);
    } catch (error) {
      setFailure(messageOf(error));
    } finally {
      setAdopting(null);
    }
  };

  return (
    <Screen wide>
      <View style={styles.header}>
        <TextLink href={`/jobs/${saved.jobId}/runs/${saved.id}`} label={`← ${saved.name}`} accessibilityLabel={`Back to ${saved.name}`} />
        <Text variant="title" headingLevel={1}>
          Compare alloys for {saved.name}
        </Text>
        <Text tone="muted">
          The same tube, lengths and temperatures worked out with each alloy, against {saved.alloy ? `${saved.alloy.designation} (${saved.alloy.uns})` : 'the run’s alloy'}. Pick {COMPARE_MIN} to {COMPARE_MAX}.
        </Text>
      </View>
      <UnitSwitch />

      <View style={styles.section} role="group" aria-label="Alloys to compare">
        <Text variant="heading" headingLevel={2}>
          Alloys to compare ({selected.length} of {COMPARE_MAX})
        </Text>
        {alloys.isPending ? (
          <LoadingState label="Loading alloys…" />
        ) : alloys.isError ? (
          <ErrorBanner message={messageOf(alloys.error)} onRetry={() => void alloys.refetch()} />
        ) : (
          <View style={styles.choices}>
            {choices.map((a) => (
              <View key={a.id} style={styles.choice}>
                <CheckBox
                  label={`${a.designation} (${a.uns})`}
                  accessibilityLabel={`Compare ${a.designation}`}
                  checked={selected.includes(a.id)}
                  disabled={selected.length >= COMPARE_MAX && !selected.includes(a.id)}
                  onChange={(on) => toggle(a.id, on)}
                />
              </View>
            ))}
          </View>
        )}
      </View>

      {notice ? (
        <View accessible accessibilityRole="alert" aria-live="polite">
          <Text tone="success" variant="bodyStrong">
            {notice}
          </Text>
        </View>
      ) : null}
      {failure ? <ErrorBanner title="The alloy was not changed" message={failure} /> : null}

      {selected.length < COMPARE_MIN ? (
        <EmptyState title={`Pick at least ${COMPARE_MIN} alloys`} message="Tick the alloys above; the comparison appears here." />
      ) : compare.isPending ? (
        <LoadingState label="Working out the run with each alloy…" />
      ) : compare.isError ? (
        <ErrorBanner title="The comparison did not load" message={messageOf(compare.error)} onRetry={() => void compare.refetch()} />
      ) : (
        <CompareTable
          current={compare.data.current}
          candidates={compare.data.candidates}
          units={units}
          wide={wide}
          adopting={adopting}
          onAdopt={canAdopt ? (alloyId, designation) => void onAdopt(alloyId, designation) : undefined}
        />
      )}
      <CautionsNote />
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  section: { gap: spacing.sm },
  choices: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.lg },
  choice: { minWidth: 220 },
});
