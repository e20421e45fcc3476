import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { isoDateInDays } from '../quotes/format';
import { QuoteBuilder } from '../quotes/quote-builder';
import { newQuoteDefaults } from '../quotes/quote-form';
import { EmptyState } from '../ui/empty-state';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { spacing } from '../../constants/theme';
import { useCreateQuoteMutation } from '../../hooks/use-quotes';
import { useSessionQuery } from '../../hooks/use-session';
import { useScreenTitle } from '../ui/use-screen-title';

export default function NewQuoteScreen() {
  const router = useRouter();
  const { data: me } = useSessionQuery();
  const create = useCreateQuoteMutation();
  const [defaults] = useState(() => newQuoteDefaults(isoDateInDays(30)));

  useScreenTitle('New quote');
  if (!me) return <LoadingState />;
  if (me.role !== 'sales' && me.role !== 'admin') {
    return (
      <Screen>
        <Text variant="title" headingLevel={1}>
          New quote
        </Text>
        <EmptyState title="Only sales and admins build quotes" message="You can read every quote in the list." />
      </Screen>
    );
  }

  return (
    <Screen wide>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          New quote
        </Text>
        <Text tone="muted">Pick the job, say who it is for, and give two to four material options. Totals move as you choose.</Text>
      </View>
      <QuoteBuilder
        defaultValues={defaults}
        submitLabel="Save draft"
        onSubmit={async (values) => {
          const quote = await create.mutateAsync(values);
          router.replace(`/quotes/${quote.id}`);
        }}
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
});
