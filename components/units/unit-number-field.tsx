import { type Ref, useState } from 'react';
import type { TextInput } from 'react-native';
import { wordFieldMessage } from '../../shared/field-messages';
import { fromDisplay, type QuantityKind, type UnitSystem } from '../../shared/units';
import { TextField, type TextFieldProps } from '../ui/text-field';
import { inputText, withUnit } from './format';

export interface UnitNumberFieldProps extends Omit<TextFieldProps, 'value' | 'onChangeText' | 'onChange' | 'label'> {
  /** The label without its unit; the unit of the chosen system is added. */
  label: string;
  /** Words after the unit, e.g. the part the field belongs to: "Bore (in), DL-FX-1". */
  labelSuffix?: string;
  /** Absent for plain numbers (a factor), which are shown and kept as typed. */
  kind?: QuantityKind;
  units: UnitSystem;
  /** The SI value (mm, °C …); NaN or undefined while empty. */
  value: number | undefined;
  /** Receives SI: what is typed in inches or °F is converted before it reaches the form. */
  onChange: (si: number) => void;
  /** Decimals shown for a stored value, where the kind's trade precision would hide a datum's figures. */
  decimals?: number;
  /** The form's handle on the box, so a failed save can focus it (React 19 passes refs as props). */
  ref?: Ref<TextInput>;
}

function parse(text: string): number {
  const trimmed = text.trim().replace(',', '.');
  return trimmed === '' ? Number.NaN : Number(trimmed);
}

const blank = (v: number | undefined) => v === undefined || Number.isNaN(v);

/** Close enough that the typed text still stands for the value (convert-units is off in the 8th figure). */
function same(a: number, b: number): boolean {
  return Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(a), Math.abs(b));
}

/**
 * A number typed in the user's units and kept in SI. What the person typed stays in the box
 * while it stands for the value; a value set from outside (a preset, a unit switch) replaces it.
 */
export function UnitNumberField({ label, labelSuffix = '', kind, units, value, onChange, decimals, error, ref, ...rest }: UnitNumberFieldProps) {
  const [typed, setTyped] = useState<{ text: string; units: UnitSystem } | null>(null);
  const parsed = typed ? parse(typed.text) : Number.NaN;
  const toSi = (n: number) => (kind ? fromDisplay(kind, n, units) : n);
  const inSync =
    typed !== null &&
    typed.units === units &&
    ((Number.isNaN(parsed) && blank(value)) || (!Number.isNaN(parsed) && !blank(value) && same(toSi(parsed), value!)));
  const shown = inSync ? typed.text : blank(value) ? '' : kind ? inputText(kind, value!, units, decimals) : String(value);
  return (
    <TextField
      ref={ref}
      label={`${kind ? withUnit(label, kind, units) : label}${labelSuffix}`}
      value={shown}
      onChangeText={(text) => {
        setTyped({ text, units });
        const n = parse(text);
        onChange(Number.isNaN(n) ? Number.NaN : toSi(n));
      }}
      error={error ? wordFieldMessage(error, units, kind) : error}
      inputMode="decimal"
      keyboardType="numbers-and-punctuation"
      {...rest}
    />
  );
}
