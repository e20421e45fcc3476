import { View } from 'react-native';
import { useJobDepositsQuery } from '../../hooks/use-deposits';
import { formatMinor } from '../../shared/payments/deposit-amount';
import { Text } from '../ui/text';

/** On the job sheet: which of the job's quotes has its deposit paid (or refunded), so the shop floor knows it may order. */
export function JobDepositNote({ jobId }: { jobId: string }) {
  const deposits = useJobDepositsQuery(jobId);
  const settled = (deposits.data ?? []).filter((d) => d.status === 'paid' || d.status === 'refunded');
  if (settled.length === 0) return null;
  return (
    <View role="group" aria-label="Deposits">
      {settled.map((d) => (
        <Text key={d.quoteId} variant="bodyStrong" tone={d.status === 'paid' ? 'success' : 'muted'}>
          {d.status === 'paid'
            ? `Deposit paid: ${formatMinor(d.amountMinor, d.currency)} on quote ${d.quoteNumber}${d.paidAt ? ` (${d.paidAt.slice(0, 10)})` : ''}`
            : `Deposit refunded on quote ${d.quoteNumber}${d.refundReason ? `: ${d.refundReason}` : ''}`}
        </Text>
      ))}
    </View>
  );
}
