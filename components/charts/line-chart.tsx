import { useState } from 'react';
import { type LayoutChangeEvent, StyleSheet, View } from 'react-native';
import { VictoryAxis, VictoryChart, VictoryLabel, VictoryLine, VictoryScatter } from 'victory-native';
import { colors, spacing } from '../../constants/theme';
import { Text } from '../ui/text';
import { chartAxisStyle, seriesColor } from './chart-colors';

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
  height?: number;
}

interface Range {
  min: number;
  max: number;
}

function rangeOf(points: ChartPoint[]): Range {
  const ys = points.map((p) => p.y);
  const min = Math.min(0, ...ys);
  const max = Math.max(...ys);
  return { min, max: max > min ? max : min + 1 };
}

/** Maps a value on the secondary axis onto the primary axis's scale, so both share one plot. */
const scaler = (from: Range, to: Range) => (v: number) => to.min + ((v - from.min) * (to.max - to.min)) / (from.max - from.min);

const defaultFormat = (v: number) => String(Math.round(v * 100) / 100);

/** One or more lines against a shared x-axis, optionally a right-hand axis and a marked point. */
export function LineChart({ title, summary, series, xAxis, yAxis, secondaryYAxis, marker, height = 280 }: LineChartProps) {
  const [width, setWidth] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width));

  const primaryPoints = series.filter((s) => !s.secondary).flatMap((s) => s.points);
  const secondaryPoints = series.filter((s) => s.secondary).flatMap((s) => s.points);
  const primary = rangeOf(primaryPoints.length > 0 ? primaryPoints : secondaryPoints);
  const secondary = secondaryPoints.length > 0 ? rangeOf(secondaryPoints) : null;
  const toPrimary = secondary ? scaler(secondary, primary) : (v: number) => v;
  const fromPrimary = secondary ? scaler(primary, secondary) : (v: number) => v;
  const plotted = (s: ChartSeries) => (s.secondary ? s.points.map((p) => ({ x: p.x, y: toPrimary(p.y) })) : s.points);

  return (
    <View style={styles.wrapper}>
      <Text variant="bodyStrong">{title}</Text>
      <View
        onLayout={onLayout}
        accessible
        accessibilityRole="image"
        accessibilityLabel={`${title}. ${summary}`}
        style={[styles.plot, { height }]}
      >
        {width > 0 ? (
          <VictoryChart
            width={width}
            height={height}
            padding={{ top: spacing.lg, bottom: 56, left: 64, right: secondaryYAxis ? 76 : spacing.xl }}
            domain={{ y: [primary.min, primary.max * 1.05] }}
          >
            <VictoryAxis
              label={xAxis.label}
              tickFormat={xAxis.format ?? defaultFormat}
              style={chartAxisStyle}
              axisLabelComponent={<VictoryLabel dy={8} />}
            />
            <VictoryAxis
              dependentAxis
              label={yAxis.label}
              tickFormat={yAxis.format ?? defaultFormat}
              style={chartAxisStyle}
              axisLabelComponent={<VictoryLabel dy={-20} />}
            />
            {secondaryYAxis ? (
              <VictoryAxis
                dependentAxis
                orientation="right"
                label={secondaryYAxis.label}
                tickFormat={(t: number) => (secondaryYAxis.format ?? defaultFormat)(fromPrimary(t))}
                style={chartAxisStyle}
                axisLabelComponent={<VictoryLabel dy={10} />}
              />
            ) : null}
            {series.map((s, i) => (
              <VictoryLine
                key={s.id}
                data={plotted(s)}
                style={{ data: { stroke: seriesColor(i), strokeWidth: 3, strokeDasharray: s.secondary ? '8,4' : undefined } }}
              />
            ))}
            {marker ? (
              <VictoryScatter
                data={[{ x: marker.x, y: marker.secondary ? toPrimary(marker.y) : marker.y }]}
                size={6}
                style={{ data: { fill: colors.accent, stroke: colors.text, strokeWidth: 2 } }}
              />
            ) : null}
          </VictoryChart>
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
