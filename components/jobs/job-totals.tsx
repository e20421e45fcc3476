import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { JobTotals } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Fact } from '../ui/fact';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { show, showMoney } from '../units/format';

/** The whole system: growth and mass over the runs that have a result. */
export function JobTotalsCard({ totals, units }: { totals: JobTotals; units: UnitSystem }) {
  return (
    <Card edge="primary" role="group" aria-label="System totals">
      <Text variant="heading" headingLevel={2}>
        System totals
      </Text>
      <View style={styles.facts}>
        <Fact label="Total growth" value={show('smallLength', totals.growthMm, units)} large />
        <Fact label="Total mass" value={show('mass', totals.massKg, units)} large />
        <Fact label="Tube length" value={show('length', totals.lengthMm, units)} />
        <Fact label="Peak temperature" value={totals.peakTempC === null ? '—' : show('temperature', totals.peakTempC, units)} />
        <Fact label="Material cost" value={showMoney(totals.materialCost, totals.currency)} />
        <Fact label="Runs" value={String(totals.runCount)} />
      </View>
      {totals.costNote ? <Text tone="warning">{totals.costNote}</Text> : null}
      {totals.runsWithProblems > 0 ? (
        <Text tone="danger">
          {totals.runsWithProblems} {totals.runsWithProblems === 1 ? 'run has' : 'runs have'} no result and {totals.runsWithProblems === 1 ? 'is' : 'are'} left out of these sums.
        </Text>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
