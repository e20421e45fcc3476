import { useLocalSearchParams } from 'expo-router';
import { PublicDepositSection } from '../../components/quotes/public-deposit-section';
import { PublicNotice } from '../../components/quotes/public-notice';
import { PublicQuotePage } from '../../components/quotes/public-quote-page';
import { LoadingState } from '../../components/ui/loading-state';
import { Screen } from '../../components/ui/screen';
import { isApiError } from '../../hooks/api-client';
import { usePublicDecisionMutation, usePublicQuoteQuery } from '../../hooks/use-public-quote';
import { useScreenTitle } from '../../components/ui/use-screen-title';

/** The customer's private link: no account, and no way from here into the shop's app. */
export default function PublicQuoteScreen() {
  const { token = '', deposit: returnedFromPayment } = useLocalSearchParams<{ token: string; deposit?: string }>();
  const quote = usePublicQuoteQuery(token);
  const decide = usePublicDecisionMutation(token);

  useScreenTitle(quote.data ? `Quote ${quote.data.number}` : 'Your quote', quote.data?.shopName);
  if (quote.isPending) return <LoadingState label="Opening your quote…" />;
  if (quote.isError) {
    const error = quote.error;
    const notice =
      isApiError(error) && error.status === 410
        ? { title: 'This quote has expired', message: 'Its validity date has passed. Ask the shop for a fresh quote; they will be glad to send one.' }
        : isApiError(error) && error.status === 404
          ? { title: 'This quote link is not valid', message: 'Check that the whole link from the e-mail was copied, or ask the shop to send it again.' }
          : { title: 'Your quote could not be opened just now', message: 'The connection or the shop’s server had a problem. Try again in a moment.', retry: true };
    return (
      <Screen narrow>
        <PublicNotice title={notice.title} message={notice.message} onRetry={'retry' in notice ? () => void quote.refetch() : undefined} />
      </Screen>
    );
  }
  return (
    <Screen wide>
      <PublicQuotePage
        quote={quote.data}
        onDecide={(decision) => decide.mutateAsync(decision)}
        depositSection={<PublicDepositSection token={token} quote={quote.data} returned={Boolean(returnedFromPayment)} onRefresh={() => void quote.refetch()} />}
      />
    </Screen>
  );
}
