import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { TUBE_OD_IN, TUBE_PRESETS } from '../../shared/jobs/tube-presets';
import { gaugeToWallMm, TUBE_GAUGES, type UnitSystem, wallMmToGauge } from '../../shared/units';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { show } from '../units/format';
import { UnitNumberField } from '../units/unit-number-field';
import type { FieldMessages } from './field-errors';

export interface Tube {
  odMm: number;
  wallMm: number;
}

const OD_MM = new Map<number, number>(TUBE_OD_IN.map((inch) => [inch, TUBE_PRESETS.find((p) => p.odIn === inch)!.odMm]));

/** Gauge walls rounded as the presets are, so a gauge picked here matches its preset. */
const gaugeWall = (gauge: number) => Math.round((gaugeToWallMm(gauge) ?? 0) * 1000) / 1000;

export interface TubeFieldsProps {
  value: Tube;
  onChange: (tube: Tube) => void;
  units: UnitSystem;
  errors: FieldMessages;
  disabled?: boolean;
}

/** Outside diameter and wall: the common sizes as one tap each, or any size typed in. */
export function TubeFields({ value, onChange, units, errors, disabled = false }: TubeFieldsProps) {
  const odPreset = [...OD_MM.entries()].find(([, mm]) => Math.abs(mm - value.odMm) <= 0.01)?.[0];
  const gauge = Number.isFinite(value.wallMm) ? wallMmToGauge(value.wallMm) : null;
  return (
    <View style={styles.group} role="group" aria-label="Tube">
      <SegmentedControl
        label="Common outside diameters"
        options={TUBE_OD_IN.map((inch) => ({ value: String(inch), label: show('length', OD_MM.get(inch)!, units, units === 'metric' ? 1 : 2) }))}
        value={odPreset === undefined ? undefined : String(odPreset)}
        onChange={(inch) => onChange({ ...value, odMm: OD_MM.get(Number(inch))! })}
        disabled={disabled}
      />
      <SegmentedControl
        label="Wall gauge (BWG)"
        options={TUBE_GAUGES.map((g) => ({ value: String(g), label: `${g} ga` }))}
        value={gauge === null ? undefined : String(gauge)}
        onChange={(g) => onChange({ ...value, wallMm: gaugeWall(Number(g)) })}
        disabled={disabled}
      />
      <View style={styles.row}>
        <View style={styles.cell}>
          <UnitNumberField
            label="Outside diameter"
            kind="length"
            units={units}
            value={value.odMm}
            onChange={(odMm) => onChange({ ...value, odMm })}
            error={errors['tube.odMm']}
            editable={!disabled}
          />
        </View>
        <View style={styles.cell}>
          <UnitNumberField
            label="Wall"
            kind="smallLength"
            units={units}
            value={value.wallMm}
            onChange={(wallMm) => onChange({ ...value, wallMm })}
            error={errors['tube.wallMm'] ?? errors.tube}
            hint={gauge === null ? 'Not a BWG gauge' : `${gauge} ga`}
            editable={!disabled}
          />
        </View>
      </View>
      <Text variant="caption" tone="muted">
        Pick a common size or type any outside diameter and wall.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 140 },
});
