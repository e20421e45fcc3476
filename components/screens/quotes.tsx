import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { QuoteList } from '../quotes/quote-list';
import { Button } from '../ui/button';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useQuotesQuery } from '../../hooks/use-quotes';
import { useSessionQuery } from '../../hooks/use-session';
import { useScreenTitle } from '../ui/use-screen-title';

export default function QuotesScreen() {
  const { data: me } = useSessionQuery();
  const quotes = useQuotesQuery();
  const canSell = me?.role === 'sales' || me?.role === 'admin';
  const router = useRouter();
  const newQuote = canSell ? <Button label="New quote" onPress={() => router.push('/quotes/new')} /> : null;

  useScreenTitle('Quotes');
  return (
    <Screen>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          Quotes
        </Text>
        <Text tone="muted">
          {canSell
            ? 'Material options for a customer, priced from a job’s runs. Drafts can change; a sent quote keeps its prices.'
            : 'Quotes sales has built from the shop’s jobs. You can read them; sales and admins make and send them.'}
        </Text>
        {newQuote}
      </View>
      {quotes.isPending ? (
        <LoadingState label="Loading quotes…" />
      ) : quotes.isError ? (
        <ErrorBanner title="The quotes did not load" message={messageOf(quotes.error)} onRetry={() => void quotes.refetch()} />
      ) : quotes.data.length === 0 ? (
        <EmptyState title="No quotes yet" message={canSell ? 'Start one from a job with “New quote”.' : 'Sales has not built any quotes yet.'} />
      ) : (
        <QuoteList quotes={quotes.data} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.sm, alignItems: 'flex-start' },
});
