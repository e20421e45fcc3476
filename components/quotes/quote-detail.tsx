import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { QuoteView } from '../../shared/schemas/quotes';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { formatDateTime } from './format';
import { QuoteFigures } from './quote-figures';
import { StatusHistory } from './status-history';

/** A quote read as it stands: the frozen prices once sent, the accepted option marked, and its history. */
export function QuoteDetail({ quote }: { quote: QuoteView }) {
  const pricing = quote.pricing;
  return (
    <View style={styles.stack}>
      {quote.message ? (
        <Card>
          <Text variant="label">Message to the customer</Text>
          <Text>{quote.message}</Text>
        </Card>
      ) : null}
      {pricing ? (
        <QuoteFigures
          title={pricing.frozen ? 'Prices as sent' : 'Prices today'}
          caption={
            pricing.frozen
              ? `Frozen when the quote was sent (${formatDateTime(pricing.pricedAt)}); later catalogue or rate changes do not move them.`
              : 'A draft is priced from today’s published catalogue and shop settings.'
          }
          labels={pricing.options.map((o) => o.label)}
          currency={pricing.currency}
          settings={pricing.settings}
          options={pricing.options}
          comparisons={pricing.comparisons}
          acceptedIndex={quote.acceptedOptionIndex}
        />
      ) : (
        <ErrorBanner title="This quote cannot be priced right now" message={quote.pricingProblem ?? 'Its job or alloys are missing.'} />
      )}
      <HistoryCard quote={quote} />
    </View>
  );
}

export function HistoryCard({ quote }: { quote: QuoteView }) {
  return (
    <Card>
      <Text variant="heading" headingLevel={2}>
        Status history
      </Text>
      <StatusHistory events={quote.events} />
    </Card>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.xl },
});
