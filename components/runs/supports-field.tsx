import { Controller, type Control, useFieldArray } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { SUPPORT_KINDS, SUPPORT_LABELS, type RunFields } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Button } from '../ui/button';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { UnitNumberField } from '../units/unit-number-field';
import type { FieldMessages } from './field-errors';

const KIND_OPTIONS = SUPPORT_KINDS.map((value) => ({ value, label: SUPPORT_LABELS[value] }));

export interface SupportsFieldProps {
  control: Control<RunFields>;
  units: UnitSystem;
  errors: FieldMessages;
  disabled?: boolean;
}

/** Sliding supports and hangers part-way along the run; the run's ends are its fixings. */
export function SupportsField({ control, units, errors, disabled = false }: SupportsFieldProps) {
  const { fields, append, remove } = useFieldArray({ control, name: 'supports' });
  return (
    <View style={styles.group}>
      <Text variant="caption" tone="muted">
        To hold the pipe fast part-way, end the run on an anchor bracket there and start the next run from it.
      </Text>
      {fields.length === 0 ? <Text tone="muted">No supports part-way along this run.</Text> : null}
      {fields.map((row, i) => (
        <View key={row.id} role="group" aria-label={`Support ${i + 1}`} style={styles.row}>
          <Controller
            control={control}
            name={`supports.${i}.kind`}
            render={({ field: { value, onChange } }) => (
              <SegmentedControl label={`Support ${i + 1} kind`} options={KIND_OPTIONS} value={value} onChange={onChange} error={errors[`supports.${i}.kind`]} disabled={disabled} />
            )}
          />
          <Controller
            control={control}
            name={`supports.${i}.atMm`}
            render={({ field: { value, onChange, onBlur } }) => (
              <UnitNumberField
                label="Position from run start"
                kind="length"
                units={units}
                value={value}
                onChange={onChange}
                onBlur={onBlur}
                error={errors[`supports.${i}.atMm`]}
                editable={!disabled}
              />
            )}
          />
          {disabled ? null : <Button label="Remove" accessibilityLabel={`Remove support ${i + 1}`} variant="ghost" compact onPress={() => remove(i)} />}
        </View>
      ))}
      {disabled ? null : <Button label="Add support" variant="secondary" disabled={fields.length >= 50} onPress={() => append({ kind: 'hanger', atMm: Number.NaN })} />}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.md },
  row: { gap: spacing.sm, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
});
