import { useEffect } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { formatMinor } from '../../shared/payments/deposit-amount';
import type { DepositView } from '../../shared/schemas/deposits';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { formatDateTime } from './format';

export interface PublicDepositCardProps {
  deposit: DepositView;
  shopName: string;
  /** The customer has just come back from the payment page (the address says so). */
  returned: boolean;
  paying: boolean;
  payError?: string;
  onPay: () => void;
  onRefresh: () => void;
}

/** After acceptance: what deposit is due, the way to pay it, and how the payment went. */
export function PublicDepositCard({ deposit, shopName, returned, paying, payError, onPay, onRefresh }: PublicDepositCardProps) {
  const amount = formatMinor(deposit.amountMinor, deposit.currency);
  const waiting = returned && deposit.status === 'pending';
  // The provider's confirmation reaches the shop on its own path; until it has, ask again now and then.
  useEffect(() => {
    if (!waiting) return;
    const timer = setInterval(onRefresh, 2000);
    return () => clearInterval(timer);
  }, [waiting, onRefresh]);

  if (deposit.status === 'paid') {
    return (
      <View accessible accessibilityRole="alert" aria-live="polite" style={[styles.box, styles.paid]}>
        <Text variant="heading" headingLevel={2} tone="success">
          Deposit paid
        </Text>
        <Text>
          {amount} received{deposit.paidAt ? ` on ${formatDateTime(deposit.paidAt)}` : ''}. A receipt is on its way by e-mail. Thank you.
        </Text>
      </View>
    );
  }
  if (deposit.status === 'refunded') {
    return (
      <Card>
        <Text variant="heading" headingLevel={2}>
          Deposit refunded
        </Text>
        <Text>
          {shopName} refunded your deposit of {amount}
          {deposit.refundReason ? `: ${deposit.refundReason}` : '.'}
        </Text>
      </Card>
    );
  }
  return (
    <Card>
      <Text variant="heading" headingLevel={2}>
        Deposit due
      </Text>
      <Text variant="bodyStrong">{amount}</Text>
      <Text tone="muted">
        {deposit.sharePct} % of the option you accepted, paid online to {shopName}. The rest is settled with the shop as agreed.
      </Text>
      {deposit.status === 'failed' ? (
        <ErrorBanner title="The payment did not go through" message={`${deposit.failureMessage ?? 'The payment failed.'} Nothing was charged. You can try again, with the same card or another.`} />
      ) : null}
      {waiting ? <Text tone="muted">Waiting for the payment provider to confirm your payment…</Text> : null}
      {payError ? <ErrorBanner message={payError} /> : null}
      <View style={styles.actions}>
        <Button label={deposit.status === 'failed' ? 'Try the payment again' : 'Pay deposit'} loading={paying} onPress={onPay} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xs, padding: spacing.lg, borderRadius: radii.lg, borderLeftWidth: 6 },
  paid: { borderLeftColor: colors.success, backgroundColor: colors.successSoft },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
