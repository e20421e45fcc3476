import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTarget, typography } from '../../constants/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import type { NextStep } from './role-steps';

export function NextStepCard({ step }: { step: NextStep }) {
  const available = Boolean(step.href);
  return (
    <Card edge={available ? 'accent' : 'muted'} style={styles.card}>
      <Text variant="heading" headingLevel={3}>
        {step.title}
      </Text>
      <Text tone="muted">{step.body}</Text>
      {step.href ? (
        <Link href={step.href} style={styles.link} accessibilityRole="link">
          {step.linkLabel ?? 'Open'}
        </Link>
      ) : (
        <View style={styles.badge}>
          <Text variant="overline" tone="muted">
            Not available yet
          </Text>
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { flexGrow: 1, flexBasis: 280 },
  link: {
    ...typography.bodyStrong,
    color: colors.primary,
    textDecorationLine: 'underline',
    minHeight: touchTarget,
    paddingVertical: spacing.md,
    alignSelf: 'flex-start',
  },
  badge: {
    alignSelf: 'flex-start',
    marginTop: spacing.xs,
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xs,
    borderRadius: radii.sm,
    backgroundColor: colors.surfaceSunken,
  },
});
