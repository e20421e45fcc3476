import { Controller, type Control, useFieldArray, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import type { RunFields } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { UnitNumberField } from '../units/unit-number-field';
import type { FieldMessages } from './field-errors';

export const MAX_SEGMENTS = 50;

export interface SegmentsFieldProps {
  control: Control<RunFields>;
  units: UnitSystem;
  errors: FieldMessages;
  disabled?: boolean;
}

/** The run from its start: stretches of tube whose temperature varies linearly from one end to the other. */
export function SegmentsField({ control, units, errors, disabled = false }: SegmentsFieldProps) {
  const { fields, append, remove, move } = useFieldArray({ control, name: 'segments' });
  const current = useWatch({ control, name: 'segments' });
  return (
    <View style={styles.group}>
      {errors.segments ? <Text tone="danger">{errors.segments}</Text> : null}
      {fields.map((row, i) => (
        <View key={row.id} role="group" aria-label={`Segment ${i + 1}`} style={styles.row}>
          <Text variant="label">Segment {i + 1}</Text>
          <View style={styles.inputs}>
            {(['lengthMm', 'startTempC', 'endTempC'] as const).map((name) => (
              <View key={name} style={styles.cell}>
                <Controller
                  control={control}
                  name={`segments.${i}.${name}`}
                  render={({ field: { value, onChange, onBlur } }) => (
                    <UnitNumberField
                      label={name === 'lengthMm' ? 'Length' : name === 'startTempC' ? 'Start temperature' : 'End temperature'}
                      kind={name === 'lengthMm' ? 'length' : 'temperature'}
                      units={units}
                      value={value}
                      onChange={onChange}
                      onBlur={onBlur}
                      error={errors[`segments.${i}.${name}`]}
                      editable={!disabled}
                    />
                  )}
                />
              </View>
            ))}
          </View>
          {disabled ? null : (
            <View style={styles.actions}>
              <Button label="Up" accessibilityLabel={`Move segment ${i + 1} up`} variant="ghost" compact disabled={i === 0} onPress={() => move(i, i - 1)} />
              <Button
                label="Down"
                accessibilityLabel={`Move segment ${i + 1} down`}
                variant="ghost"
                compact
                disabled={i === fields.length - 1}
                onPress={() => move(i, i + 1)}
              />
              <Button
                label="Remove"
                accessibilityLabel={`Remove segment ${i + 1}`}
                variant="ghost"
                compact
                disabled={fields.length <= 1}
                onPress={() => remove(i)}
              />
            </View>
          )}
        </View>
      ))}
      {disabled ? null : (
        <Button
          label="Add segment"
          variant="secondary"
          disabled={fields.length >= MAX_SEGMENTS}
          onPress={() => {
            const last = current[current.length - 1];
            const t = last && Number.isFinite(last.endTempC) ? last.endTempC : 20;
            append({ lengthMm: 500, startTempC: t, endTempC: t });
          }}
        />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.md },
  row: { gap: spacing.sm, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  inputs: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  cell: { flexGrow: 1, flexBasis: 100 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
