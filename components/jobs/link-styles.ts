import { StyleSheet } from 'react-native';
import { colors, spacing, touchTarget, typography } from '../../constants/theme';

/** A card's title as a link: heading size, and big enough to hit with a glove on. */
export const headingLinkStyles = StyleSheet.create({
  link: {
    ...typography.heading,
    color: colors.primary,
    textDecorationLine: 'underline',
    minHeight: touchTarget,
    paddingVertical: spacing.sm,
    alignSelf: 'flex-start',
  },
});
