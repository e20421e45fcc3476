import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { JointCheck } from '../../shared/engine/types';
import { type UnitSystem, wordPhrase } from '../../shared/units';
import { Text } from '../ui/text';

/** Each check of a joint as a line a fabricator can act on, failures first. */
export function CheckList({ checks, label, units }: { checks: JointCheck[]; label: string; units: UnitSystem }) {
  const ordered = [...checks].sort((a, b) => Number(a.ok) - Number(b.ok));
  return (
    <View role="list" aria-label={label} style={styles.list}>
      {ordered.map((c) => (
        <View role="listitem" key={c.code}>
          <Text tone={c.ok ? 'success' : 'danger'}>
            {c.ok ? '✓ ' : '✗ '}
            {wordPhrase(c.message, units)}
          </Text>
        </View>
      ))}
    </View>
  );
}

/** Where a joint's figures come from and what the check leaves out, in small print under the panel. */
export function BasisNotes({ notes, simplified }: { notes: string[]; simplified: string }) {
  return (
    <View style={styles.list}>
      {notes.map((n) => (
        <Text key={n} variant="caption" tone="muted">
          {n}.
        </Text>
      ))}
      <Text variant="caption" tone="warning">
        {simplified}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xs },
});
