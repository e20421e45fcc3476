import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import type { QuoteEventView } from '../../shared/schemas/quotes';
import { Text } from '../ui/text';
import { formatDateTime } from './format';
import { StatusBadge } from './status-badge';

/** What happened to the quote, oldest first. */
export function StatusHistory({ events }: { events: QuoteEventView[] }) {
  if (events.length === 0) return <Text tone="muted">Nothing has happened to this quote yet.</Text>;
  return (
    <View role="list" aria-label="Status history" style={styles.list}>
      {events.map((e, i) => (
        <View key={`${e.at}-${i}`} role="listitem" style={styles.item}>
          <View style={styles.line}>
            <StatusBadge status={e.status} />
            <Text variant="caption" tone="muted">
              {formatDateTime(e.at)}
              {e.by ? ` · ${e.by}` : ''}
            </Text>
          </View>
          {e.note ? <Text variant="caption">{e.note}</Text> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  item: { gap: spacing.xxs, paddingLeft: spacing.md, borderLeftWidth: 3, borderLeftColor: colors.border },
  line: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
});
