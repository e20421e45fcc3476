import { lazy, Suspense, useState } from 'react';
import { type LayoutChangeEvent, StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { Text } from '../ui/text';
import { formatMoney } from './format';

// Loaded with the first quote chart, not with the sign-in screen.
const TotalsPlot = lazy(() => import('../charts/plots').then((m) => ({ default: m.TotalsPlot })));

export interface TotalsChartProps {
  currency: string;
  bars: { label: string; total: number }[];
  highlightIndex?: number | null;
  height?: number;
}

/** The options' totals side by side, each bar named by its option number. */
export function TotalsChart({ currency, bars, highlightIndex, height = 240 }: TotalsChartProps) {
  const [width, setWidth] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width));
  const data = bars.map((b, i) => ({
    x: `Option ${i + 1}`,
    y: b.total,
    index: i,
  }));
  const summary = bars.map((b, i) => `Option ${i + 1}, ${b.label}: ${formatMoney(b.total, currency)}`).join('; ');

  return (
    <View style={styles.wrapper}>
      <Text variant="bodyStrong">Totals by option</Text>
      <View onLayout={onLayout} accessible accessibilityRole="image" accessibilityLabel={`Totals by option. ${summary}`} style={[styles.plot, { height }]}>
        {width > 0 && data.length > 0 ? (
          <Suspense fallback={null}>
            <TotalsPlot width={width} height={height} data={data} currency={currency} highlightIndex={highlightIndex} />
          </Suspense>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.xs },
  plot: { width: '100%' },
});
