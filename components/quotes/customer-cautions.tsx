import { StyleSheet, View } from 'react-native';
import { colors, fonts, radii, spacing } from '../../constants/theme';
import { CAUTIONS } from '../../shared/engine/cautions';
import { Text } from '../ui/text';

/** The cautions that go with every figure, worded for the customer reading the quote. */
export function CustomerCautions() {
  return (
    <View style={styles.box} aria-label="Before you choose">
      <Text variant="heading" headingLevel={2}>
        Before you choose
      </Text>
      <View role="list" style={styles.list}>
        {CAUTIONS.map((c) => (
          <Text key={c.code} role="listitem">
            <Text style={styles.title}>{c.title}: </Text>
            {c.text}
          </Text>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm, padding: spacing.lg, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.warning, backgroundColor: colors.warningSoft },
  list: { gap: spacing.sm },
  title: { fontFamily: fonts.semibold },
});
