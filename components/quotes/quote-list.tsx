import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { QuoteSummary } from '../../shared/schemas/quotes';
import { Text } from '../ui/text';
import { formatMoney } from './format';
import { LinkList } from './link-row';
import { DepositBadge } from './deposit-badge';
import { StatusBadge } from './status-badge';

function totalRange(q: QuoteSummary): string {
  if (q.totalFrom === null || q.totalTo === null) return 'Not priced';
  if (Math.abs(q.totalTo - q.totalFrom) < 0.005) return formatMoney(q.totalFrom, q.currency);
  return `${formatMoney(q.totalFrom, q.currency)} – ${formatMoney(q.totalTo, q.currency)}`;
}

/** One row per quote: number and status first, the customer, the job, the totals and the date. */
export function QuoteList({ quotes }: { quotes: QuoteSummary[] }) {
  return (
    <LinkList
      items={quotes}
      keyOf={(q) => q.id}
      hrefOf={(q) => `/quotes/${q.id}`}
      labelOf={(q) => `Quote ${q.number}, ${q.customerName}`}
      render={(q) => (
        <>
          <View style={styles.top}>
            <Text variant="bodyStrong">{q.number}</Text>
            <StatusBadge status={q.status} />
          </View>
          {q.deposit ? <DepositBadge deposit={q.deposit} /> : null}
          <Text>
            {q.customerName}
            {q.customerCompany ? `, ${q.customerCompany}` : ''}
          </Text>
          <Text tone="muted" variant="caption">
            Job: {q.jobName}
          </Text>
          <View style={styles.bottom}>
            <Text variant="label">{totalRange(q)}</Text>
            <Text tone="muted" variant="caption">
              Valid until {q.validUntil}
            </Text>
          </View>
        </>
      )}
    />
  );
}

const styles = StyleSheet.create({
  top: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  bottom: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: spacing.sm, flexWrap: 'wrap' },
});
