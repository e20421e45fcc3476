import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { type Control, Controller, type FieldErrors, type FieldPath, useFieldArray } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import {
  ALLOY_FAMILIES,
  alloyInputSchema,
  type AlloyInput,
  type AlloyInputDraft,
  type SourceInput,
  type SourceView,
} from '../../shared/schemas/alloy';
import { formatQuantity, type QuantityKind, type UnitSystem } from '../../shared/units';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { CheckBox } from '../ui/check-box';
import { familyLabel } from './format';
import { UnitNumberField } from '../units/unit-number-field';
import { PointsTableField } from './points-table-field';
import { catalogueDecimals } from './catalogue-decimals';
import { placeServerErrors } from '../ui/server-errors';
import { SourcePicker } from './source-picker';
import { useCheckedForm } from '../forms/use-checked-form';

const FIELD_KINDS: Record<'densityKgM3' | 'maxContinuousC' | 'maxIntermittentC' | 'pricePerKg' | 'referenceTempC', QuantityKind> = {
  densityKgM3: 'density',
  maxContinuousC: 'temperature',
  maxIntermittentC: 'temperature',
  pricePerKg: 'pricePerMass',
  referenceTempC: 'temperature',
};

const FAMILY_OPTIONS = ALLOY_FAMILIES.map((f) => ({ value: f, label: familyLabel(f) }));

type FormControl = Control<AlloyInputDraft, unknown, AlloyInput>;
type Errors = FieldErrors<AlloyInputDraft>;

export interface AlloyFormProps {
  defaultValues: AlloyInputDraft;
  sources: SourceView[];
  onCreateSource: (input: SourceInput) => Promise<SourceView>;
  /** Saves; a rejection keeps every edit on screen and places the server's messages under their fields. */
  onSubmit: (values: AlloyInput, note: string) => Promise<unknown>;
  submitLabel: string;
  units: UnitSystem;
}

const errorAt = (errors: Errors, path: string): string | undefined => {
  let node: unknown = errors;
  for (const key of path.split('.')) node = (node as Record<string, unknown> | undefined)?.[key];
  return (node as { message?: string } | undefined)?.message;
};

export function AlloyForm({ defaultValues, sources, onCreateSource, onSubmit, submitLabel, units }: AlloyFormProps) {
  const [note, setNote] = useState('');
  const [failure, setFailure] = useState<string>();
  const {
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting, submitCount, isValid },
  } = useCheckedForm<AlloyInputDraft, unknown, AlloyInput>({ resolver: zodResolver(alloyInputSchema), defaultValues });
  const submit = handleSubmit(async (values) => {
    setFailure(undefined);
    try {
      await onSubmit(values, note.trim());
    } catch (error) {
      placeServerErrors(error, setError);
      setFailure(messageOf(error));
    }
  });

  const text = (name: 'designation' | 'uns' | 'currency' | 'priceSetOn', label: string, hint?: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <TextField
          ref={field.ref}
          label={label}
          value={field.value ?? ''}
          onChangeText={field.onChange}
          onBlur={field.onBlur}
          error={errorAt(errors, name)}
          hint={hint}
          autoCapitalize={name === 'designation' ? 'words' : 'characters'}
          autoCorrect={false}
        />
      )}
    />
  );

  const number = (name: 'densityKgM3' | 'maxContinuousC' | 'maxIntermittentC' | 'pricePerKg' | 'referenceTempC', label: string, hint?: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <UnitNumberField
          ref={field.ref}
          label={label}
          kind={FIELD_KINDS[name]}
          units={units}
          decimals={catalogueDecimals(units)}
          value={field.value}
          onChange={field.onChange}
          onBlur={field.onBlur}
          error={errorAt(errors, name)}
          hint={hint}
        />
      )}
    />
  );

  const source = (name: 'densitySourceId' | 'limitsSourceId', label: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <SourcePicker
          label={label}
          value={field.value ?? ''}
          sources={sources}
          onChange={field.onChange}
          onCreateSource={onCreateSource}
          error={errorAt(errors, name)}
        />
      )}
    />
  );

  return (
    <View style={styles.form}>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Alloy
        </Text>
        {text('designation', 'Designation', 'Generic name, e.g. Type 321 or Alloy 625; never a brand name.')}
        {text('uns', 'UNS number', 'A letter and five digits, e.g. S32100.')}
        <Controller
          control={control}
          name="family"
          render={({ field }) => (
            <SegmentedControl label="Family" options={FAMILY_OPTIONS} value={field.value} onChange={field.onChange} error={errorAt(errors, 'family')} />
          )}
        />
      </Card>

      <Card>
        <Text variant="heading" headingLevel={2}>
          Density and service limits
        </Text>
        {number('densityKgM3', 'Density')}
        {source('densitySourceId', 'Source of the density')}
        <View style={styles.pair}>
          <View style={styles.half}>{number('maxContinuousC', 'Continuous service limit in air')}</View>
          <View style={styles.half}>{number('maxIntermittentC', 'Intermittent service limit in air')}</View>
        </View>
        {source('limitsSourceId', 'Source of the service limits')}
      </Card>

      <Card>
        <Text variant="heading" headingLevel={2}>
          Price
        </Text>
        <View style={styles.pair}>
          <View style={styles.half}>{number('pricePerKg', 'Price')}</View>
          <View style={styles.half}>{text('currency', 'Currency', 'Three letters, e.g. EUR.')}</View>
        </View>
        {text('priceSetOn', 'Price set on', 'A date like 2026-11-01.')}
        <Controller
          control={control}
          name="priceIsDemo"
          render={({ field }) => <CheckBox label="This is a demo price" checked={Boolean(field.value)} onChange={field.onChange} />}
        />
      </Card>

      <Card>
        <Text variant="heading" headingLevel={2}>
          Property tables
        </Text>
        {number('referenceTempC', 'Reference temperature of the mean CTE', `Usually ${formatQuantity('temperature', 20, units).text}: the mean coefficients are measured from here.`)}
        <PointsTableField table="cte" control={control} errors={errors} sources={sources} onCreateSource={onCreateSource} units={units} />
        <PointsTableField table="modulus" control={control} errors={errors} sources={sources} onCreateSource={onCreateSource} units={units} />
        <PointsTableField table="yield" control={control} errors={errors} sources={sources} onCreateSource={onCreateSource} units={units} />
      </Card>

      <Card>
        <Text variant="heading" headingLevel={2}>
          Notes and warnings
        </Text>
        <Controller
          control={control}
          name="notes"
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label="Notes"
              value={field.value ?? ''}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              error={errorAt(errors, 'notes')}
              hint="Stabilised or not, carbide-precipitation range, welding and filler, forming."
              multiline
              numberOfLines={5}
            />
          )}
        />
        <Controller
          control={control}
          name="dataCautions"
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label="Data cautions"
              value={field.value ?? ''}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              error={errorAt(errors, 'dataCautions')}
              hint="What a user must know about these numbers: a limit lowered to the data's reach, values still to be verified. Shown at the top of the alloy."
              multiline
              numberOfLines={3}
            />
          )}
        />
        <WarningRangesField control={control} errors={errors} units={units} />
      </Card>

      <Card>
        <TextField
          label="Note for this change"
          value={note}
          onChangeText={setNote}
          maxLength={500}
          hint="Why, in a sentence: it goes into the revision history."
        />
        {failure ? <ErrorBanner title="Not saved: your edits are still here" message={failure} /> : null}
        {submitCount > 0 && !isValid && !failure ? (
          <Text tone="danger" accessibilityRole="alert">
            Some values need attention: see the messages under the fields.
          </Text>
        ) : null}
        <Button label={submitLabel} loading={isSubmitting} onPress={() => void submit()} />
      </Card>
    </View>
  );
}

