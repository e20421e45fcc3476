import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { QUOTE_STATUS_LABELS, type QuoteStatus } from '../../shared/schemas/quotes';
import { Text } from '../ui/text';

const tone: Record<QuoteStatus, 'default' | 'primary' | 'success' | 'danger' | 'warning' | 'muted'> = {
  draft: 'muted',
  sent: 'primary',
  viewed: 'primary',
  accepted: 'success',
  declined: 'danger',
  expired: 'warning',
};

export function StatusBadge({ status }: { status: QuoteStatus }) {
  return (
    <View style={[styles.badge, backgrounds[status]]}>
      <Text variant="label" tone={tone[status]}>
        {QUOTE_STATUS_LABELS[status]}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { alignSelf: 'flex-start', paddingHorizontal: spacing.sm, paddingVertical: spacing.xxs, borderRadius: radii.pill },
});

const backgrounds = StyleSheet.create({
  draft: { backgroundColor: colors.surfaceSunken },
  sent: { backgroundColor: colors.primarySoft },
  viewed: { backgroundColor: colors.primarySoft },
  accepted: { backgroundColor: colors.successSoft },
  declined: { backgroundColor: colors.dangerSoft },
  expired: { backgroundColor: colors.warningSoft },
});
