import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { Joint, JointType } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { UnitNumberField } from '../units/unit-number-field';
import type { FieldMessages } from './field-errors';

const JOINT_OPTIONS = [
  { value: 'none', label: 'None' },
  { value: 'flex', label: 'Flex section' },
  { value: 'slip', label: 'Slip joint' },
] as const satisfies readonly { value: JointType; label: string }[];

type Slip = Extract<Joint, { type: 'slip' }>;
type Flex = Extract<Joint, { type: 'flex' }>;

/** A fresh joint of a type, with settings a shop would start from. */
export function newJoint(type: JointType, peakC: number): Joint {
  if (type === 'none') return { type };
  if (type === 'flex') return { type };
  const hot = Number.isFinite(peakC) ? peakC : 400;
  return {
    type,
    inner: { tempC: hot },
    outer: { tempC: hot - 20 },
    coldClearanceMm: 0.3,
    coldEngagementMm: 80,
    coldAxialGapMm: 25,
  };
}

const optional = (v: number) => (Number.isNaN(v) ? undefined : v);

export interface JointFieldsProps {
  value: Joint;
  onChange: (joint: Joint) => void;
  peakC: number;
  units: UnitSystem;
  errors: FieldMessages;
  disabled?: boolean;
}

/** What takes up the run's growth: nothing, a flex section, or a slip joint, with its settings. */
export function JointFields({ value, onChange, peakC, units, errors, disabled = false }: JointFieldsProps) {
  return (
    <View style={styles.group}>
      <SegmentedControl
        label="Joint in this run"
        options={JOINT_OPTIONS}
        value={value.type}
        onChange={(type) => {
          if (type !== value.type) onChange(newJoint(type, peakC));
        }}
        error={errors.joint}
        disabled={disabled}
      />
      {value.type === 'flex' ? <FlexSettings value={value} onChange={onChange} units={units} errors={errors} disabled={disabled} /> : null}
      {value.type === 'slip' ? <SlipSettings value={value} onChange={onChange} units={units} errors={errors} disabled={disabled} /> : null}
    </View>
  );
}

function FlexSettings({ value, onChange, units, errors, disabled }: { value: Flex; onChange: (j: Joint) => void; units: UnitSystem; errors: FieldMessages; disabled: boolean }) {
  return (
    <View style={styles.row}>
      <View style={styles.cell}>
        <UnitNumberField
          label="Movement margin"
          units={units}
          value={value.movementMargin}
          onChange={(v) => onChange({ ...value, movementMargin: optional(v) })}
          hint="Factor on the growth; leave empty for the default"
          error={errors['joint.movementMargin']}
          editable={!disabled}
        />
      </View>
      <View style={styles.cell}>
        <UnitNumberField
          label="Flex position from run start"
          kind="length"
          units={units}
          value={value.atMm}
          onChange={(v) => onChange({ ...value, atMm: optional(v) })}
          hint="Empty: judged at the run’s peak temperature"
          error={errors['joint.atMm']}
          editable={!disabled}
        />
      </View>
    </View>
  );
}

function SlipSettings({ value, onChange, units, errors, disabled }: { value: Slip; onChange: (j: Joint) => void; units: UnitSystem; errors: FieldMessages; disabled: boolean }) {
  const field = (
    label: string,
    kind: 'temperature' | 'smallLength' | 'length',
    current: number | undefined,
    path: string,
    set: (v: number) => Slip,
    hint?: string,
  ) => (
    <View style={styles.cell} key={path}>
      <UnitNumberField
        label={label}
        kind={kind}
        units={units}
        value={current}
        onChange={(v) => onChange(set(v))}
        hint={hint}
        error={errors[path]}
        editable={!disabled}
      />
    </View>
  );
  return (
    <View style={styles.group}>
      <Text variant="caption" tone="muted">
        The spigot (inner) slides in the sleeve (outer). Both are the run’s alloy unless the saved run names another.
      </Text>
      <View style={styles.row}>
        {field('Spigot temperature', 'temperature', value.inner.tempC, 'joint.inner.tempC', (v) => ({ ...value, inner: { ...value.inner, tempC: v } }))}
        {field('Sleeve temperature', 'temperature', value.outer.tempC, 'joint.outer.tempC', (v) => ({ ...value, outer: { ...value.outer, tempC: v } }))}
        {field('Cold clearance', 'smallLength', value.coldClearanceMm, 'joint.coldClearanceMm', (v) => ({ ...value, coldClearanceMm: v }), 'On the diameter')}
        {field('Cold engagement', 'length', value.coldEngagementMm, 'joint.coldEngagementMm', (v) => ({ ...value, coldEngagementMm: v }))}
        {field('Cold axial gap', 'length', value.coldAxialGapMm, 'joint.coldAxialGapMm', (v) => ({ ...value, coldAxialGapMm: v }), 'Room left for the growth')}
        {field(
          'Minimum engagement',
          'length',
          value.minEngagementMm,
          'joint.minEngagementMm',
          (v) => ({ ...value, minEngagementMm: optional(v) }),
          'Empty: one tube diameter',
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 160 },
});
