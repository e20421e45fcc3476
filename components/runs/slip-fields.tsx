import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { DEFAULT_MAX_RADIAL_CLEARANCE_MM, DEFAULT_MIN_RADIAL_CLEARANCE_MM, DEFAULT_SCALE_PER_SURFACE_MM, standardOdToleranceMm } from '../../shared/engine/tube-tolerance';
import type { Joint } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Text } from '../ui/text';
import { show } from '../units/format';
import { UnitNumberField } from '../units/unit-number-field';
import { AlloyPicker } from './alloy-picker';
import type { FieldMessages } from './field-errors';

type Slip = Extract<Joint, { type: 'slip' }>;
type Kind = 'temperature' | 'smallLength' | 'length';
const optional = (v: number) => (Number.isNaN(v) ? undefined : v);

export interface SlipFieldsProps {
  value: Slip;
  onChange: (joint: Joint) => void;
  tubeOdMm: number;
  units: UnitSystem;
  errors: FieldMessages;
  disabled: boolean;
}

/** Spigot and sleeve (alloy, size, temperature), the fit and its allowances, and the axial room. */
export function SlipFields({ value, onChange, tubeOdMm, units, errors, disabled }: SlipFieldsProps) {
  const field = (label: string, kind: Kind, current: number | undefined, path: string, set: (v: number) => Slip, hint?: string) => (
    <View style={styles.cell} key={path}>
      <UnitNumberField label={label} kind={kind} units={units} value={current} onChange={(v) => onChange(set(v))} hint={hint} error={errors[path]} editable={!disabled} />
    </View>
  );
  const spigotOd = value.inner.diameterMm ?? tubeOdMm;
  const standard = Number.isFinite(spigotOd) ? standardOdToleranceMm(spigotOd) : null;
  const fine = (mm: number) => show('smallLength', mm, units, units === 'metric' ? 3 : 4);
  return (
    <View style={styles.group}>
      <Text variant="caption" tone="muted">
        The spigot (inner) slides in the sleeve (outer). Each is the run’s alloy and tube size unless you set another here.
      </Text>
      <View style={styles.row}>
        <View style={styles.cell}>
          <AlloyPicker
            label="Spigot alloy"
            emptyLabel="Same as the run"
            value={value.inner.alloyId ?? ''}
            currentLabel={null}
            onChange={(id) => onChange({ ...value, inner: { ...value.inner, alloyId: id || undefined } })}
            units={units}
            error={errors['joint.inner.alloyId']}
            disabled={disabled}
          />
        </View>
        <View style={styles.cell}>
          <AlloyPicker
            label="Sleeve alloy"
            emptyLabel="Same as the run"
            value={value.outer.alloyId ?? ''}
            currentLabel={null}
            onChange={(id) => onChange({ ...value, outer: { ...value.outer, alloyId: id || undefined } })}
            units={units}
            error={errors['joint.outer.alloyId']}
            disabled={disabled}
          />
        </View>
      </View>
      <View style={styles.row}>
        {field('Spigot OD', 'length', value.inner.diameterMm, 'joint.inner.diameterMm', (v) => ({ ...value, inner: { ...value.inner, diameterMm: optional(v) } }), 'Empty: the run’s tube OD')}
        {field('Spigot temperature', 'temperature', value.inner.tempC, 'joint.inner.tempC', (v) => ({ ...value, inner: { ...value.inner, tempC: v } }))}
        {field('Sleeve temperature', 'temperature', value.outer.tempC, 'joint.outer.tempC', (v) => ({ ...value, outer: { ...value.outer, tempC: v } }))}
        {field('Cold clearance', 'smallLength', value.coldClearanceMm, 'joint.coldClearanceMm', (v) => ({ ...value, coldClearanceMm: v }), 'Sleeve bore minus spigot OD, on the diameter')}
      </View>
      <Text variant="label">Allowances</Text>
      <View style={styles.row}>
        {field(
          'Diameter tolerance (±)',
          'smallLength',
          value.toleranceMm,
          'joint.toleranceMm',
          (v) => ({ ...value, toleranceMm: optional(v) }),
          standard === null ? 'Enter it: the tube standard’s table stops at 14 in' : `Empty: ±${fine(standard)}, ASTM A269 OD tolerance for this size (from memory, to be verified). Enter your sized fit’s`,
        )}
        {field('Scale per surface', 'smallLength', value.scalePerSurfaceMm, 'joint.scalePerSurfaceMm', (v) => ({ ...value, scalePerSurfaceMm: optional(v) }), `Empty: ${fine(DEFAULT_SCALE_PER_SURFACE_MM)} (common practice)`)}
        {field('Minimum radial clearance', 'smallLength', value.minRadialClearanceMm, 'joint.minRadialClearanceMm', (v) => ({ ...value, minRadialClearanceMm: optional(v) }), `Empty: ${fine(DEFAULT_MIN_RADIAL_CLEARANCE_MM)} (common practice)`)}
        {field('Maximum radial clearance', 'smallLength', value.maxRadialClearanceMm, 'joint.maxRadialClearanceMm', (v) => ({ ...value, maxRadialClearanceMm: optional(v) }), `Empty: ${fine(DEFAULT_MAX_RADIAL_CLEARANCE_MM)} (common practice)`)}
      </View>
      <Text variant="label">Axial room</Text>
      <View style={styles.row}>
        {field('Cold engagement', 'length', value.coldEngagementMm, 'joint.coldEngagementMm', (v) => ({ ...value, coldEngagementMm: v }))}
        {field('Cold axial gap', 'length', value.coldAxialGapMm, 'joint.coldAxialGapMm', (v) => ({ ...value, coldAxialGapMm: v }), 'Room left for the growth')}
        {field('Minimum engagement', 'length', value.minEngagementMm, 'joint.minEngagementMm', (v) => ({ ...value, minEngagementMm: optional(v) }), 'Empty: one tube diameter')}
        {field('Slip joint position from run start', 'length', value.atMm, 'joint.atMm', (v) => ({ ...value, atMm: optional(v) }), 'Empty: the end held by the slip joint, else the run’s end')}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 160 },
});
