import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { Text } from '../ui/text';

/** A bar with the percentage written beside it; `fraction` runs from 0 to 1. */
export function UploadProgress({ fraction, label = 'Upload progress' }: { fraction: number; label?: string }) {
  const percent = Math.round(Math.min(Math.max(fraction, 0), 1) * 100);
  return (
    <View style={styles.wrapper}>
      <View
        accessible
        accessibilityRole="progressbar"
        accessibilityLabel={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={`${percent} %`}
        style={styles.track}
      >
        <View style={[styles.fill, { width: `${percent}%` }]} />
      </View>
      <Text variant="label" style={styles.percent}>
        {`${percent} %`}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  track: {
    flex: 1,
    height: 16,
    borderRadius: radii.pill,
    backgroundColor: colors.surfaceSunken,
    borderWidth: 1,
    borderColor: colors.borderStrong,
    overflow: 'hidden',
  },
  fill: { height: '100%', backgroundColor: colors.primary },
  percent: { minWidth: 56, textAlign: 'right' },
});
