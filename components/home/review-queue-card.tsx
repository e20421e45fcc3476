import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useReviewQueueQuery } from '../../hooks/use-alloys';
import { formatWhen } from '../alloys/format';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';

/** The admin's list of catalogue drafts waiting for review, with their count. */
export function ReviewQueueCard() {
  const queue = useReviewQueueQuery();
  const count = queue.data?.count ?? 0;
  return (
    <Card edge={count > 0 ? 'accent' : 'muted'}>
      <View style={styles.stack} aria-label="Review queue">
        <Text variant="heading" headingLevel={2}>
          {queue.data ? `Waiting for review: ${count}` : 'Waiting for review'}
        </Text>
        {queue.isError ? <ErrorBanner message={messageOf(queue.error)} onRetry={() => void queue.refetch()} /> : null}
        {queue.data && count === 0 ? <Text tone="muted">No catalogue drafts are waiting. Engineers submit drafts here when they are ready.</Text> : null}
        {queue.data && count > 0 ? (
          <View role="list" style={styles.stack}>
            {queue.data.items.map((item) => (
              <View role="listitem" key={item.alloyId} style={styles.item}>
                <TextLink
                  href={`/alloys/${item.alloyId}/review`}
                  label={`Review ${item.designation} (UNS ${item.uns}), version ${item.version}`}
                />
                <Text variant="caption" tone="muted">
                  {item.isNew ? 'New alloy' : 'Changes to a published alloy'} · submitted {formatWhen(item.submittedAt)}
                  {item.submittedBy ? ` by ${item.submittedBy}` : ''}
                </Text>
                {item.note ? <Text variant="caption">“{item.note}”</Text> : null}
              </View>
            ))}
          </View>
        ) : null}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.sm },
  item: { gap: spacing.xs },
});
