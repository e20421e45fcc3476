import { View, StyleSheet } from 'react-native';
import { spacing } from '../../constants/theme';
import type { RestraintResult } from '../../shared/engine/types';
import { stressFigure } from '../../shared/jobs/stress-figure';
import type { UnitSystem } from '../../shared/units';
import { Fact } from '../ui/fact';
import { Section } from '../ui/section';
import { Text } from '../ui/text';
import { RESTRAINT_MEANING, STRESS_VERDICT_LABELS, stressLine } from './restraint-words';

function consequence(r: RestraintResult, restrained: boolean): string {
  if (!restrained) return 'Something in this run takes up the growth, so the figure above is only what the tube would see if it were held.';
  switch (r.verdict) {
    case 'yields':
      return 'Both ends are held and no joint is fitted: the tube would yield. Fit a flex section or a slip joint, or let an end slide.';
    case 'marginal':
      return 'Both ends are held and no joint is fitted: the stress is within the margin of yield. Fit a joint or let an end slide, or have it checked by an engineer.';
    case 'clear':
      return 'Both ends are held and the stress stays well below yield, with the margin stated below.';
    default:
      return r.missing === 'modulus'
        ? 'The alloy has no modulus data, so the data cannot say whether the tube yields.'
        : 'The data cannot say whether the tube yields.';
  }
}

/** The restrained stress as the flag it is, with its basis and margin named. */
export function RestraintSection({ restraint, restrained, units }: { restraint: RestraintResult; restrained: boolean; units: UnitSystem }) {
  const figure = stressFigure(restraint);
  return (
    <Section title="Restrained stress" intro={RESTRAINT_MEANING}>
      <View style={styles.facts}>
        <Fact label="Stress if nothing gave" value={stressLine(figure, units)} />
        <Fact label="Verdict" value={STRESS_VERDICT_LABELS[figure.verdict]} />
      </View>
      <Text tone="muted">{consequence(restraint, restrained)}</Text>
      <View style={styles.notes}>
        <Text variant="caption" tone="muted">
          {restraint.clearRatioNote}.
        </Text>
        <Text variant="caption" tone="muted">
          Modulus (E) from {restraint.modulusBasis ?? 'the alloy’s modulus table'}; yield from {restraint.yieldBasis ?? 'the alloy’s yield table'}. Elastic, element by element, with both ends held rigidly: an upper bound, not a piping stress analysis.
        </Text>
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  notes: { gap: spacing.xxs },
});
