import { forwardRef, useId, useState } from 'react';
import { StyleSheet, TextInput, type TextInputProps, View } from 'react-native';
import { colors, radii, spacing, touchTarget, typography } from '../../constants/theme';
import { Text } from './text';

export interface TextFieldProps extends Omit<TextInputProps, 'style' | 'accessibilityLabel'> {
  label: string;
  error?: string;
  hint?: string;
}

/** A labelled input: the label is shown above it and is also the input's accessible name. */
export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField(
  { label, error, hint, onFocus, onBlur, ...rest },
  ref,
) {
  const id = useId();
  const inputId = `field-${id}`;
  const messageId = `${inputId}-message`;
  const [focused, setFocused] = useState(false);
  const message = error ?? hint;
  return (
    <View style={styles.wrapper}>
      <Text variant="label" nativeID={`${inputId}-label`}>
        {label}
      </Text>
      <TextInput
        ref={ref}
        nativeID={inputId}
        accessibilityLabel={label}
        aria-labelledby={`${inputId}-label`}
        aria-describedby={message ? messageId : undefined}
        aria-invalid={error ? true : undefined}
        placeholderTextColor={colors.textMuted}
        onFocus={(e) => {
          setFocused(true);
          onFocus?.(e);
        }}
        onBlur={(e) => {
          setFocused(false);
          onBlur?.(e);
        }}
        style={[styles.input, focused && styles.focused, error ? styles.invalid : null]}
        {...rest}
      />
      {message ? (
        <Text nativeID={messageId} variant="caption" tone={error ? 'danger' : 'muted'}>
          {message}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrapper: { gap: spacing.xs, alignSelf: 'stretch' },
  input: {
    ...typography.body,
    minHeight: touchTarget,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderWidth: 2,
    borderColor: colors.borderStrong,
    borderRadius: radii.md,
    backgroundColor: colors.surfaceRaised,
    color: colors.text,
  },
  focused: { borderColor: colors.primary, outlineColor: colors.focus, outlineWidth: 2, outlineStyle: 'solid' },
  invalid: { borderColor: colors.danger },
});
