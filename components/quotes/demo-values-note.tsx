import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { Text } from '../ui/text';

/** Says plainly that prices come from the seeded demo rules, not the shop's own. */
export function DemoValuesNote() {
  return (
    <View style={styles.note}>
      <Text variant="bodyStrong" tone="warning">
        Demo values
      </Text>
      <Text variant="caption">Labour rate, hours per run, scrap allowance and margin are the demo shop’s, not yours. An admin sets the shop’s own under Shop settings.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  note: { gap: spacing.xxs, padding: spacing.md, borderRadius: radii.md, borderLeftWidth: 6, borderLeftColor: colors.warning, backgroundColor: colors.warningSoft },
});
