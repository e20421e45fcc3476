import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTarget } from '../../constants/theme';
import type { SourceInput, SourceView } from '../../shared/schemas/alloy';
import { Button } from '../ui/button';
import { pressState } from '../ui/press-state';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { sourceLabel } from './format';
import { NewSourceForm } from './new-source-form';
import { Tag } from '../ui/tag';
import { FieldError } from '../ui/field-error';

export interface SourcePickerProps {
  /** Visible label and accessible name, e.g. "Source of the density". */
  label: string;
  value: string;
  sources: SourceView[];
  onChange: (sourceId: string) => void;
  onCreateSource: (input: SourceInput) => Promise<SourceView>;
  error?: string;
}

const MAX_SHOWN = 8;

/** Which source a value cites: the current one, and on demand a searchable list or a new source. */
export function SourcePicker({ label, value, sources, onChange, onCreateSource, error }: SourcePickerProps) {
  const [open, setOpen] = useState(false);
  const [adding, setAdding] = useState(false);
  const [find, setFind] = useState('');
  const current = sources.find((s) => s.id === value);
  const needle = find.trim().toLowerCase();
  const matches = sources
    .filter((s) => !needle || `${s.title} ${s.issuer} ${s.edition} ${s.key ?? ''}`.toLowerCase().includes(needle))
    .slice(0, MAX_SHOWN);

  return (
    <View style={styles.wrapper}>
      <Text variant="label">{label}</Text>
      <View style={styles.current}>
        <Text style={styles.currentText} tone={current ? 'default' : 'muted'}>
          {current ? sourceLabel(current) : 'No source chosen'}
        </Text>
        {current?.kind === 'memory' ? <Tag label="To be verified" tone="warning" /> : null}
        <Button
          label={open ? 'Close' : 'Change'}
          accessibilityLabel={open ? `Close the list for ${label}` : `Change ${label}`}
          variant="ghost"
          compact
          onPress={() => {
            setOpen(!open);
            setAdding(false);
          }}
        />
      </View>
      <FieldError message={error} />
      {open ? (
        <View style={styles.panel}>
          {adding ? (
            <NewSourceForm
              onCreate={onCreateSource}
              onCreated={(s) => {
                onChange(s.id);
                setAdding(false);
                setOpen(false);
              }}
              onCancel={() => setAdding(false)}
            />
          ) : (
            <>
              <TextField label={`Find a source for ${label.toLowerCase()}`} value={find} onChangeText={setFind} />
              <View accessibilityRole="radiogroup" accessibilityLabel={label} style={styles.options}>
                {matches.map((s) => (
                  <Pressable
                    key={s.id}
                    accessibilityRole="radio"
                    accessibilityLabel={sourceLabel(s)}
                    aria-checked={s.id === value}
                    accessibilityState={{ checked: s.id === value }}
                    onPress={() => {
                      onChange(s.id);
                      setOpen(false);
                    }}
                    style={(state) => [styles.option, s.id === value && styles.selected, pressState(state).focused && styles.focused]}
                  >
                    <Text variant="caption">{sourceLabel(s)}</Text>
                  </Pressable>
                ))}
                {matches.length === 0 ? <Text tone="muted">No source matches.</Text> : null}
              </View>
              <Button label="Add a new source" variant="secondary" compact onPress={() => setAdding(true)} />
            </>
          )}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.xs, alignSelf: 'stretch' },
  current: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  currentText: { flexShrink: 1, flexGrow: 1, flexBasis: 160 },
  panel: { gap: spacing.sm, padding: spacing.sm, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surfaceRaised },
  options: { gap: spacing.xs },
  option: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: spacing.sm, borderRadius: radii.sm, borderWidth: 1, borderColor: colors.border },
  selected: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' },
});
