import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { DepositPanel } from '../quotes/deposit-panel';
import { EmailPreviewSection } from '../quotes/email-preview-section';
import { HistoryCard, QuoteDetail } from '../quotes/quote-detail';
import { LimitOverridePanel } from '../quotes/limit-override-panel';
import { QuoteBuilder } from '../quotes/quote-builder';
import { QuoteHeader } from '../quotes/quote-header';
import { SendPanel } from '../quotes/send-panel';
import { ActivitySection } from '../ui/activity-list';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { layout, spacing } from '../../constants/theme';
import { isApiError, messageOf } from '../../hooks/api-client';
import { useLimitOverrideMutation, useQuoteActivityQuery, useQuoteQuery, useSendQuoteMutation, useUpdateQuoteMutation } from '../../hooks/use-quotes';
import { useSessionQuery } from '../../hooks/use-session';
import type { QuoteView } from '../../shared/schemas/quotes';
import { useScreenTitle } from '../ui/use-screen-title';

export default function QuoteScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const { data: me } = useSessionQuery();
  const quote = useQuoteQuery(id);
  const activity = useQuoteActivityQuery(id);

  useScreenTitle(quote.data ? `Quote ${quote.data.number}` : 'Quote', quote.data?.customerName, 'Quotes');
  if (quote.isPending || !me) return <LoadingState label="Loading the quote…" />;
  if (quote.isError) {
    return (
      <Screen>
        {isApiError(quote.error) && quote.error.kind === 'not_found' ? (
          <EmptyState title="There is no such quote" message="It may have been mistyped; the list has every quote." />
        ) : (
          <ErrorBanner title="The quote did not load" message={messageOf(quote.error)} onRetry={() => void quote.refetch()} />
        )}
      </Screen>
    );
  }
  const canSell = me.role === 'sales' || me.role === 'admin';
  return (
    <Screen wide>
      <QuoteHeader quote={quote.data} />
      <LimitsSection quote={quote.data} canOverride={(me.role === 'engineer' || me.role === 'admin') && quote.data.status === 'draft'} />
      {quote.data.status === 'draft' && canSell ? <DraftEditor quote={quote.data} /> : <QuoteDetail quote={quote.data} />}
      {quote.data.deposit ? <DepositPanel quoteId={quote.data.id} deposit={quote.data.deposit} canRefund={me.role === 'admin'} /> : null}
      <ActivitySection intro="Who created, changed and sent this quote." query={activity} />
    </Screen>
  );
}

function LimitsSection({ quote, canOverride }: { quote: QuoteView; canOverride: boolean }) {
  const override = useLimitOverrideMutation(quote.id);
  if (!quote.pricing) return null;
  return <LimitOverridePanel options={quote.pricing.options} overrides={quote.limitOverrides} canOverride={canOverride} onOverride={(input) => override.mutateAsync(input)} />;
}

function DraftEditor({ quote }: { quote: QuoteView }) {
  const update = useUpdateQuoteMutation(quote.id);
  const send = useSendQuoteMutation(quote.id);
  const [dirty, setDirty] = useState(false);
  const [defaults] = useState(() => ({
    jobId: quote.jobId,
    customerName: quote.customerName,
    customerEmail: quote.customerEmail,
    customerCompany: quote.customerCompany,
    validUntil: quote.validUntil,
    message: quote.message,
    options: quote.options.map((o) => ({ label: o.label, alloyId: o.alloyId, runAlloys: o.runAlloys ?? {} })),
  }));
  return (
    <View style={styles.stack}>
      <QuoteBuilder defaultValues={defaults} submitLabel="Save changes" onSubmit={(values) => update.mutateAsync(values)} onDirtyChange={setDirty} />
      <View style={styles.pair}>
        <View style={styles.pairItem}>
          <SendPanel
            number={quote.number}
            customerEmail={quote.customerEmail}
            onSend={() => send.mutateAsync()}
            disabledReason={dirty ? 'Save your changes first: sending sends the saved draft.' : undefined}
          />
        </View>
        <View style={styles.pairItem}>
          <HistoryCard quote={quote} />
        </View>
      </View>
      <EmailPreviewSection quoteId={quote.id} />
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.xl },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xl },
  pairItem: { flexGrow: 1, flexBasis: layout.formMaxWidth - spacing.xxxl },
});
