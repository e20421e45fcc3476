import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import type { DiffEntry } from '../../shared/catalogue/alloy-diff';
import type { SourceView } from '../../shared/schemas/alloy';
import type { UnitSystem } from '../../shared/units';
import { Text } from '../ui/text';
import { describeDiff, NONE } from './diff-text';

export interface DiffListProps {
  diff: DiffEntry[];
  sources: Map<string, SourceView>;
  units: UnitSystem;
  label?: string;
}

/** What changed, one line each: the field or table point, what it was, what it becomes. */
export function DiffList({ diff, sources, units, label = 'Changes' }: DiffListProps) {
  if (diff.length === 0) return <Text tone="muted">No differences.</Text>;
  return (
    <View role="list" aria-label={label} style={styles.list}>
      {diff.map((entry) => {
        const line = describeDiff(entry, sources, units);
        return (
          <View key={entry.path} role="listitem" style={styles.item}>
            <Text variant="bodyStrong">{line.label}</Text>
            <View style={styles.values}>
              {line.before === NONE ? (
                <Text tone="muted">Set to</Text>
              ) : (
                <>
                  <Text tone="muted" style={styles.before}>
                    {line.before}
                  </Text>
                  <Text tone="muted" accessibilityLabel="becomes">
                    →
                  </Text>
                </>
              )}
              <Text>{line.after}</Text>
            </View>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  item: { gap: spacing.xxs, paddingVertical: spacing.xs, borderBottomWidth: 1, borderBottomColor: colors.border },
  values: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, alignItems: 'baseline' },
  before: { textDecorationLine: 'line-through' },
});
