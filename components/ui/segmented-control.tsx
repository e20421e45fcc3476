import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTarget, typography } from '../../constants/theme';
import { Text } from './text';
import { pressState } from './press-state';
import { FieldError } from './field-error';

export interface SegmentOption<T extends string> {
  value: T;
  label: string;
}

export interface SegmentedControlProps<T extends string> {
  /** Visible group label; also the radio group's accessible name. */
  label: string;
  options: readonly SegmentOption<T>[];
  value: T | undefined;
  onChange: (value: T) => void;
  error?: string;
  disabled?: boolean;
}

/** A single choice among a few options, as a radio group with large targets. */
export function SegmentedControl<T extends string>({
  label,
  options,
  value,
  onChange,
  error,
  disabled = false,
}: SegmentedControlProps<T>) {
  return (
    <View style={styles.wrapper}>
      <Text variant="label">{label}</Text>
      <View accessibilityRole="radiogroup" accessibilityLabel={label} style={styles.group}>
        {options.map((option) => {
          const selected = option.value === value;
          return (
            <Pressable
              key={option.value}
              accessibilityRole="radio"
              accessibilityLabel={option.label}
              accessibilityState={{ checked: selected, disabled }}
              aria-checked={selected}
              disabled={disabled}
              onPress={() => onChange(option.value)}
              style={(state) => {
        const { focused } = pressState(state);
        return [
                styles.segment,
                selected && styles.selected,
                focused && styles.focused,
              ];
      }}
            >
              <Text style={[styles.segmentLabel, selected && styles.selectedLabel]}>{option.label}</Text>
            </Pressable>
          );
        })}
      </View>
      <FieldError message={error} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.xs, alignSelf: 'stretch' },
  group: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  segment: {
    minHeight: touchTarget,
    flexGrow: 1,
    paddingHorizontal: spacing.lg,
    alignItems: 'center',
    justifyContent: 'center',
    borderRadius: radii.md,
    borderWidth: 2,
    borderColor: colors.borderStrong,
    backgroundColor: colors.surfaceRaised,
  },
  selected: { backgroundColor: colors.primary, borderColor: colors.primary },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 },
  segmentLabel: { ...typography.label, color: colors.text },
  selectedLabel: { color: colors.onPrimary },
});
