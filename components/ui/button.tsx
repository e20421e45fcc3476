import { ActivityIndicator, Pressable, type PressableProps, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTarget, typography } from '../../constants/theme';
import { Text } from './text';
import { pressState } from './press-state';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';

export interface ButtonProps extends Omit<PressableProps, 'children' | 'style'> {
  /** The visible text. */
  label: string;
  /** The accessible name when it should say more than the visible text (e.g. which user). */
  accessibilityLabel?: string;
  variant?: Variant;
  loading?: boolean;
  fullWidth?: boolean;
  compact?: boolean;
}

export function Button({
  label,
  accessibilityLabel,
  variant = 'primary',
  loading = false,
  disabled = false,
  fullWidth = false,
  compact = false,
  ...rest
}: ButtonProps) {
  const inactive = Boolean(disabled) || loading;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityState={{ disabled: inactive, busy: loading }}
      disabled={inactive}
      style={(state) => {
        const { pressed, hovered, focused } = pressState(state);
        return [
        styles.base,
        compact && styles.compact,
        fullWidth && styles.fullWidth,
        styles[variant],
        (pressed || hovered) && !inactive && pressedStyles[variant],
        focused && styles.focused,
        inactive && styles.inactive,
      ];
      }}
      {...rest}
    >
      <View style={styles.content}>
        {loading ? <ActivityIndicator size="small" color={spinnerColor[variant]} /> : null}
        <Text style={[styles.label, { color: labelColor[variant] }]}>{label}</Text>
      </View>
    </Pressable>
  );
}

const labelColor: Record<Variant, string> = {
  primary: colors.onPrimary,
  secondary: colors.primary,
  ghost: colors.text,
  danger: colors.onDanger,
};
const spinnerColor = labelColor;

const styles = StyleSheet.create({
  base: {
    minHeight: touchTarget,
    minWidth: touchTarget,
    paddingHorizontal: spacing.xl,
    borderRadius: radii.md,
    borderWidth: 2,
    alignItems: 'center',
    justifyContent: 'center',
  },
  compact: { paddingHorizontal: spacing.lg },
  fullWidth: { alignSelf: 'stretch' },
  content: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  label: { ...typography.label, fontSize: 17 },
  primary: { backgroundColor: colors.primary, borderColor: colors.primary },
  secondary: { backgroundColor: colors.surfaceRaised, borderColor: colors.primary },
  ghost: { backgroundColor: 'transparent', borderColor: colors.border },
  danger: { backgroundColor: colors.danger, borderColor: colors.danger },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 },
  inactive: { opacity: 0.55 },
});

const pressedStyles = StyleSheet.create({
  primary: { backgroundColor: colors.primaryPressed, borderColor: colors.primaryPressed },
  secondary: { backgroundColor: colors.primarySoft },
  ghost: { backgroundColor: colors.surfaceSunken },
  danger: { opacity: 0.9 },
});
