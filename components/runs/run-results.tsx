import { wordFieldMessage } from '../../shared/field-messages';
import { memo } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { isRestrained } from '../../shared/jobs/fixed-points';
import type { RunResult } from '../../shared/engine/types';
import type { RunFields } from '../../shared/schemas/jobs';
import { type UnitSystem, wordPhrase } from '../../shared/units';
import { CautionsNote } from '../ui/cautions-note';
import { Fact } from '../ui/fact';
import { Section } from '../ui/section';
import { LIMIT_VERDICTS, runVerdicts } from '../jobs/run-verdict';
import { VerdictTags } from '../jobs/tag-row';
import { LoadingState } from '../ui/loading-state';
import { Text } from '../ui/text';
import { show, showMoney, showSigned } from '../units/format';
import { FlexSection } from './flex-section';
import { RestraintSection } from './restraint-section';
import { SlipSection } from './slip-section';
import { RunCharts } from './run-charts';
import type { LiveResult } from './use-live-result';

export interface RunResultsProps {
  live: LiveResult;
  fields: RunFields;
  units: UnitSystem;
}

/** Everything the run does hot, recomputed as the inputs change, with the cautions beside it. Renders again only when its inputs do. */
export const RunResults = memo(function RunResults({ live, fields, units }: RunResultsProps) {
  return (
    <View style={styles.panel} role="region" aria-label="Results">
      <Text variant="heading" headingLevel={2}>
        Results
      </Text>
      {live.state === 'ok' ? (
        <>
          <Text variant="caption" tone="muted">
            Worked out here as you type from {live.alloy.designation} ({live.alloy.uns}), data version {live.alloy.version}; the server works it out again when you save.
          </Text>
          <ResultBody result={live.result} fields={fields} units={units} designation={live.alloy.designation} currency={live.currency} />
        </>
      ) : live.state === 'loading' ? (
        <LoadingState label="Loading the alloy data…" />
      ) : (
        <View style={styles.notice} role="status">
          <Text variant="bodyStrong" tone={live.state === 'waiting' ? 'default' : 'danger'}>
            {live.state === 'waiting' ? 'Results wait for complete inputs' : 'No result for these inputs'}
          </Text>
          <Text tone={live.state === 'waiting' ? 'muted' : 'danger'}>{wordFieldMessage(live.message, units)}</Text>
        </View>
      )}
      <CautionsNote />
    </View>
  );
});

function ResultBody({ result, fields, units, designation, currency }: { result: RunResult; fields: RunFields; units: UnitSystem; designation: string; currency: string }) {
  const restrained = isRestrained(fields.startFixing, fields.endFixing, fields.joint.type);
  const limit = result.limit;
  return (
    <View style={styles.body}>
      <View style={styles.facts}>
        <Fact label="Growth" value={show('smallLength', result.growthMm, units)} large />
        <Fact label="Peak temperature" value={show('temperature', result.peakTempC, units)} />
        <Fact label="Tube mass" value={show('mass', result.massKg, units)} />
        <Fact label="Material cost" value={showMoney(result.materialCost, currency)} />
      </View>
      <VerdictTags verdicts={runVerdicts({ ...fields, result, problem: null })} label="Verdict" />
      <RunCharts result={result} designation={designation} units={units} />

      <Section title="Temperature limit">
        <View style={styles.facts}>
          <Fact label="Status" value={LIMIT_VERDICTS[limit.status].label} />
          <Fact label="Margin" value={showSigned('temperatureDelta', limit.marginC, units)} />
          <Fact label={`Governing limit (${limit.governedBy})`} value={show('temperature', limit.governingC, units)} />
        </View>
      </Section>

      <RestraintSection restraint={result.restraint} restrained={restrained} units={units} />
      {result.flex ? <FlexSection flex={result.flex} units={units} /> : null}
      {result.slip ? <SlipSection slip={result.slip} units={units} /> : null}

      {result.warnings.length > 0 ? (
        <Section title="Warnings">
          <View role="list" aria-label="Warnings" style={styles.list}>
            {result.warnings.map((w, i) => (
              <View key={`${w.code}-${i}`} role="listitem" style={styles.warning}>
                <Text tone="warning">{wordPhrase(w.message, units)}</Text>
              </View>
            ))}
          </View>
        </Section>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: spacing.lg },
  body: { gap: spacing.xl },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  notice: { gap: spacing.xs, padding: spacing.lg, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surfaceRaised },
  list: { gap: spacing.xs },
  warning: { padding: spacing.md, borderRadius: radii.md, backgroundColor: colors.warningSoft },
});
