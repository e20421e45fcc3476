import { useState } from 'react';
import { messageOf } from '../../hooks/api-client';
import { useStartDepositMutation } from '../../hooks/use-deposits';
import type { PublicQuoteView } from '../../shared/schemas/quotes';
import { goToPaymentPage } from './go-to-payment';
import { PublicDepositCard } from './public-deposit-card';

/** The deposit part of the customer's page, with the step to the payment provider's page. */
export function PublicDepositSection({ token, quote, returned, onRefresh }: { token: string; quote: PublicQuoteView; returned: boolean; onRefresh: () => void }) {
  const start = useStartDepositMutation(token);
  const [leaving, setLeaving] = useState(false);
  if (!quote.deposit) return null;
  return (
    <PublicDepositCard
      deposit={quote.deposit}
      shopName={quote.shopName}
      returned={returned}
      paying={start.isPending || leaving}
      payError={start.error ? messageOf(start.error) : undefined}
      onPay={() =>
        start.mutate(undefined, {
          onSuccess: (url) => {
            setLeaving(true);
            goToPaymentPage(url);
          },
        })
      }
      onRefresh={onRefresh}
    />
  );
}
