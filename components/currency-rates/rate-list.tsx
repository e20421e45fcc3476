import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import type { CurrencyRateView } from '../../shared/schemas/currency-rate';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

export interface RateListProps {
  shopCurrency: string;
  rates: CurrencyRateView[];
  onRemove?: (from: string) => void;
  removing?: string | null;
}

/** The rates on record; a rate set into another currency (before the shop changed its own) is shown as unused. */
export function RateList({ shopCurrency, rates, onRemove, removing }: RateListProps) {
  if (rates.length === 0) {
    return <Text tone="muted">No rates set: an alloy priced in another currency than {shopCurrency} is left out of totals and cannot be quoted.</Text>;
  }
  return (
    <View role="list" aria-label="Currency rates" style={styles.list}>
      {rates.map((r) => (
        <View key={`${r.from}-${r.to}`} role="listitem" style={styles.row}>
          <View style={styles.text}>
            <Text variant="bodyStrong">
              1 {r.from} = {r.rate} {r.to}
            </Text>
            <Text variant="caption" tone="muted">
              Set {r.setAt.slice(0, 10)}
              {r.setBy ? ` by ${r.setBy}` : ''}
              {r.to !== shopCurrency ? ` · not used: the shop now works in ${shopCurrency}` : ''}
            </Text>
          </View>
          {onRemove && r.to === shopCurrency ? (
            <Button label="Remove" accessibilityLabel={`Remove the ${r.from} rate`} variant="secondary" compact loading={removing === r.from} onPress={() => onRemove(r.from)} />
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderTopWidth: 1, borderTopColor: colors.border },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm, paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.border },
  text: { gap: spacing.xxs, flexShrink: 1 },
});
