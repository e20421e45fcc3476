import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { isRestrained } from '../../shared/jobs/fixed-points';
import type { FlexResult, RunResult, SlipResult } from '../../shared/engine/types';
import type { RunFields } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { CautionsNote } from '../ui/cautions-note';
import { Fact } from '../ui/fact';
import { Section } from '../ui/section';
import { LIMIT_VERDICTS, runVerdicts } from '../jobs/run-verdict';
import { VerdictTags } from '../jobs/tag-row';
import { LoadingState } from '../ui/loading-state';
import { Text } from '../ui/text';
import { show, showMoney, showRatio, showSigned } from '../units/format';
import { RunCharts } from './run-charts';
import type { LiveResult } from './use-live-result';

export interface RunResultsProps {
  live: LiveResult;
  fields: RunFields;
  units: UnitSystem;
}

/** Everything the run does hot, recomputed as the inputs change, with the cautions beside it. */
export function RunResults({ live, fields, units }: RunResultsProps) {
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
          <Text tone={live.state === 'waiting' ? 'muted' : 'danger'}>{live.message}</Text>
        </View>
      )}
      <CautionsNote />
    </View>
  );
}

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

      <Section title="Restrained stress">
        <View style={styles.facts}>
          <Fact label="Stress if held at both ends" value={show('stress', result.restrainedStressMPa, units)} />
          <Fact label="Yield at that temperature" value={result.yieldAtPeakMPa === null ? 'not in the data' : show('stress', result.yieldAtPeakMPa, units)} />
          <Fact label="Stress against yield" value={showRatio(result.stressRatio)} />
        </View>
        <Text tone="muted">
          {restrained
            ? result.jointNeeded
              ? 'Both ends are held and no joint is fitted: the tube would yield. Fit a flex section or a slip joint, or let an end slide.'
              : result.jointNeeded === false
                ? 'Both ends are held and the tube stays below yield.'
                : 'The data cannot say whether the tube yields.'
            : 'Something in this run takes up the growth, so the stress above is what the tube would see if it were held.'}
        </Text>
      </Section>

      {result.flex ? <FlexSizing flex={result.flex} units={units} /> : null}
      {result.slip ? <SlipSizing slip={result.slip} units={units} /> : null}

      {result.warnings.length > 0 ? (
        <Section title="Warnings">
          <View role="list" aria-label="Warnings" style={styles.list}>
            {result.warnings.map((w) => (
              <View key={w.code + w.message} role="listitem" style={styles.warning}>
                <Text tone="warning">{w.message}</Text>
              </View>
            ))}
          </View>
        </Section>
      ) : null}
    </View>
  );
}

function FlexSizing({ flex, units }: { flex: FlexResult; units: UnitSystem }) {
  return (
    <Section title="Flex section">
      <View style={styles.facts}>
        <Fact label="Movement to take" value={show('smallLength', flex.requiredMovementMm, units)} />
        <Fact label="Cold pre-set" value={show('smallLength', flex.presetMm, units)} />
        <Fact label={flex.tempBasis === 'location' ? 'Temperature at the flex' : 'Judged at the run peak'} value={show('temperature', flex.tempAtFlexC, units)} />
      </View>
      {flex.chosen ? (
        <Text tone="success" variant="bodyStrong">
          Fits: {flex.chosen.name}. Stretch it {show('smallLength', flex.chosen.presetMm, units)} at install.
        </Text>
      ) : (
        <Text tone="danger" variant="bodyStrong">
          {flex.noneFitsReason ?? 'No flex part in the catalogue fits this run.'}
        </Text>
      )}
      <Text variant="caption" tone="muted">
        {flex.movementMarginNote}
      </Text>
    </Section>
  );
}

function SlipSizing({ slip, units }: { slip: SlipResult; units: UnitSystem }) {
  return (
    <Section title="Slip joint">
      <View style={styles.facts}>
        <Fact label="Hot axial closure" value={show('smallLength', slip.hotAxialClosureMm, units)} />
        <Fact label="Cold axial gap" value={show('smallLength', slip.coldAxialGapMm, units)} />
        <Fact label="Hot engagement" value={show('length', slip.hotEngagementMm, units)} />
        <Fact label="Minimum engagement" value={show('length', slip.minEngagementMm, units)} />
        <Fact label="Diametral growth difference" value={show('smallLength', slip.differentialDiametralGrowthMm, units, units === 'metric' ? 3 : 4)} />
        <Fact label="Hot clearance" value={show('smallLength', slip.hotClearanceMm, units, units === 'metric' ? 3 : 4)} />
      </View>
      <Text tone={slip.verdict === 'ok' ? 'success' : 'danger'} variant="bodyStrong">
        {slip.verdict === 'ok' ? 'Slides hot: the spigot keeps clearance in the sleeve.' : 'Seizes hot: the spigot grows into the sleeve.'}
      </Text>
      <Text tone={slip.bottomsOut ? 'danger' : 'success'}>
        {slip.bottomsOut ? 'Bottoms out: the growth closes the whole axial gap.' : 'The axial gap is enough for the growth.'}
      </Text>
      <Text tone={slip.engagementOk ? 'success' : 'warning'}>
        {slip.engagementOk ? 'Enough engagement stays when hot.' : 'Too little engagement stays when hot.'}
      </Text>
    </Section>
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
