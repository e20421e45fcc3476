// Every drawing made with the chart library lives in this one module, loaded on demand, so the
// library never rides in a chunk that the sign-in screen also loads.
import { VictoryAxis, VictoryBar, VictoryChart, VictoryLabel, VictoryLine, VictoryScatter } from 'victory-native';
import { colors, fonts, spacing, typography } from '../../constants/theme';
import { formatMoney } from '../quotes/format';
import { chartAxisStyle, seriesColor } from './chart-colors';
import { type Range, scaler } from './chart-range';
import type { ChartAxis, ChartMarker, ChartSeries } from './line-chart';

export interface LinePlotProps {
  width: number;
  height: number;
  series: ChartSeries[];
  xAxis: ChartAxis;
  yAxis: ChartAxis;
  secondaryYAxis?: ChartAxis;
  marker?: ChartMarker;
  primary: Range;
  secondary: Range | null;
}

const defaultFormat = (v: number) => String(Math.round(v * 100) / 100);

/** The drawing of a line chart. */
export function LinePlot({ width, height, series, xAxis, yAxis, secondaryYAxis, marker, primary, secondary }: LinePlotProps) {
  const toPrimary = secondary ? scaler(secondary, primary) : (v: number) => v;
  const fromPrimary = secondary ? scaler(primary, secondary) : (v: number) => v;
  const plotted = (s: ChartSeries) => (s.secondary ? s.points.map((p) => ({ x: p.x, y: toPrimary(p.y) })) : s.points);
  return (
    <VictoryChart
      width={width}
      height={height}
      padding={{
        top: spacing.lg,
        bottom: 56,
        left: 64,
        right: secondaryYAxis ? 76 : spacing.xl,
      }}
      domain={{ y: [primary.min, primary.max * 1.05] }}
    >
      <VictoryAxis label={xAxis.label} tickFormat={xAxis.format ?? defaultFormat} style={chartAxisStyle} axisLabelComponent={<VictoryLabel dy={8} />} />
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
          style={{
            data: {
              stroke: seriesColor(i),
              strokeWidth: 3,
              strokeDasharray: s.secondary ? '8,4' : undefined,
            },
          }}
        />
      ))}
      {marker ? (
        <VictoryScatter
          data={[
            {
              x: marker.x,
              y: marker.secondary ? toPrimary(marker.y) : marker.y,
            },
          ]}
          size={6}
          style={{
            data: { fill: colors.accent, stroke: colors.text, strokeWidth: 2 },
          }}
        />
      ) : null}
    </VictoryChart>
  );
}

export interface TotalsPlotProps {
  width: number;
  height: number;
  data: { x: string; y: number; index: number }[];
  currency: string;
  highlightIndex?: number | null;
}

const compact = (v: number) =>
  new Intl.NumberFormat('en-GB', {
    notation: 'compact',
    maximumFractionDigits: 1,
  }).format(v);

/** The bars of the quote totals chart. */
export function TotalsPlot({ width, height, data, currency, highlightIndex }: TotalsPlotProps) {
  return (
    <VictoryChart
      width={width}
      height={height}
      domainPadding={{ x: width / (data.length * 3) }}
      padding={{ top: spacing.xl, bottom: 40, left: 64, right: spacing.lg }}
    >
      <VictoryAxis style={chartAxisStyle} />
      <VictoryAxis dependentAxis tickFormat={compact} style={chartAxisStyle} />
      <VictoryBar
        data={data}
        barRatio={0.7}
        labels={({ datum }: { datum: { y: number } }) => formatMoney(datum.y, currency)}
        labelComponent={
          <VictoryLabel
            style={{
              fontFamily: fonts.semibold,
              fontSize: typography.caption.fontSize - 1,
              fill: colors.text,
            }}
          />
        }
        style={{
          data: {
            fill: ({ datum }) => (datum?.index === highlightIndex ? colors.success : colors.primary),
          },
        }}
      />
    </VictoryChart>
  );
}
