import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTarget } from '../../constants/theme';
import { pressState } from './press-state';
import { Text } from './text';

export interface CheckBoxProps {
  label: string;
  /** A longer accessible name when the visible label is short (e.g. which alloy). */
  accessibilityLabel?: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  disabled?: boolean;
}

export function CheckBox({ label, accessibilityLabel, checked, onChange, disabled = false }: CheckBoxProps) {
  return (
    <Pressable
      accessibilityRole="checkbox"
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityState={{ checked, disabled }}
      aria-checked={checked}
      disabled={disabled}
      onPress={() => onChange(!checked)}
      style={(state) => [styles.row, pressState(state).focused && styles.focused, disabled && styles.disabled]}
    >
      <View style={[styles.box, checked && styles.checked]}>
        {checked ? <Text style={styles.tick}>✓</Text> : null}
      </View>
      <Text variant="label">{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: touchTarget, flexDirection: 'row', alignItems: 'center', gap: spacing.sm, alignSelf: 'flex-start', paddingRight: spacing.sm },
  box: {
    width: 28,
    height: 28,
    borderRadius: radii.sm,
    borderWidth: 2,
    borderColor: colors.borderStrong,
    backgroundColor: colors.surfaceRaised,
    alignItems: 'center',
    justifyContent: 'center',
  },
  checked: { backgroundColor: colors.primary, borderColor: colors.primary },
  tick: { color: colors.onPrimary, fontSize: 18, lineHeight: 20 },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2, borderRadius: radii.sm },
  disabled: { opacity: 0.55 },
});
