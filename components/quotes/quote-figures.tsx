import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { OptionComparison, PricedOption } from '../../shared/quotes/pricing';
import type { ShopSettings } from '../../shared/schemas/shop-settings';
import { Text } from '../ui/text';
import { DemoValuesNote } from './demo-values-note';
import { PricingTable } from './pricing-table';
import { TotalsChart } from './totals-chart';

export interface QuoteFiguresProps {
  title: string;
  caption: string;
  labels: string[];
  currency: string;
  settings: ShopSettings;
  options: (PricedOption | null)[];
  comparisons: (OptionComparison | null)[];
  acceptedIndex?: number | null;
}

/** The table of each option's figures and the bar chart of their totals. */
export function QuoteFigures({ title, caption, labels, currency, settings, options, comparisons, acceptedIndex }: QuoteFiguresProps) {
  const bars = options.flatMap((o, i) => (o ? [{ label: labels[i] || `Option ${i + 1}`, total: o.total }] : []));
  return (
    <View style={styles.section}>
      <Text variant="heading" headingLevel={2}>
        {title}
      </Text>
      <Text tone="muted" variant="caption">
        {caption}
      </Text>
      {settings.isDemo ? <DemoValuesNote /> : null}
      <PricingTable
        currency={currency}
        labels={labels}
        options={options}
        comparisons={comparisons}
        scrapAllowancePct={settings.scrapAllowancePct}
        marginPct={settings.marginPct}
        acceptedIndex={acceptedIndex}
      />
      {bars.length === options.length && bars.length > 0 ? <TotalsChart currency={currency} bars={bars} highlightIndex={acceptedIndex} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.md },
});
