import { type Control, Controller, type FieldErrors, type FieldPath, useFieldArray } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import type { AlloyInput, AlloyInputDraft, SourceInput, SourceView } from '../../shared/schemas/alloy';
import type { QuantityKind, UnitSystem } from '../../shared/units';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { UnitNumberField } from '../units/unit-number-field';
import { catalogueDecimals } from './catalogue-decimals';
import { SourcePicker } from './source-picker';
import { FieldError } from '../ui/field-error';

export type PointTable = 'cte' | 'modulus' | 'yield';

export const TABLES: Record<PointTable, { title: string; valueKey: string; valueLabel: string; kind: QuantityKind }> = {
  cte: { title: 'Mean coefficient of thermal expansion', valueKey: 'meanUmPerMK', valueLabel: 'Mean CTE', kind: 'cte' },
  modulus: { title: 'Elastic modulus', valueKey: 'gpa', valueLabel: 'Modulus', kind: 'modulus' },
  yield: { title: '0.2 % yield strength', valueKey: 'mpa', valueLabel: 'Yield', kind: 'stress' },
};

type Message = { message?: string };
type RowErrors = Record<string, Message | undefined>;

export interface PointsTableFieldProps {
  table: PointTable;
  control: Control<AlloyInputDraft, unknown, AlloyInput>;
  errors: FieldErrors<AlloyInputDraft>;
  sources: SourceView[];
  onCreateSource: (input: SourceInput) => Promise<SourceView>;
  units: UnitSystem;
}

/** One property table as editable rows: temperature, value, cited source; rows added and removed. */
export function PointsTableField({ table, control, errors, sources, onCreateSource, units }: PointsTableFieldProps) {
  const { fields, append, remove } = useFieldArray({ control, name: table });
  const spec = TABLES[table];
  const tableErrors = errors[table] as (RowErrors[] & Message & { root?: Message }) | undefined;
  const tableMessage = tableErrors?.root?.message ?? tableErrors?.message;
  const name = (i: number, key: string) => `${table}.${i}.${key}` as FieldPath<AlloyInputDraft>;

  return (
    <View style={styles.wrapper}>
      <Text variant="heading" headingLevel={3}>
        {spec.title}
      </Text>
      <FieldError message={tableMessage} />
      {fields.length === 0 ? <Text tone="muted">No rows. Leave it empty where nothing is published.</Text> : null}
      {fields.map((field, i) => {
        const rowErrors = tableErrors?.[i];
        const where = `row ${i + 1}`;
        return (
          <View key={field.id} style={styles.row} role="group" aria-label={`${spec.valueLabel} ${where}`}>
            <View style={styles.numbers}>
              <View style={styles.number}>
                <Controller
                  control={control}
                  name={name(i, 'tempC')}
                  render={({ field: f }) => (
                    <UnitNumberField
                      ref={f.ref}
                      label="Temperature"
                      labelSuffix={`, ${where}`}
                      kind="temperature"
                      units={units}
                      decimals={catalogueDecimals(units)}
                      value={f.value as number}
                      onChange={f.onChange}
                      onBlur={f.onBlur}
                      error={rowErrors?.tempC?.message}
                    />
                  )}
                />
              </View>
              <View style={styles.number}>
                <Controller
                  control={control}
                  name={name(i, spec.valueKey)}
                  render={({ field: f }) => (
                    <UnitNumberField
                      ref={f.ref}
                      label={spec.valueLabel}
                      labelSuffix={`, ${where}`}
                      kind={spec.kind}
                      units={units}
                      decimals={catalogueDecimals(units)}
                      value={f.value as number}
                      onChange={f.onChange}
                      onBlur={f.onBlur}
                      error={rowErrors?.[spec.valueKey]?.message}
                    />
                  )}
                />
              </View>
            </View>
            <Controller
              control={control}
              name={name(i, 'sourceId')}
              render={({ field: f }) => (
                <SourcePicker
                  label={`Source, ${spec.valueLabel.toLowerCase()} ${where}`}
                  value={(f.value as string) ?? ''}
                  sources={sources}
                  onChange={f.onChange}
                  onCreateSource={onCreateSource}
                  error={rowErrors?.sourceId?.message}
                />
              )}
            />
            <Button
              label="Remove row"
              accessibilityLabel={`Remove ${spec.valueLabel.toLowerCase()} ${where}`}
              variant="ghost"
              compact
              onPress={() => remove(i)}
            />
          </View>
        );
      })}
      <Button
        label="Add row"
        accessibilityLabel={`Add a ${spec.valueLabel.toLowerCase()} row`}
        variant="secondary"
        compact
        onPress={() => {
          const last = fields.length > 0 ? (fields[fields.length - 1] as unknown as { tempC: number; sourceId: string }) : null;
          append({ tempC: Number.NaN, [spec.valueKey]: Number.NaN, sourceId: last?.sourceId ?? '' } as never);
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.sm },
  row: { gap: spacing.sm, paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.border },
  numbers: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  number: { flexGrow: 1, flexBasis: 160 },
});
