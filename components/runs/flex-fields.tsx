import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { useFlexPartsQuery } from '../../hooks/use-flex-parts';
import { FLEX_BORE_FIT_TOLERANCE_MM } from '../../shared/engine/flex';
import { FLEX_PURPOSE_LABELS } from '../../shared/schemas/alloy';
import type { Joint } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { ChoicePicker } from '../ui/choice-picker';
import { Text } from '../ui/text';
import { UnitNumberField } from '../units/unit-number-field';
import { show } from '../units/format';
import type { FieldMessages } from './field-errors';

type Flex = Extract<Joint, { type: 'flex' }>;
const AUTO = '';
const optional = (v: number) => (Number.isNaN(v) ? undefined : v);
const given = (v: number | undefined): v is number => v !== undefined && !Number.isNaN(v);

/** Both empty: no leg. One given: the other shows as missing until it is filled. */
function legOf(lengthMm: number | undefined, tempC: number | undefined): Flex['perpendicularLeg'] {
  if (!given(lengthMm) && !given(tempC)) return undefined;
  return { lengthMm: lengthMm ?? Number.NaN, tempC: tempC ?? Number.NaN };
}

export interface FlexFieldsProps {
  value: Flex;
  onChange: (joint: Joint) => void;
  tubeOdMm: number;
  units: UnitSystem;
  errors: FieldMessages;
  disabled: boolean;
}

/** Which flex part, where it sits, and what it must take besides the run's own growth. */
export function FlexFields({ value, onChange, tubeOdMm, units, errors, disabled }: FlexFieldsProps) {
  const parts = useFlexPartsQuery(false);
  const fitting = (parts.data ?? []).filter((p) => !Number.isFinite(tubeOdMm) || Math.abs(p.boreMm - tubeOdMm) <= FLEX_BORE_FIT_TOLERANCE_MM);
  const choices = [
    { value: AUTO, label: 'Let Dilato pick', hint: 'The most compact thermal bellows that fits' },
    ...fitting.map((p) => ({
      value: p.id,
      label: `${p.code} ${p.name}`,
      hint: `${FLEX_PURPOSE_LABELS[p.purpose]}; ${show('smallLength', p.ratedAxialCompressionMm, units)} compression, ${show('smallLength', p.ratedAxialExtensionMm, units)} extension, ${show('smallLength', p.lateralOffsetMm, units)} lateral, ${p.ratedAngularDeg}°`,
    })),
  ];
  const set = (changes: Partial<Flex>) => onChange({ ...value, ...changes });
  const leg = value.perpendicularLeg;
  const number = (label: string, kind: 'length' | 'smallLength' | 'temperature' | undefined, current: number | undefined, path: string, apply: (v: number | undefined) => void, hint?: string) => (
    <View style={styles.cell} key={path}>
      <UnitNumberField label={label} kind={kind} units={units} value={current} onChange={(v) => apply(optional(v))} hint={hint} error={errors[path]} editable={!disabled} />
    </View>
  );
  return (
    <View style={styles.group}>
      <ChoicePicker
        label="Flex part"
        choices={choices}
        value={value.partId ?? AUTO}
        onChange={(id) => set({ partId: id === AUTO ? undefined : id })}
        error={errors['joint.partId']}
        disabled={disabled}
      />
      {parts.isSuccess && fitting.length === 0 ? <Text tone="warning">No active flex part has a bore for this tube; Dilato cannot size one.</Text> : null}
      <View style={styles.row}>
        {number('Flex position from run start', 'length', value.atMm, 'joint.atMm', (v) => set({ atMm: v }), 'To the part’s centre; empty: judged at the run’s peak temperature')}
        {number('Lateral offset when hot', 'smallLength', value.lateralOffsetMm, 'joint.lateralOffsetMm', (v) => set({ lateralOffsetMm: v }), 'Sideways movement across the flex, e.g. engine rock; empty: none')}
        <View style={styles.cell}>
          <UnitNumberField
            label="Rotation when hot (°)"
            units={units}
            value={value.rotationDeg}
            onChange={(v) => set({ rotationDeg: optional(v) })}
            hint="Angle the flex turns through; empty: none"
            error={errors['joint.rotationDeg']}
            editable={!disabled}
          />
        </View>
        <View style={styles.cell}>
          <UnitNumberField
            label="Expected heat cycles"
            units={units}
            value={value.heatCycles}
            onChange={(v) => set({ heatCycles: optional(v) })}
            hint="Cold starts to full heat over the system’s life; checked against the part’s rating"
            error={errors['joint.heatCycles']}
            editable={!disabled}
          />
        </View>
      </View>
      <Text variant="caption" tone="muted">
        A leg at right angles to this run pushes the flex sideways as it grows; give its length and temperature to add its growth to the lateral offset.
      </Text>
      <View style={styles.row}>
        {number('Perpendicular leg length', 'length', leg?.lengthMm, 'joint.perpendicularLeg.lengthMm', (v) => set({ perpendicularLeg: legOf(v, leg?.tempC) }))}
        {number('Perpendicular leg temperature', 'temperature', leg?.tempC, 'joint.perpendicularLeg.tempC', (v) => set({ perpendicularLeg: legOf(leg?.lengthMm, v) }))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 160 },
});
