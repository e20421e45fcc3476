import { View } from 'react-native';
import { messageOf } from '../../hooks/api-client';
import { usePreferencesQuery, useSetPreferencesMutation } from '../../hooks/use-preferences';
import { useUnits } from '../../hooks/use-units';
import type { UnitSystem } from '../../shared/units';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';

export const UNIT_OPTIONS = [
  { value: 'metric', label: 'Metric (mm, °C)' },
  { value: 'imperial', label: 'Imperial (in, °F)' },
] as const satisfies readonly { value: UnitSystem; label: string }[];

/** The user's own unit choice, saved on the server; every figure on the page follows at once. */
export function UnitSwitch() {
  const units = useUnits();
  const prefs = usePreferencesQuery();
  const save = useSetPreferencesMutation();
  return (
    <View>
      <SegmentedControl
        label="Units"
        options={UNIT_OPTIONS}
        value={units}
        disabled={prefs.isPending}
        onChange={(unitSystem) => save.mutate({ unitSystem })}
      />
      {save.isError ? (
        <View accessible accessibilityRole="alert">
          <Text variant="caption" tone="danger">
            Your unit choice was not saved: {messageOf(save.error)}
          </Text>
        </View>
      ) : null}
    </View>
  );
}
