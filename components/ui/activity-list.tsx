import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import type { ActivityAction, ActivityChange, ActivityView } from '../../shared/schemas/activity';
import { useUnits } from '../../hooks/use-units';
import type { UnitSystem } from '../../shared/units';
import { wordChange } from './activity-words';
import { ErrorBanner } from './error-banner';
import { Text } from './text';

const ACTION_LABELS: Record<ActivityAction, string> = {
  created: 'created',
  edited: 'edited',
  archived: 'archived',
  unarchived: 'unarchived',
  deleted: 'deleted',
  duplicated: 'made as a copy',
  reordered: 'runs put in a new order',
  sent: 'sent',
  refunded: 'deposit refunded',
  limit_overridden: 'temperature limit override recorded',
};
const SUBJECT_LABELS: Record<ActivityView['subject'], string> = { job: 'Job', run: 'Run', quote: 'Quote' };
const SHOWN_CHANGES = 4;

function when(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });
}

function ChangeLine({ change, units }: { change: ActivityChange; units: UnitSystem }) {
  return <Text variant="caption">{wordChange(change, units)}</Text>;
}

/** Who changed what, newest first, with the fields each change touched. */
export function ActivityList({ items, label, units = 'metric' }: { items: ActivityView[]; label: string; units?: UnitSystem }) {
  if (items.length === 0) return <Text tone="muted">Nothing recorded yet.</Text>;
  return (
    <View role="list" aria-label={label} style={styles.list}>
      {items.map((a) => (
        <View key={a.id} role="listitem" style={styles.item}>
          <Text variant="bodyStrong">
            {SUBJECT_LABELS[a.subject]} “{a.subjectName}” {ACTION_LABELS[a.action]}
          </Text>
          <Text variant="caption" tone="muted">
            {when(a.at)} · {a.by ?? 'unknown'}
          </Text>
          {a.action === 'deleted' ? null : a.changes.slice(0, SHOWN_CHANGES).map((c) => <ChangeLine key={c.path} change={c} units={units} />)}
          {a.action !== 'deleted' && a.changes.length > SHOWN_CHANGES ? (
            <Text variant="caption" tone="muted">
              …and {a.changes.length - SHOWN_CHANGES} more fields
            </Text>
          ) : null}
        </View>
      ))}
    </View>
  );
}

/** The list as a page section: loading, failed (with a retry) or the entries. */
export function ActivitySection({ title = 'Activity', intro, query }: { title?: string; intro: string; query: { data?: ActivityView[]; error: unknown; refetch: () => unknown } }) {
  const units = useUnits();
  return (
    <View style={styles.section}>
      <Text variant="heading" headingLevel={2}>
        {title}
      </Text>
      <Text tone="muted">{intro}</Text>
      {query.data ? (
        <ActivityList items={query.data} label={title} units={units} />
      ) : query.error ? (
        <ErrorBanner title="The activity did not load" message="Try again in a moment." onRetry={() => void query.refetch()} />
      ) : (
        <Text tone="muted">Loading the activity…</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.md },
  list: { gap: spacing.md },
  item: { gap: spacing.xxs, borderLeftWidth: 3, borderLeftColor: colors.border, paddingLeft: spacing.sm },
});
