import { useState } from 'react';
import { type LayoutChangeEvent, StyleSheet, View } from 'react-native';
import { VictoryAxis, VictoryBar, VictoryChart, VictoryLabel } from 'victory-native';
import { colors, fonts, spacing, typography } from '../../constants/theme';
import { Text } from '../ui/text';
import { formatMoney } from './format';
import { chartAxisStyle } from '../charts/chart-colors';

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
  const data = bars.map((b, i) => ({ x: `Option ${i + 1}`, y: b.total, index: i }));
  const summary = bars.map((b, i) => `Option ${i + 1}, ${b.label}: ${formatMoney(b.total, currency)}`).join('; ');
  const compact = (v: number) => new Intl.NumberFormat('en-GB', { notation: 'compact', maximumFractionDigits: 1 }).format(v);

  return (
    <View style={styles.wrapper}>
      <Text variant="bodyStrong">Totals by option</Text>
      <View onLayout={onLayout} accessible accessibilityRole="image" accessibilityLabel={`Totals by option. ${summary}`} style={[styles.plot, { height }]}>
        {width > 0 && data.length > 0 ? (
          <VictoryChart width={width} height={height} domainPadding={{ x: width / (data.length * 3) }} padding={{ top: spacing.xl, bottom: 40, left: 64, right: spacing.lg }}>
            <VictoryAxis style={chartAxisStyle} />
            <VictoryAxis dependentAxis tickFormat={compact} style={chartAxisStyle} />
            <VictoryBar
              data={data}
              barRatio={0.7}
              labels={({ datum }: { datum: { y: number } }) => formatMoney(datum.y, currency)}
              labelComponent={<VictoryLabel style={{ fontFamily: fonts.semibold, fontSize: typography.caption.fontSize - 1, fill: colors.text }} />}
              style={{ data: { fill: ({ datum }) => (datum?.index === highlightIndex ? colors.success : colors.primary) } }}
            />
          </VictoryChart>
        ) : null}
      </View>
    </View>
  );
}


const styles = StyleSheet.create({
  wrapper: { gap: spacing.xs },
  plot: { width: '100%' },
});
