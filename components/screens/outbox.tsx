import { StyleSheet, View } from 'react-native';
import { OutboxList } from '../outbox/outbox-list';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useOutboxQuery } from '../../hooks/use-outbox';
import { useSessionQuery } from '../../hooks/use-session';
import { useScreenTitle } from '../ui/use-screen-title';

export default function OutboxScreen() {
  const { data: me } = useSessionQuery();
  const allowed = me?.role === 'admin' || me?.role === 'sales';
  const outbox = useOutboxQuery(allowed);

  useScreenTitle('Outbox');
  if (!me) return <LoadingState />;
  return (
    <Screen>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          Outbox
        </Text>
        <Text tone="muted">Every e-mail Dilato has sent, newest first: quotes to customers and their answers to you.</Text>
      </View>
      {!allowed ? (
        <EmptyState title="Only sales and admins read the outbox" message="It holds customers’ addresses and quotes." />
      ) : outbox.isPending ? (
        <LoadingState label="Loading messages…" />
      ) : outbox.isError ? (
        <ErrorBanner title="The outbox did not load" message={messageOf(outbox.error)} onRetry={() => void outbox.refetch()} />
      ) : outbox.data.length === 0 ? (
        <EmptyState title="No messages yet" message="Sending a quote puts its e-mail here." />
      ) : (
        <OutboxList messages={outbox.data} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
});
