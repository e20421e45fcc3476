import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTarget, typography } from '../../constants/theme';
import { Text } from './text';
import { pressState } from './press-state';
import { FieldError } from './field-error';

export interface Choice {
  value: string;
  label: string;
  hint?: string;
}

export interface ChoicePickerProps {
  /** Visible label; also the accessible name of the toggle and of the list. */
  label: string;
  choices: readonly Choice[];
  value: string | undefined;
  onChange: (value: string) => void;
  placeholder?: string;
  error?: string;
  disabled?: boolean;
}

/** One choice from a longer list (jobs, alloys): a button that opens the list as radios. */
export function ChoicePicker({ label, choices, value, onChange, placeholder = 'Choose…', error, disabled = false }: ChoicePickerProps) {
  const [open, setOpen] = useState(false);
  const current = choices.find((c) => c.value === value);
  return (
    <View style={styles.wrapper}>
      <Text variant="label">{label}</Text>
      <Pressable
        accessibilityRole="button"
        accessibilityLabel={label}
        accessibilityState={{ expanded: open, disabled }}
        aria-expanded={open}
        disabled={disabled}
        onPress={() => setOpen((o) => !o)}
        style={(state) => {
          const { focused, hovered } = pressState(state);
          return [styles.toggle, hovered && styles.hovered, focused && styles.focused, error ? styles.invalid : null];
        }}
      >
        <Text style={current ? undefined : styles.placeholder} numberOfLines={1}>
          {current ? current.label : placeholder}
        </Text>
        <Text tone="muted" aria-hidden>
          {open ? '▴' : '▾'}
        </Text>
      </Pressable>
      {open ? (
        <View accessibilityRole="radiogroup" accessibilityLabel={label} style={styles.list}>
          {choices.map((choice) => {
            const selected = choice.value === value;
            return (
              <Pressable
                key={choice.value}
                accessibilityRole="radio"
                accessibilityLabel={choice.label}
                accessibilityState={{ checked: selected }}
                aria-checked={selected}
                onPress={() => {
                  onChange(choice.value);
                  setOpen(false);
                }}
                style={(state) => {
                  const { focused, hovered } = pressState(state);
                  return [styles.choice, selected && styles.selected, hovered && styles.hovered, focused && styles.focused];
                }}
              >
                <Text variant="bodyStrong">{choice.label}</Text>
                {choice.hint ? (
                  <Text variant="caption" tone="muted">
                    {choice.hint}
                  </Text>
                ) : null}
              </Pressable>
            );
          })}
        </View>
      ) : null}
      <FieldError message={error} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.xs, alignSelf: 'stretch' },
  toggle: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.sm,
    paddingHorizontal: spacing.md,
    borderWidth: 2,
    borderColor: colors.borderStrong,
    borderRadius: radii.md,
    backgroundColor: colors.surfaceRaised,
  },
  placeholder: { ...typography.body, color: colors.textMuted },
  list: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surfaceRaised, overflow: 'hidden' },
  choice: {
    minHeight: touchTarget,
    justifyContent: 'center',
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.xs,
    borderBottomWidth: 1,
    borderBottomColor: colors.border,
  },
  selected: { backgroundColor: colors.primarySoft },
  hovered: { backgroundColor: colors.surfaceSunken },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: -3 },
  invalid: { borderColor: colors.danger },
});
