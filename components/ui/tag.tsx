import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { Text } from './text';

export type TagTone = 'neutral' | 'warning' | 'primary' | 'danger' | 'success';

/** A short status word beside a value: "demo", "draft", "retired", "to be verified". */
export function Tag({ label, tone = 'neutral' }: { label: string; tone?: TagTone }) {
  return (
    <View style={[styles.tag, toneStyles[tone]]}>
      <Text variant="overline" tone={textTone[tone]}>
        {label}
      </Text>
    </View>
  );
}

const textTone = { neutral: 'muted', warning: 'warning', primary: 'primary', danger: 'danger', success: 'success' } as const;

const styles = StyleSheet.create({
  tag: {
    alignSelf: 'flex-start',
    // A long part name wraps inside the tag instead of running off a phone's screen.
    maxWidth: '100%',
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xxs,
    borderRadius: radii.sm,
    borderWidth: 1,
  },
});

const toneStyles = StyleSheet.create({
  neutral: { backgroundColor: colors.surfaceSunken, borderColor: colors.border },
  warning: { backgroundColor: colors.warningSoft, borderColor: colors.warning },
  primary: { backgroundColor: colors.primarySoft, borderColor: colors.primary },
  danger: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
  success: { backgroundColor: colors.successSoft, borderColor: colors.success },
});
