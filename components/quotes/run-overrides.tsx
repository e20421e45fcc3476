import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { type Choice, ChoicePicker } from '../ui/choice-picker';

export interface RunOverridesProps {
  optionNumber: number;
  runs: { id: string; name: string }[];
  alloyChoices: Choice[];
  value: Record<string, string> | undefined;
  onChange: (value: Record<string, string>) => void;
}

const SAME = '';

/** Runs the customer wants in another alloy than the option's own. */
export function RunOverrides({ optionNumber, runs, alloyChoices, value = {}, onChange }: RunOverridesProps) {
  const count = Object.keys(value).length;
  const [open, setOpen] = useState(count > 0);
  if (runs.length === 0) return null;
  const choices: Choice[] = [{ value: SAME, label: 'Same as the option' }, ...alloyChoices];
  return (
    <View style={styles.wrapper}>
      <Button
        label={open ? 'Hide per-run alloys' : count > 0 ? `Per-run alloys (${count})` : 'Different alloy for some runs'}
        accessibilityLabel={open ? `Hide per-run alloys for option ${optionNumber}` : `Different alloy for some runs of option ${optionNumber}`}
        variant="ghost"
        compact
        onPress={() => setOpen((o) => !o)}
      />
      {open ? (
        <View style={styles.list}>
          <Text variant="caption" tone="muted">
            A run left at “Same as the option” uses the option’s alloy.
          </Text>
          {runs.map((run) => (
            <ChoicePicker
              key={run.id}
              label={`Alloy for ${run.name}`}
              choices={choices}
              value={value[run.id] ?? SAME}
              onChange={(alloyId) => {
                const next = { ...value };
                if (alloyId === SAME) delete next[run.id];
                else next[run.id] = alloyId;
                onChange(next);
              }}
            />
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.sm, alignItems: 'flex-start' },
  list: { gap: spacing.md, alignSelf: 'stretch' },
});
