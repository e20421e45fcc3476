import { Controller, type Control, useFieldArray } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { NEARBY_KINDS, NEARBY_LABELS } from '../../shared/jobs/nearby';
import type { RunFields } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Button } from '../ui/button';
import { ChoicePicker } from '../ui/choice-picker';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { UnitNumberField } from '../units/unit-number-field';
import type { FieldMessages } from './field-errors';

const KIND_CHOICES = NEARBY_KINDS.map((value) => ({ value, label: NEARBY_LABELS[value] }));
const DIRECTION_OPTIONS = [
  { value: 'beside', label: 'Beside the pipe' },
  { value: 'in_line', label: 'In line with it' },
] as const;

export interface NearbyFieldProps {
  control: Control<RunFields>;
  units: UnitSystem;
  errors: FieldMessages;
  disabled?: boolean;
}

/** Lines, wiring, rubber and panels near the run, with the gap to each when cold. */
export function NearbyField({ control, units, errors, disabled = false }: NearbyFieldProps) {
  const { fields, append, remove } = useFieldArray({ control, name: 'nearby' });
  return (
    <View style={styles.group}>
      {fields.length === 0 ? <Text tone="muted">Nothing listed near this run.</Text> : null}
      {fields.map((row, i) => (
        <View key={row.id} role="group" aria-label={`Nearby item ${i + 1}`} style={styles.row}>
          <Controller
            control={control}
            name={`nearby.${i}.kind`}
            render={({ field: { value, onChange } }) => (
              <ChoicePicker label={`Nearby item ${i + 1}: what it is`} choices={KIND_CHOICES} value={value} onChange={onChange} error={errors[`nearby.${i}.kind`]} disabled={disabled} />
            )}
          />
          <Controller
            control={control}
            name={`nearby.${i}.label`}
            render={({ field: { value, onChange, onBlur } }) => (
              <TextField label={`Nearby item ${i + 1}: name`} hint="Optional, e.g. fuel feed to the rail" value={value} onChangeText={onChange} onBlur={onBlur} error={errors[`nearby.${i}.label`]} editable={!disabled} />
            )}
          />
          <View style={styles.inputs}>
            {(['atMm', 'coldGapMm'] as const).map((name) => (
              <View key={name} style={styles.cell}>
                <Controller
                  control={control}
                  name={`nearby.${i}.${name}`}
                  render={({ field: { value, onChange, onBlur } }) => (
                    <UnitNumberField
                      label={name === 'atMm' ? `Nearby item ${i + 1}: position from run start` : `Nearby item ${i + 1}: gap when cold`}
                      kind="length"
                      units={units}
                      value={value}
                      onChange={onChange}
                      onBlur={onBlur}
                      error={errors[`nearby.${i}.${name}`]}
                      editable={!disabled}
                    />
                  )}
                />
              </View>
            ))}
          </View>
          <Controller
            control={control}
            name={`nearby.${i}.direction`}
            render={({ field: { value, onChange } }) => (
              <SegmentedControl label={`Nearby item ${i + 1}: where it lies`} options={DIRECTION_OPTIONS} value={value} onChange={onChange} disabled={disabled} />
            )}
          />
          {disabled ? null : <Button label="Remove" accessibilityLabel={`Remove nearby item ${i + 1}`} variant="ghost" compact onPress={() => remove(i)} />}
        </View>
      ))}
      {disabled ? null : (
        <Button
          label="Add nearby item"
          variant="secondary"
          disabled={fields.length >= 50}
          onPress={() => append({ kind: 'fuel_line', label: '', atMm: Number.NaN, coldGapMm: Number.NaN, direction: 'beside' })}
        />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.md },
  row: { gap: spacing.sm, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  inputs: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  cell: { flexGrow: 1, flexBasis: 140 },
});
