import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTarget } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useAlloysQuery } from '../../hooks/use-alloys';
import type { UnitSystem } from '../../shared/units';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { pressState } from '../ui/press-state';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { show } from '../units/format';
import { FieldError } from '../ui/field-error';

export interface AlloyPickerProps {
  value: string;
  /** The picker's name; the list, search and buttons are named after it. Default "Alloy". */
  label?: string;
  /** When given, the picker may be left empty: this says what empty means, and a button clears it. */
  emptyLabel?: string;
  /** The alloy's name as the run knows it, shown while the list is closed. */
  currentLabel: string | null;
  onChange: (alloyId: string) => void;
  units: UnitSystem;
  error?: string;
  disabled?: boolean;
}

/** One published alloy from the catalogue, found by designation or UNS number. */
export function AlloyPicker({ value, label: name = 'Alloy', emptyLabel, currentLabel, onChange, units, error, disabled = false }: AlloyPickerProps) {
  const [open, setOpen] = useState(!value && !emptyLabel);
  const main = name === 'Alloy';
  const names = {
    change: main ? 'Change alloy' : `Change ${name.toLowerCase()}`,
    search: main ? 'Search alloys' : `Search for the ${name.toLowerCase()}`,
    group: main ? 'Published alloys' : `Published alloys for the ${name.toLowerCase()}`,
  };
  const [search, setSearch] = useState('');
  const alloys = useAlloysQuery({ search: search.trim() || undefined });
  const chosen = alloys.data?.items.find((a) => a.id === value);
  const label = chosen ? `${chosen.designation} (${chosen.uns})` : currentLabel;

  return (
    <View style={styles.wrapper}>
      <Text variant="label">{name}</Text>
      <View style={styles.current}>
        <Text variant="bodyStrong" style={styles.grow}>
          {value ? (label ?? 'No alloy chosen') : (emptyLabel ?? 'No alloy chosen')}
        </Text>
        {disabled ? null : (
          <Button
            label={open ? 'Close the list' : names.change}
            accessibilityLabel={open ? (main ? 'Close the list' : `Close the list for the ${name.toLowerCase()}`) : names.change}
            variant="secondary"
            compact
            accessibilityState={{ expanded: open }}
            onPress={() => setOpen((o) => !o)}
          />
        )}
        {!disabled && emptyLabel && value ? <Button label={emptyLabel} variant="secondary" compact onPress={() => onChange('')} /> : null}
      </View>
      <FieldError message={error} />
      {open && !disabled ? (
        <View style={styles.list}>
          <TextField label={names.search} hint="Designation or UNS number" value={search} onChangeText={setSearch} autoCorrect={false} autoCapitalize="none" />
          {alloys.isPending ? (
            <LoadingState label="Loading alloys…" />
          ) : alloys.isError ? (
            <ErrorBanner message={messageOf(alloys.error)} onRetry={() => void alloys.refetch()} />
          ) : alloys.data.items.length === 0 ? (
            <Text tone="muted">No published alloy matches “{search}”.</Text>
          ) : (
            <View accessibilityRole="radiogroup" accessibilityLabel={names.group} style={styles.options}>
              {alloys.data.items.map((a) => {
                const selected = a.id === value;
                const limit = Math.min(a.maxContinuousC, a.maxIntermittentC);
                return (
                  <Pressable
                    key={a.id}
                    accessibilityRole="radio"
                    accessibilityLabel={a.designation}
                    accessibilityState={{ checked: selected }}
                    aria-checked={selected}
                    onPress={() => {
                      onChange(a.id);
                      setOpen(false);
                    }}
                    style={(state) => {
                      const { focused, hovered } = pressState(state);
                      return [styles.option, selected && styles.selected, hovered && styles.hovered, focused && styles.focused];
                    }}
                  >
                    <Text variant="bodyStrong">{a.designation}</Text>
                    <Text variant="caption" tone="muted">
                      {a.uns} · limit {show('temperature', limit, units)}
                    </Text>
                  </Pressable>
                );
              })}
            </View>
          )}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.xs },
  current: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
  grow: { flexGrow: 1 },
  list: { gap: spacing.sm },
  options: { gap: spacing.xs },
  option: {
    minHeight: touchTarget,
    justifyContent: 'center',
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.xs,
    borderRadius: radii.md,
    borderWidth: 2,
    borderColor: colors.border,
    backgroundColor: colors.surfaceRaised,
  },
  selected: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  hovered: { backgroundColor: colors.surfaceSunken },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 },
});