function WarningRangesField({ control, errors, units }: { control: FormControl; errors: Errors; units: UnitSystem }) {
  const { fields, append, remove } = useFieldArray({ control, name: 'warningRanges' });
  return (
    <View style={styles.ranges}>
      <Text variant="heading" headingLevel={3}>
        Warning ranges
      </Text>
      {fields.length === 0 ? <Text tone="muted">None.</Text> : null}
      {fields.map((f, i) => {
        const where = `warning ${i + 1}`;
        const path = (key: string) => `warningRanges.${i}.${key}` as FieldPath<AlloyInputDraft>;
        return (
          <View key={f.id} style={styles.range} role="group" aria-label={`Warning range ${i + 1}`}>
            <View style={styles.pair}>
              {(['fromC', 'toC'] as const).map((key) => (
                <View key={key} style={styles.half}>
                  <Controller
                    control={control}
                    name={path(key)}
                    render={({ field }) => (
                      <UnitNumberField
                        ref={field.ref}
                        label={key === 'fromC' ? 'From' : 'To'}
                        labelSuffix={`, ${where}`}
                        kind="temperature"
                        units={units}
                        decimals={catalogueDecimals(units)}
                        value={field.value as number}
                        onChange={field.onChange}
                        onBlur={field.onBlur}
                        error={errorAt(errors, path(key))}
                      />
                    )}
                  />
                </View>
              ))}
            </View>
            {(['code', 'message'] as const).map((key) => (
              <Controller
                key={key}
                control={control}
                name={path(key)}
                render={({ field }) => (
                  <TextField
                    ref={field.ref}
                    label={`${key === 'code' ? 'Code' : 'What it means'}, ${where}`}
                    value={(field.value as string) ?? ''}
                    onChangeText={field.onChange}
                    onBlur={field.onBlur}
                    error={errorAt(errors, path(key))}
                    hint={key === 'code' ? 'snake_case, e.g. sigma_phase' : undefined}
                    autoCapitalize="none"
                    multiline={key === 'message'}
                  />
                )}
              />
            ))}
            <Button label="Remove warning" accessibilityLabel={`Remove ${where}`} variant="ghost" compact onPress={() => remove(i)} />
          </View>
        );
      })}
      <Button
        label="Add a warning range"
        variant="secondary"
        compact
        onPress={() => append({ fromC: Number.NaN, toC: Number.NaN, code: '', message: '' })}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  half: { flexGrow: 1, flexBasis: 220 },
  ranges: { gap: spacing.sm },
  range: { gap: spacing.sm, paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.border },
});
