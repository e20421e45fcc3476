import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { Button } from './button';
import { Text } from './text';

export interface ErrorBannerProps {
  message: string;
  title?: string;
  onRetry?: () => void;
}

/** A message the person must see, announced by screen readers as an alert. */
export function ErrorBanner({ message, title, onRetry }: ErrorBannerProps) {
  return (
    <View style={styles.banner}>
      {/* Only the message is the alert, so the retry button stays reachable on its own. */}
      <View accessible accessibilityRole="alert" aria-live="assertive" style={styles.text}>
        {title ? <Text variant="bodyStrong" tone="danger">{title}</Text> : null}
        <Text tone="danger">{message}</Text>
      </View>
      {onRetry ? <Button label="Try again" variant="secondary" compact onPress={onRetry} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  banner: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: spacing.md,
    padding: spacing.lg,
    borderRadius: radii.md,
    borderWidth: 1,
    borderLeftWidth: 6,
    borderColor: colors.danger,
    backgroundColor: colors.dangerSoft,
  },
  text: { flex: 1, minWidth: 200, gap: spacing.xxs },
});
