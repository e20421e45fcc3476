import { wordFieldMessage } from '../../shared/field-messages';
import { Link } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { fixedPointLabel } from '../../shared/jobs/fixed-points';
import type { RunView } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Fact } from '../ui/fact';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { show } from '../units/format';
import { headingLinkStyles } from './link-styles';
import { runVerdicts } from './run-verdict';
import { VerdictTags } from './tag-row';

export interface RunCardActions {
  onMoveUp?: () => void;
  onMoveDown?: () => void;
  onDuplicate: () => void;
  onDelete: () => void;
  busy: boolean;
}

export const runLength = (run: Pick<RunView, 'segments'>) => run.segments.reduce((sum, s) => sum + s.lengthMm, 0);
export const runPeak = (run: Pick<RunView, 'segments'>) => Math.max(...run.segments.flatMap((s) => [s.startTempC, s.endTempC]));
export const alloyName = (run: Pick<RunView, 'alloy'>) => (run.alloy ? `${run.alloy.designation} (${run.alloy.uns})` : 'No alloy');

/** One run in its job: what it is, what it does hot, and (for editors) moving, copying and deleting it. */
export function RunCard({ run, jobId, units, actions }: { run: RunView; jobId: string; units: UnitSystem; actions?: RunCardActions }) {
  const [confirming, setConfirming] = useState(false);
  return (
    <Card role="article" aria-label={`Run ${run.position}: ${run.name}`}>
      <View style={styles.title}>
        <Text variant="overline" tone="muted">
          Run {run.position}
        </Text>
        <Link
          href={`/jobs/${jobId}/runs/${run.id}`}
          style={headingLinkStyles.link}
          accessibilityRole="link"
          accessibilityLabel={`Open ${run.name}`}
        >
          {run.name}
        </Link>
      </View>
      <Text tone="muted">
        {alloyName(run)} · {fixedPointLabel(run.startFixing)} to {fixedPointLabel(run.endFixing)}
      </Text>
      <View style={styles.facts}>
        <Fact label="Length" value={show('length', runLength(run), units)} />
        <Fact label="Peak" value={show('temperature', runPeak(run), units)} />
        <Fact label="Growth" value={run.result ? show('smallLength', run.result.growthMm, units) : '—'} />
      </View>
      <VerdictTags verdicts={runVerdicts(run)} />
      {run.problem ? <Text tone="danger">{wordFieldMessage(run.problem.message, units)}</Text> : null}
      {actions ? (
        confirming ? (
          <View style={styles.actions} accessibilityRole="alert">
            <Text variant="bodyStrong">Delete {run.name}? Its inputs cannot be brought back.</Text>
            <Button label="Delete" accessibilityLabel={`Confirm delete ${run.name}`} variant="danger" compact loading={actions.busy} onPress={actions.onDelete} />
            <Button label="Keep it" variant="ghost" compact onPress={() => setConfirming(false)} />
          </View>
        ) : (
          <View style={styles.actions}>
            <Button label="Move up" accessibilityLabel={`Move ${run.name} up`} variant="ghost" compact disabled={!actions.onMoveUp || actions.busy} onPress={actions.onMoveUp} />
            <Button label="Move down" accessibilityLabel={`Move ${run.name} down`} variant="ghost" compact disabled={!actions.onMoveDown || actions.busy} onPress={actions.onMoveDown} />
            <Button label="Duplicate" accessibilityLabel={`Duplicate ${run.name}`} variant="secondary" compact disabled={actions.busy} onPress={actions.onDuplicate} />
            <Button label="Delete" accessibilityLabel={`Delete ${run.name}`} variant="ghost" compact disabled={actions.busy} onPress={() => setConfirming(true)} />
          </View>
        )
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  title: { gap: spacing.xxs },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
});
