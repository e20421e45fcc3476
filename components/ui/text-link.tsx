import { Link, type Href } from 'expo-router';
import { StyleSheet } from 'react-native';
import { colors, spacing, touchTarget, typography } from '../../constants/theme';

/** An in-app link that looks like one and is big enough to hit. */
export function TextLink({ href, label, accessibilityLabel }: { href: Href; label: string; accessibilityLabel?: string }) {
  return (
    <Link href={href} style={styles.link} accessibilityRole="link" accessibilityLabel={accessibilityLabel ?? label}>
      {label}
    </Link>
  );
}

/** Also used by DownloadLink, so both kinds of link look alike. */
export const linkStyles = StyleSheet.create({
  link: {
    ...typography.bodyStrong,
    color: colors.primary,
    textDecorationLine: 'underline',
    minHeight: touchTarget,
    paddingVertical: spacing.md,
    alignSelf: 'flex-start',
  },
});

const styles = linkStyles;
