import { StyleSheet, View } from 'react-native';
import { colors, fonts, radii, spacing } from '../../constants/theme';
import { CAUTIONS } from '../../shared/engine/cautions';
import { Text } from './text';

/** The cautions that go with every expansion figure Dilato shows. */
export function CautionsNote() {
  return (
    <View style={styles.box} accessibilityRole="summary" aria-label="Cautions">
      <Text variant="overline" tone="warning">
        Cautions
      </Text>
      {CAUTIONS.map((c) => (
        <Text key={c.code} variant="caption">
          <Text variant="caption" style={styles.title}>
            {c.title}.{' '}
          </Text>
          {c.text}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.xs,
    padding: spacing.lg,
    borderRadius: radii.md,
    borderLeftWidth: 6,
    borderLeftColor: colors.warning,
    backgroundColor: colors.warningSoft,
  },
  title: { fontFamily: fonts.semibold },
});
