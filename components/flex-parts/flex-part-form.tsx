import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, type FieldPath } from 'react-hook-form';
import type { z } from 'zod';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { FLEX_PURPOSES } from '../../shared/engine/flex-purposes';
import { FLEX_PURPOSE_LABELS, flexPartInputSchema, type FlexPartInput } from '../../shared/schemas/alloy';
import { ChoicePicker } from '../ui/choice-picker';
import { placeServerErrors } from '../ui/server-errors';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { TextField } from '../ui/text-field';
import { useCheckedForm } from '../forms/use-checked-form';
import { useUnits } from '../../hooks/use-units';
import type { QuantityKind } from '../../shared/units';
import { UnitNumberField } from '../units/unit-number-field';

/** What the form holds: the schema's input, where `active` may be left out. */
type Draft = z.input<typeof flexPartInputSchema>;

/** `optional` fields may be left empty (saved as "not given"). */
/** Lengths and the temperature are typed in the user's units (the label says which) and kept in mm and °C. */
const NUMBERS: { name: FieldPath<Draft>; label: string; kind?: QuantityKind; hint?: string; optional?: boolean }[] = [
  { name: 'boreMm', label: 'Bore', kind: 'length' },
  { name: 'liveLengthMm', label: 'Live length', kind: 'length', hint: 'The convoluted length' },
  { name: 'overallLengthMm', label: 'Overall length', kind: 'length', hint: 'Face to face; empty: the live length', optional: true },
  { name: 'meanDiameterMm', label: 'Mean diameter', kind: 'length', hint: 'Of the convolutions, from the maker’s drawing; empty: estimated as 1.15 × bore', optional: true },
  { name: 'ratedAxialCompressionMm', label: 'Rated compression', kind: 'length' },
  { name: 'ratedAxialExtensionMm', label: 'Rated extension', kind: 'length' },
  { name: 'lateralOffsetMm', label: 'Lateral offset', kind: 'length' },
  { name: 'ratedAngularDeg', label: 'Rated rotation (°)' },
  { name: 'ratedCycles', label: 'Rated cycles', hint: 'At the rated movements; empty: not rated', optional: true },
  { name: 'maxTempC', label: 'Maximum temperature', kind: 'temperature' },
  { name: 'price', label: 'Price' },
];

const PURPOSE_OPTIONS = FLEX_PURPOSES.map((value) => ({ value, label: FLEX_PURPOSE_LABELS[value] }));

export const EMPTY_FLEX_PART: Draft = {
  code: '',
  name: '',
  boreMm: Number.NaN,
  liveLengthMm: Number.NaN,
  ratedAxialCompressionMm: Number.NaN,
  ratedAxialExtensionMm: Number.NaN,
  lateralOffsetMm: Number.NaN,
  purpose: 'thermal_bellows',
  overallLengthMm: null,
  meanDiameterMm: null,
  ratedAngularDeg: Number.NaN,
  ratedCycles: null,
  maxTempC: Number.NaN,
  price: Number.NaN,
  currency: 'EUR',
  cuffUns: null,
  active: true,
};

export interface FlexPartFormProps {
  defaultValues: Draft;
  submitLabel: string;
  onSubmit: (values: FlexPartInput) => Promise<unknown>;
  onCancel?: () => void;
  /** Names the form's fields apart when several forms are open. */
  context?: string;
}

export function FlexPartForm({ defaultValues, submitLabel, onSubmit, onCancel, context }: FlexPartFormProps) {
  const [failure, setFailure] = useState<string>();
  const { control, handleSubmit, setError, reset, formState: { errors, isSubmitting } } = useCheckedForm<Draft, unknown, FlexPartInput>({
    resolver: zodResolver(flexPartInputSchema),
    defaultValues,
  });
  const suffix = context ? `, ${context}` : '';
  const units = useUnits();

  const submit = handleSubmit(async (values) => {
    setFailure(undefined);
    try {
      await onSubmit(values);
      if (!onCancel) reset(EMPTY_FLEX_PART);
    } catch (error) {
      placeServerErrors(error, setError);
      setFailure(messageOf(error));
    }
  });

  return (
    <View style={styles.form}>
      {failure ? <ErrorBanner title="Not saved: your entries are still here" message={failure} /> : null}
      {(['code', 'name', 'currency'] as const).map((name) => (
        <Controller
          key={name}
          control={control}
          name={name}
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label={`${{ code: 'Part code', name: 'Name', currency: 'Currency' }[name]}${suffix}`}
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              error={errors[name]?.message}
              autoCapitalize={name === 'name' ? 'sentences' : 'characters'}
            />
          )}
        />
      ))}
      <Controller
        control={control}
        name="purpose"
        render={({ field }) => (
          <ChoicePicker
            label={`What the part is for${suffix}`}
            choices={PURPOSE_OPTIONS}
            value={field.value}
            onChange={field.onChange}
            error={errors.purpose?.message}
          />
        )}
      />
      <Controller
        control={control}
        name="cuffUns"
        render={({ field }) => (
          <TextField
            ref={field.ref}
            label={`Cuff alloy (UNS)${suffix}`}
            value={field.value ?? ''}
            onChangeText={(t) => field.onChange(t.trim() ? t : null)}
            onBlur={field.onBlur}
            error={errors.cuffUns?.message}
            hint="The weld cuffs' alloy from the maker's drawing, e.g. S32100; empty: not stated (the weld plan then names no filler for the cuffs)"
            autoCapitalize="characters"
          />
        )}
      />
      <View style={styles.grid}>
        {NUMBERS.map(({ name, label, kind, hint, optional }) => (
          <View key={name} style={styles.cell}>
            <Controller
              control={control}
              name={name}
              render={({ field }) => (
                <UnitNumberField
                  ref={field.ref}
                  label={label}
                  labelSuffix={suffix}
                  kind={kind}
                  units={units}
                  value={(field.value as number | null) ?? Number.NaN}
                  onChange={(v: number) => field.onChange(optional && Number.isNaN(v) ? null : v)}
                  hint={hint}
                  onBlur={field.onBlur}
                  error={(errors as Record<string, { message?: string } | undefined>)[name]?.message}
                />
              )}
            />
          </View>
        ))}
      </View>
      <View style={styles.actions}>
        <Button label={submitLabel} compact loading={isSubmitting} onPress={() => void submit()} />
        {onCancel ? <Button label="Cancel" variant="ghost" compact onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 180 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
