import { zodResolver } from '@hookform/resolvers/zod';
import { Controller } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useRefundDepositMutation } from '../../hooks/use-deposits';
import { formatMinor } from '../../shared/payments/deposit-amount';
import { refundDepositSchema, type DepositView, type RefundDepositInput } from '../../shared/schemas/deposits';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { DepositBadge } from './deposit-badge';
import { formatDateTime } from './format';
import { useCheckedForm } from '../forms/use-checked-form';

/** The quote's deposit as the shop sees it, and for an admin the refund. */
export function DepositPanel({ quoteId, deposit, canRefund }: { quoteId: string; deposit: DepositView; canRefund: boolean }) {
  const amount = formatMinor(deposit.amountMinor, deposit.currency);
  return (
    <Card>
      <Text variant="heading" headingLevel={2}>
        Deposit
      </Text>
      <DepositBadge deposit={deposit} />
      <Text>
        {amount}, {deposit.sharePct} % of the accepted option
        {deposit.attempts > 0 ? ` · ${deposit.attempts} payment attempt${deposit.attempts === 1 ? '' : 's'}` : ''}
      </Text>
      {deposit.paidAt ? <Text tone="muted">Paid {formatDateTime(deposit.paidAt)}</Text> : null}
      {deposit.status === 'failed' && deposit.failureMessage ? <Text tone="danger">Last attempt failed: {deposit.failureMessage}</Text> : null}
      {deposit.refundedAt ? (
        <Text tone="muted">
          Refunded {formatDateTime(deposit.refundedAt)}
          {deposit.refundReason ? `: ${deposit.refundReason}` : ''}
        </Text>
      ) : null}
      {canRefund && deposit.status === 'paid' ? <RefundForm quoteId={quoteId} amount={amount} /> : null}
    </Card>
  );
}

function RefundForm({ quoteId, amount }: { quoteId: string; amount: string }) {
  const refund = useRefundDepositMutation(quoteId);
  const { control, handleSubmit, formState } = useCheckedForm<RefundDepositInput>({ resolver: zodResolver(refundDepositSchema), defaultValues: { reason: '' } });
  return (
    <View style={styles.form}>
      <Controller
        control={control}
        name="reason"
        render={({ field: { value, onChange, onBlur, ref } }) => (
          <TextField ref={ref} label="Reason for the refund" value={value} onChangeText={onChange} onBlur={onBlur} error={formState.errors.reason?.message} hint="Kept in the quote’s history and sent to the customer" />
        )}
      />
      {refund.error ? <ErrorBanner title="The refund did not go through" message={messageOf(refund.error)} /> : null}
      <Button label={`Refund ${amount}`} variant="secondary" loading={refund.isPending} onPress={handleSubmit((values) => refund.mutateAsync(values).catch(() => undefined))} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md, marginTop: spacing.sm },
});
