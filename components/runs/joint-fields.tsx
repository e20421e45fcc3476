import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { Joint, JointType } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { SegmentedControl } from '../ui/segmented-control';
import type { FieldMessages } from './field-errors';
import { FlexFields } from './flex-fields';
import { SlipFields } from './slip-fields';

const JOINT_OPTIONS = [
  { value: 'none', label: 'None' },
  { value: 'flex', label: 'Flex section' },
  { value: 'slip', label: 'Slip joint' },
] as const satisfies readonly { value: JointType; label: string }[];

/** A fresh joint of a type, with settings a shop would start from. */
export function newJoint(type: JointType, peakC: number): Joint {
  if (type === 'none') return { type };
  if (type === 'flex') return { type };
  const hot = Number.isFinite(peakC) ? peakC : 400;
  return {
    type,
    inner: { tempC: hot },
    outer: { tempC: hot - 20 },
    coldClearanceMm: 0.45,
    coldEngagementMm: 80,
    coldAxialGapMm: 25,
  };
}

export interface JointFieldsProps {
  value: Joint;
  onChange: (joint: Joint) => void;
  peakC: number;
  tubeOdMm: number;
  units: UnitSystem;
  errors: FieldMessages;
  disabled?: boolean;
}

/** What takes up the run's growth: nothing, a flex section, or a slip joint, with its settings. */
export function JointFields({ value, onChange, peakC, tubeOdMm, units, errors, disabled = false }: JointFieldsProps) {
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
      {value.type === 'flex' ? <FlexFields value={value} onChange={onChange} tubeOdMm={tubeOdMm} units={units} errors={errors} disabled={disabled} /> : null}
      {value.type === 'slip' ? <SlipFields value={value} onChange={onChange} tubeOdMm={tubeOdMm} units={units} errors={errors} disabled={disabled} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.md },
});
