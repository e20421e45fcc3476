import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { Tag } from '../ui/tag';
import type { Verdict } from './run-verdict';

export function VerdictTags({ verdicts, label = 'Verdict' }: { verdicts: Verdict[]; label?: string }) {
  if (verdicts.length === 0) return null;
  return (
    <View style={styles.row} role="group" aria-label={`${label}: ${verdicts.map((v) => v.label).join(', ')}`}>
      {verdicts.map((v) => (
        <Tag key={v.label} label={v.label} tone={v.tone} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
