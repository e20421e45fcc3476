import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { JobSummary } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Fact } from '../ui/fact';
import { Tag } from '../ui/tag';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { show } from '../units/format';
import { headingLinkStyles } from './link-styles';

export function JobCard({ job, units }: { job: JobSummary; units: UnitSystem }) {
  return (
    <Card edge={job.status === 'archived' ? 'muted' : 'accent'} role="article" aria-label={job.name}>
      <View style={styles.title}>
        <Link href={`/jobs/${job.id}`} style={headingLinkStyles.link} accessibilityRole="link" accessibilityLabel={job.name}>
          {job.name}
        </Link>
        {job.status === 'archived' ? <Tag label="archived" /> : null}
        {job.runsWithProblems > 0 ? (
          <Tag label={`${job.runsWithProblems} ${job.runsWithProblems === 1 ? 'run needs' : 'runs need'} attention`} tone="danger" />
        ) : null}
      </View>
      <Text tone="muted">
        {job.customer} · {job.application}
      </Text>
      <View style={styles.facts}>
        <Fact label="Runs" value={String(job.runCount)} />
        <Fact label="Total growth" value={show('smallLength', job.totalGrowthMm, units)} />
        <Fact label="Mass" value={show('mass', job.totalMassKg, units)} />
        <Fact label="Peak" value={job.peakTempC === null ? '—' : show('temperature', job.peakTempC, units)} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  title: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
