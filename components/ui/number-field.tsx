import { forwardRef, useState } from 'react';
import type { TextInput } from 'react-native';
import { TextField, type TextFieldProps } from './text-field';

export interface NumberFieldProps extends Omit<TextFieldProps, 'value' | 'onChangeText' | 'onChange'> {
  value: number | undefined | null;
  /** NaN while the box is empty or not a number, so the schema says what is wrong. */
  onChange: (value: number) => void;
}

function parse(text: string): number {
  const trimmed = text.trim().replace(',', '.');
  return trimmed === '' ? Number.NaN : Number(trimmed);
}

const blank = (v: number | undefined | null) => v === undefined || v === null || Number.isNaN(v);

/**
 * A number typed as text: what the person typed ("12.", "-") stays in the box while it is
 * on its way to a number, and a value set from outside (a reset) replaces it.
 */
export const NumberField = forwardRef<TextInput, NumberFieldProps>(function NumberField({ value, onChange, ...rest }, ref) {
  const [text, setText] = useState(blank(value) ? '' : String(value));
  const parsed = parse(text);
  const inSync = Object.is(parsed, value) || (Number.isNaN(parsed) && blank(value));
  const shown = inSync ? text : blank(value) ? '' : String(value);
  return (
    <TextField
      ref={ref}
      value={shown}
      onChangeText={(t) => {
        setText(t);
        onChange(parse(t));
      }}
      inputMode="decimal"
      keyboardType="numbers-and-punctuation"
      {...rest}
    />
  );
});
