import { Link } from 'expo-router';
import { StyleSheet } from 'react-native';
import { Screen } from '../components/ui/screen';
import { Text } from '../components/ui/text';
import { colors, spacing, typography } from '../constants/theme';
import { useScreenTitle } from '../components/ui/use-screen-title';

export default function NotFoundScreen() {
  useScreenTitle('Page not found');
  return (
    <Screen narrow>
      <Text variant="title" headingLevel={1}>
        Page not found
      </Text>
      <Text tone="muted">There is nothing at this address. It may have moved, or the link may be mistyped.</Text>
      <Link href="/" style={styles.link}>
        Go to home
      </Link>
    </Screen>
  );
}

const styles = StyleSheet.create({
  link: { ...typography.bodyStrong, color: colors.primary, textDecorationLine: 'underline', paddingVertical: spacing.md },
});
