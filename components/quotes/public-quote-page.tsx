import { type ReactNode, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { useCustomerUnits } from '../../hooks/use-customer-units';
import type { PublicDecision } from '../../hooks/use-public-quote';
import type { PublicQuoteView } from '../../shared/schemas/quotes';
import { Button } from '../ui/button';
import { SegmentedControl } from '../ui/segmented-control';
import { UNIT_OPTIONS } from '../units/unit-switch';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { CustomerCautions } from './customer-cautions';
import { AcceptForm, DeclineForm } from './decision-forms';
import { PublicOptionCard } from './public-option-card';

export interface PublicQuotePageProps {
  quote: PublicQuoteView;
  onDecide: (decision: PublicDecision) => Promise<unknown>;
  /** Shown under the decision: the deposit once the quote is accepted. */
  depositSection?: ReactNode;
}

type Step = { kind: 'choosing' } | { kind: 'accepting'; index: number } | { kind: 'declining' };

/** The customer's view of one quote through its private link; nothing of the shop's app is reachable. */
export function PublicQuotePage({ quote, onDecide, depositSection }: PublicQuotePageProps) {
  const [step, setStep] = useState<Step>({ kind: 'choosing' });
  const [decidedBy, setDecidedBy] = useState<string>();
  const open = quote.status === 'sent' || quote.status === 'viewed';
  const [units, setUnits] = useCustomerUnits(quote.units);

  return (
    <View style={styles.page}>
      <View style={styles.header}>
        <Text variant="overline" tone="muted">
          {quote.shopName}
        </Text>
        <Text variant="title" headingLevel={1}>
          Quote {quote.number}
        </Text>
        <Text variant="bodyStrong">
          For {quote.customerName}
          {quote.customerCompany ? `, ${quote.customerCompany}` : ''}: {quote.jobName}
        </Text>
        <Text tone="muted">Valid until {quote.validUntil}</Text>
        {quote.message ? <Text>{quote.message}</Text> : null}
        <SegmentedControl label="Show weights and temperatures in" options={UNIT_OPTIONS} value={units} onChange={setUnits} />
      </View>

      <Decided quote={quote} decidedBy={decidedBy} />
      {depositSection}

      <View style={styles.options}>
        {quote.options.map((option, index) => (
          <PublicOptionCard key={index} option={option} index={index} currency={quote.currency} accepted={quote.acceptedOptionIndex === index} units={units}>
            {open && step.kind === 'choosing' && option.acceptable ? (
              <Button label={`Accept option ${index + 1}`} onPress={() => setStep({ kind: 'accepting', index })} />
            ) : null}
            {open && !option.acceptable ? (
              <Text tone="danger">This option runs over its material’s temperature limit and cannot be accepted here; ask {quote.shopName} about it.</Text>
            ) : null}
            {decidedBy && quote.acceptedOptionIndex === index ? <Recorded shopName={quote.shopName} /> : null}
            {open && step.kind === 'accepting' && step.index === index ? (
              <AcceptForm
                optionIndex={index}
                optionLabel={option.label}
                onCancel={() => setStep({ kind: 'choosing' })}
                onSubmit={async (values) => {
                  await onDecide({ accept: true, ...values });
                  setDecidedBy(values.name);
                }}
              />
            ) : null}
          </PublicOptionCard>
        ))}
      </View>

      {decidedBy && quote.status === 'declined' ? <Recorded shopName={quote.shopName} /> : null}
      {open ? (
        <Card>
          <Text variant="heading" headingLevel={2}>
            None of these?
          </Text>
          {step.kind === 'declining' ? (
            <DeclineForm
              onCancel={() => setStep({ kind: 'choosing' })}
              onSubmit={async (values) => {
                await onDecide({ accept: false, ...values });
                setDecidedBy(values.name);
              }}
            />
          ) : (
            <>
              <Text tone="muted">You can decline the quote; a reason helps the shop, but is not needed.</Text>
              <Button label="Decline" variant="ghost" disabled={step.kind !== 'choosing'} onPress={() => setStep({ kind: 'declining' })} />
            </>
          )}
        </Card>
      ) : null}

      <CustomerCautions />
      <Text variant="caption" tone="muted">
        Prices and temperatures are the shop’s guidance for this job from typical alloy data. Local codes, the alloy supplier’s certified data and licensed engineering practice decide the final design.
      </Text>
    </View>
  );
}

/** Said where the customer pressed, so the answer is seen without scrolling back up. */
function Recorded({ shopName }: { shopName: string }) {
  return (
    <Text variant="bodyStrong" tone="success">
      Recorded. {shopName} has your answer.
    </Text>
  );
}

function Decided({ quote, decidedBy }: { quote: PublicQuoteView; decidedBy?: string }) {
  if (quote.status !== 'accepted' && quote.status !== 'declined') return null;
  const thanks = decidedBy ? `Thank you, ${decidedBy}. ` : '';
  const text =
    quote.status === 'accepted' && quote.acceptedOptionIndex !== null
      ? `${thanks}You accepted option ${quote.acceptedOptionIndex + 1}, ${quote.options[quote.acceptedOptionIndex]?.label}. ${quote.shopName} has been told and will be in touch.`
      : `${thanks}You declined this quote. ${quote.shopName} has been told.`;
  return (
    <View accessible accessibilityRole="alert" aria-live="polite" style={styles.decided}>
      <Text variant="heading" tone="success">
        {quote.status === 'accepted' ? 'Quote accepted' : 'Quote declined'}
      </Text>
      <Text>{text}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  page: { gap: spacing.xl },
  header: { gap: spacing.xs },
  options: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg, alignItems: 'stretch' },
  decided: { gap: spacing.xs, padding: spacing.lg, borderRadius: radii.lg, borderLeftWidth: 6, borderLeftColor: colors.success, backgroundColor: colors.successSoft },
});
