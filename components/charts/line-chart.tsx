import { lazy, Suspense, useState } from 'react';
import { type LayoutChangeEvent, StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import { Text } from '../ui/text';
import { seriesColor } from './chart-colors';
import { rangeOf } from './chart-range';

// The drawing library is large; it loads with the first chart, not with the sign-in screen.
const LinePlot = lazy(() => import('./plots').then((m) => ({ default: m.LinePlot })));

export interface ChartPoint {
  x: number;
  y: number;
}

export interface ChartSeries {
  id: string;
  label: string;
  points: ChartPoint[];
  /** Plot against the right-hand axis instead of the left. */
  secondary?: boolean;
}

export interface ChartAxis {
  label: string;
  format?: (value: number) => string;
}

export interface ChartMarker {
  x: number;
  y: number;
  label: string;
  secondary?: boolean;
}

export interface LineChartProps {
  /** Names the chart for screen readers and sits above it. */
  title: string;
  /** A sentence a screen reader reads instead of the drawing. */
  summary: string;
  series: ChartSeries[];
  xAxis: ChartAxis;
  yAxis: ChartAxis;
  /** A second y-axis on the right, for the series marked `secondary`. */
  secondaryYAxis?: ChartAxis;
  marker?: ChartMarker;
  /** A line of words at the end of the legend, for what the drawing cannot show. */
  legendNote?: string;
  height?: number;
}

/** One or more lines against a shared x-axis, optionally a right-hand axis and a marked point. */
export function LineChart({ title, summary, series, xAxis, yAxis, secondaryYAxis, marker, legendNote, height = 280 }: LineChartProps) {
  const [width, setWidth] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width));

  const primaryPoints = series.filter((s) => !s.secondary).flatMap((s) => s.points);
  const secondaryPoints = series.filter((s) => s.secondary).flatMap((s) => s.points);
  const primary = rangeOf(primaryPoints.length > 0 ? primaryPoints : secondaryPoints);
  const secondary = secondaryPoints.length > 0 ? rangeOf(secondaryPoints) : null;

  return (
    <View style={styles.wrapper}>
      <Text variant="bodyStrong">{title}</Text>
      <View onLayout={onLayout} accessible accessibilityRole="image" accessibilityLabel={`${title}. ${summary}`} style={[styles.plot, { height }]}>
        {width > 0 ? (
          <Suspense fallback={null}>
            <LinePlot
              width={width}
              height={height}
              series={series}
              xAxis={xAxis}
              yAxis={yAxis}
              secondaryYAxis={secondaryYAxis}
              marker={marker}
              primary={primary}
              secondary={secondary}
            />
          </Suspense>
        ) : null}
      </View>
      <View style={styles.legend}>
        {series.map((s, i) => (
          <View key={s.id} style={styles.legendItem}>
            <View style={[styles.swatch, { backgroundColor: seriesColor(i) }, s.secondary && styles.swatchDashed]} />
            <Text variant="caption">
              {s.label}
              {s.secondary && secondaryYAxis ? ` (right axis)` : ''}
            </Text>
          </View>
        ))}
        {marker ? (
          <View style={styles.legendItem}>
            <View style={styles.markerSwatch} />
            <Text variant="caption">{marker.label}</Text>
          </View>
        ) : null}
        {legendNote ? <Text variant="caption">{legendNote}</Text> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.xs },
  plot: { width: '100%' },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  swatch: { width: 20, height: 4, borderRadius: 2 },
  swatchDashed: { opacity: 0.7 },
  markerSwatch: {
    width: 12,
    height: 12,
    borderRadius: 6,
    backgroundColor: colors.accent,
    borderWidth: 2,
    borderColor: colors.text,
  },
});
