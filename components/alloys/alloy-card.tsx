import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, spacing, touchTarget, typography } from '../../constants/theme';
import type { AlloySummary } from '../../shared/schemas/alloy';
import type { UnitSystem } from '../../shared/units';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { CheckBox } from '../ui/check-box';
import { Fact } from '../ui/fact';
import { familyLabel, formatTemp } from './format';
import { statusTags, summaryValues } from './summary-values';
import { Tag } from '../ui/tag';

export interface AlloyRowProps {
  alloy: AlloySummary;
  atC: number;
  units: UnitSystem;
  selected: boolean;
  onToggleCompare: (selected: boolean) => void;
  compareDisabled: boolean;
}

export function AlloyCard({ alloy, atC, units, selected, onToggleCompare, compareDisabled }: AlloyRowProps) {
  const v = summaryValues(alloy, units);
  return (
    <Card role="article" aria-label={alloy.designation} edge={selected ? 'accent' : undefined}>
      <View style={styles.header}>
        <Link href={`/alloys/${alloy.id}`} style={styles.name} accessibilityRole="link">
          {alloy.designation}
        </Link>
        <Text tone="muted" selectable>
          UNS {alloy.uns}
        </Text>
      </View>
      <Text variant="caption" tone="muted">
        {familyLabel(alloy.family)}
      </Text>
      <View style={styles.tags}>
        {statusTags(alloy).map((t) => (
          <Tag key={t.label} {...t} />
        ))}
      </View>
      <View style={styles.facts}>
        <Fact label="Continuous" value={v.continuous} />
        <Fact label="Intermittent" value={v.intermittent} />
        <Fact label={`Growth at ${formatTemp(atC, units)}`} value={v.growth} />
        <Fact label="Price" value={v.price}>
          {alloy.priceIsDemo ? <Tag label="demo" /> : null}
        </Fact>
      </View>
      <CheckBox
        label="Compare"
        accessibilityLabel={`Compare ${alloy.designation}`}
        checked={selected}
        disabled={compareDisabled && !selected}
        onChange={onToggleCompare}
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', justifyContent: 'space-between', gap: spacing.sm },
  name: { ...typography.heading, color: colors.primary, textDecorationLine: 'underline', minHeight: touchTarget, paddingVertical: spacing.sm },
  tags: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
