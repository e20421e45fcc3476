import { StyleSheet, View } from 'react-native';
import { colors, fonts, radii, spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useWeldPlanQuery } from '../../hooks/use-weld-rules';
import type { WeldPlan } from '../../shared/welds/weld-plan';
import { ErrorBanner } from '../ui/error-banner';
import { Section } from '../ui/section';
import { Text } from '../ui/text';
import { WeldRow } from './weld-row';

/** The procedure and fume cautions, once per plan. */
function WeldCautions({ plan }: { plan: WeldPlan }) {
  const fumes = [...new Set(plan.runs.flatMap((r) => r.welds.flatMap((w) => w.fumes)))];
  return (
    <View style={styles.caution} accessibilityRole="summary" aria-label="Welding cautions">
      <Text variant="caption">
        <Text variant="caption" style={styles.strong}>
          Procedure.{' '}
        </Text>
        {plan.governs}
      </Text>
      {fumes.map((f) => (
        <Text key={f} variant="caption">
          <Text variant="caption" style={styles.strong}>
            Fume.{' '}
          </Text>
          {f}.
        </Text>
      ))}
    </View>
  );
}

export function WeldPlanList({ plan }: { plan: WeldPlan }) {
  const count = plan.runs.reduce((n, r) => n + r.welds.length, 0);
  return (
    <>
      <WeldCautions plan={plan} />
      {plan.openCount > 0 ? (
        <Text tone="warning">
          {plan.openCount} of {count} welds have no filler yet: see each one below.
        </Text>
      ) : null}
      {plan.runs.map((run) => (
        <View key={run.runId} style={styles.run}>
          <Text variant="label">
            {run.position}. {run.runName}
          </Text>
          {run.welds.length === 0 ? (
            <Text tone="muted">No welds: the tube carries on through both ends.</Text>
          ) : (
            <View role="list" aria-label={`Welds of ${run.runName}`} style={styles.list}>
              {run.welds.map((w) => (
                <WeldRow key={w.key} weld={w} />
              ))}
            </View>
          )}
        </View>
      ))}
    </>
  );
}

/** The job's welds per run, fetched for the job page and the job sheet alike. */
export function WeldPlanSection({ jobId }: { jobId: string }) {
  const plan = useWeldPlanQuery(jobId);
  return (
    <Section title="Weld plan" intro="Each weld with its base metals and the filler, purge and shielding the shop's weld rules give for the pair.">
      {plan.isPending ? (
        <Text tone="muted">Loading the welds…</Text>
      ) : plan.isError ? (
        <ErrorBanner title="The weld plan did not load" message={messageOf(plan.error)} onRetry={() => void plan.refetch()} />
      ) : plan.data.runs.length === 0 ? (
        <Text tone="muted">No runs, so no welds yet.</Text>
      ) : (
        <WeldPlanList plan={plan.data} />
      )}
    </Section>
  );
}

const styles = StyleSheet.create({
  caution: { gap: spacing.xs, padding: spacing.md, borderRadius: radii.md, borderLeftWidth: 6, borderLeftColor: colors.warning, backgroundColor: colors.warningSoft },
  strong: { fontFamily: fonts.semibold },
  run: { gap: spacing.xs },
  list: { gap: spacing.xs },
});
