import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { OutboxMessage } from '../../hooks/use-outbox';
import { formatDateTime } from '../quotes/format';
import { LinkList } from '../quotes/link-row';
import { Text } from '../ui/text';

/** Stored messages, newest first: who it went to, the subject and when. */
export function OutboxList({ messages }: { messages: OutboxMessage[] }) {
  return (
    <LinkList
      items={messages}
      keyOf={(m) => m.id}
      hrefOf={(m) => `/outbox/${m.id}`}
      labelOf={(m) => `${m.subject}, to ${m.to}`}
      render={(m) => (
        <>
          <Text variant="bodyStrong">{m.subject}</Text>
          <View style={styles.meta}>
            <Text variant="caption">To {m.to}</Text>
            <Text variant="caption" tone="muted">
              {formatDateTime(m.receivedAt)}
            </Text>
          </View>
        </>
      )}
    />
  );
}

const styles = StyleSheet.create({
  meta: { flexDirection: 'row', justifyContent: 'space-between', gap: spacing.sm, flexWrap: 'wrap' },
});
