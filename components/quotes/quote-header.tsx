import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { QuoteView } from '../../shared/schemas/quotes';
import { Text } from '../ui/text';
import { StatusBadge } from './status-badge';

export function QuoteHeader({ quote }: { quote: QuoteView }) {
  return (
    <View style={styles.header}>
      <View style={styles.line}>
        <Text variant="title" headingLevel={1}>
          Quote {quote.number}
        </Text>
        <StatusBadge status={quote.status} />
      </View>
      <Text variant="bodyStrong">
        {quote.customerName}
        {quote.customerCompany ? `, ${quote.customerCompany}` : ''} · {quote.customerEmail}
      </Text>
      <Text tone="muted">
        Job: {quote.jobName} · valid until {quote.validUntil}
      </Text>
      {quote.acceptedOptionIndex !== null && quote.pricing ? (
        <Text tone="success" variant="bodyStrong">
          Accepted option {quote.acceptedOptionIndex + 1}: {quote.pricing.options[quote.acceptedOptionIndex]?.label}
          {quote.decidedBy ? ` (by ${quote.decidedBy})` : ''}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  line: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, flexWrap: 'wrap' },
});
