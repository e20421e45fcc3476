import { Link, useLocalSearchParams } from 'expo-router';
import { StyleSheet } from 'react-native';
import { MessageView } from '../outbox/message-view';
import { formatDateTime } from '../quotes/format';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { colors, spacing, touchTarget, typography } from '../../constants/theme';
import { isApiError, messageOf } from '../../hooks/api-client';
import { useOutboxMessageQuery } from '../../hooks/use-outbox';
import { useScreenTitle } from '../ui/use-screen-title';

export default function OutboxMessageScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const message = useOutboxMessageQuery(id);

  useScreenTitle(message.data?.subject ?? 'Message', 'Outbox');
  return (
    <Screen>
      <Link href="/outbox" style={styles.back} accessibilityRole="link">
        ← Outbox
      </Link>
      {message.isPending ? (
        <LoadingState label="Loading the message…" />
      ) : message.isError ? (
        isApiError(message.error) && message.error.kind === 'not_found' ? (
          <EmptyState title="There is no such message" />
        ) : (
          <ErrorBanner title="The message did not load" message={messageOf(message.error)} onRetry={() => void message.refetch()} />
        )
      ) : (
        <Card>
          <Text variant="title" headingLevel={1}>
            {message.data.subject}
          </Text>
          <MessageView
            subject={message.data.subject}
            to={message.data.to}
            text={message.data.text}
            html={message.data.html}
            showSubject={false}
            meta={`From ${message.data.from} · ${formatDateTime(message.data.receivedAt)}`}
          />
        </Card>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  back: { ...typography.bodyStrong, color: colors.primary, textDecorationLine: 'underline', minHeight: touchTarget, paddingVertical: spacing.md, alignSelf: 'flex-start' },
});
