import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import type { ActivityAction, ActivityChange, ActivityView } from '../../shared/schemas/activity';
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

/** A value as one short line: text as it is, anything structured as compact JSON, cut at 80 characters. */
function short(value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  const text = typeof value === 'string' ? value : JSON.stringify(value);
  return text.length > 80 ? `${text.slice(0, 79)}…` : text;
}

function ChangeLine({ change }: { change: ActivityChange }) {
  return (
    <Text variant="caption">
      {change.path}: {short(change.before)} → {short(change.after)}
    </Text>
  );
}

/** Who changed what, newest first, with the fields each change touched. */
export function ActivityList({ items, label }: { items: ActivityView[]; label: string }) {
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
          {a.action === 'deleted' ? null : a.changes.slice(0, SHOWN_CHANGES).map((c) => <ChangeLine key={c.path} change={c} />)}
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
  return (
    <View style={styles.section}>
      <Text variant="heading" headingLevel={2}>
        {title}
      </Text>
      <Text tone="muted">{intro}</Text>
      {query.data ? (
        <ActivityList items={query.data} label={title} />
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
