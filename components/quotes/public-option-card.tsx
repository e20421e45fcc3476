import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import type { PublicQuoteView } from '../../shared/schemas/quotes';
import { type UnitSystem, wordPhrase } from '../../shared/units';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { formatDegrees, formatDegreesDifference, formatKg, formatKgDifference, formatMoney, formatMoneyDifference, formatPercentDifference } from './format';

type PublicOption = PublicQuoteView['options'][number];

export interface PublicOptionCardProps {
  option: PublicOption;
  index: number;
  currency: string;
  accepted: boolean;
  /** The customer's choice on the page. */
  units: UnitSystem;
  /** The accept button or form, while the customer may still decide. */
  children?: ReactNode;
}

function headroom(c: number, units: UnitSystem): string {
  return c < 0
    ? `The hottest part runs ${formatDegrees(-c, units)} above what this material is rated for.`
    : `${formatDegrees(c, units)} of temperature in hand at the hottest part.`;
}

/** One option as the customer weighs it: price, the difference from option 1, weight and heat. */
export function PublicOptionCard({ option, index, currency, accepted, units, children }: PublicOptionCardProps) {
  const first = index === 0;
  return (
    <Card edge={accepted ? 'primary' : first ? 'muted' : undefined} style={styles.card}>
      <View role="group" aria-label={`Option ${index + 1}`} style={styles.body}>
        <Text variant="overline" tone="muted">
          Option {index + 1}
        </Text>
        <Text variant="heading" headingLevel={2}>
          {option.label}
        </Text>
        {accepted ? (
          <Text variant="bodyStrong" tone="success">
            Your choice
          </Text>
        ) : null}
        <Text variant="title">{formatMoney(option.total, currency)}</Text>
        <Text tone="muted">
          {first
            ? 'The starting point the other options are compared with.'
            : `${formatMoneyDifference(option.costDifference, currency)} (${formatPercentDifference(option.costDifferencePct)}) against option 1`}
        </Text>
        <View style={styles.facts}>
          <Text>
            <Text variant="bodyStrong">Weight: </Text>
            {formatKg(option.massKg, units)}
            {first ? '' : ` (${formatKgDifference(option.massDifferenceKg, units)} against option 1)`}
          </Text>
          <Text>
            <Text variant="bodyStrong">Heat: </Text>
            {headroom(option.tempMarginC, units)}
            {first ? '' : ` ${formatDegreesDifference(option.tempMarginGainedC, units)} against option 1.`}
          </Text>
        </View>
        {option.limitCaution ? (
          <View style={[styles.caution, option.limitState === 'over' ? styles.over : null]} role="note" aria-label={`Temperature caution for option ${index + 1}`}>
            <Text variant="bodyStrong">{wordPhrase(option.limitCaution, units)}</Text>
          </View>
        ) : null}
        <View style={styles.alloys}>
          <Text variant="label">What the material means for you</Text>
          {option.alloys.map((a) => (
            <Text key={a.uns} variant="caption">
              {wordPhrase(a.plainWords, units)} (UNS {a.uns})
            </Text>
          ))}
        </View>
        {children}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { flexGrow: 1, flexBasis: 280 },
  body: { gap: spacing.sm },
  facts: { gap: spacing.xs },
  alloys: { gap: spacing.xs },
  caution: { padding: spacing.md, borderRadius: radii.md, borderLeftWidth: 4, borderLeftColor: colors.warning, backgroundColor: colors.warningSoft },
  over: { borderLeftColor: colors.danger },
});
