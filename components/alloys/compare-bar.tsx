import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

export const MAX_COMPARE = 4;
const MIN_COMPARE = 2;

export function CompareBar({ selectedIds, onClear }: { selectedIds: string[]; onClear: () => void }) {
  const router = useRouter();
  const n = selectedIds.length;
  const ready = n >= MIN_COMPARE && n <= MAX_COMPARE;
  return (
    <View style={styles.bar} aria-live="polite">
      <Text style={styles.text}>
        {n === 0
          ? `Tick ${MIN_COMPARE} to ${MAX_COMPARE} alloys to compare them side by side.`
          : `${n} of up to ${MAX_COMPARE} picked${ready ? '' : `: pick at least ${MIN_COMPARE}`}.`}
      </Text>
      <View style={styles.actions}>
        <Button
          label={`Compare ${n > 0 ? n : ''} alloys`.replace('  ', ' ')}
          accessibilityLabel="Compare selected alloys"
          compact
          disabled={!ready}
          onPress={() => router.push(`/alloys/compare?ids=${selectedIds.map(encodeURIComponent).join(',')}`)}
        />
        {n > 0 ? <Button label="Clear" accessibilityLabel="Clear the comparison" variant="ghost" compact onPress={onClear} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.sm,
    padding: spacing.md,
    borderRadius: radii.md,
    backgroundColor: colors.primarySoft,
  },
  text: { flexShrink: 1, minWidth: 200 },
  actions: { flexDirection: 'row', gap: spacing.sm },
});
