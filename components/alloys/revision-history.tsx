import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import type { RevisionView, SourceView } from '../../shared/schemas/alloy';
import type { UnitSystem } from '../../shared/units';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { DiffList } from './diff-list';
import { formatWhen } from './format';

const ACTION_LABELS: Record<RevisionView['action'], string> = {
  created: 'Created',
  edited: 'Edited',
  published: 'Published',
  retired: 'Retired',
  restored: 'Restored',
  datasheet_added: 'Data sheet added',
  datasheet_removed: 'Data sheet removed',
  submitted: 'Submitted for review',
  sent_back: 'Sent back',
};

const SHOWN_AT_FIRST = 4;

export function RevisionHistory({
  revisions,
  sources,
  units,
}: {
  revisions: RevisionView[];
  sources: Map<string, SourceView>;
  units: UnitSystem;
}) {
  if (revisions.length === 0) return <Text tone="muted">No changes recorded yet.</Text>;
  // Newest first: that is what someone checking a recent change looks for.
  const ordered = [...revisions].sort((a, b) => b.at.localeCompare(a.at));
  return (
    <View role="list" aria-label="Revision history" style={styles.list}>
      {ordered.map((r) => (
        <RevisionItem key={r.id} revision={r} sources={sources} units={units} />
      ))}
    </View>
  );
}

function RevisionItem({ revision: r, sources, units }: { revision: RevisionView; sources: Map<string, SourceView>; units: UnitSystem }) {
  const [all, setAll] = useState(false);
  const diff = all ? r.diff : r.diff.slice(0, SHOWN_AT_FIRST);
  const title = `${ACTION_LABELS[r.action]}${r.version !== null ? ` · version ${r.version}` : ''}`;
  return (
    <View role="listitem" style={styles.item}>
      <Text variant="bodyStrong">{title}</Text>
      <Text variant="caption" tone="muted">
        {formatWhen(r.at)} · {r.by ?? 'unknown'}
      </Text>
      {r.note ? <Text>“{r.note}”</Text> : null}
      {r.action === 'datasheet_added' ? null : <DiffList diff={diff} sources={sources} units={units} label={`Changes: ${title}`} />}
      {r.diff.length > SHOWN_AT_FIRST && r.action !== 'datasheet_added' ? (
        <Button
          label={all ? 'Show fewer' : `Show all ${r.diff.length} changes`}
          variant="ghost"
          compact
          onPress={() => setAll(!all)}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.lg },
  item: { gap: spacing.xs, paddingLeft: spacing.md, borderLeftWidth: 3, borderLeftColor: colors.primary },
});
