import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { colors, layout, spacing } from '../../constants/theme';
import type { AlloyVersionView } from '../../shared/schemas/alloy';
import { growthBasisWords, toDisplay, unitLabel, type UnitSystem } from '../../shared/units';
import { LineChart } from '../charts/line-chart';
import { Text } from '../ui/text';
import { COLD_C, growthAt, growthCurve, maxDataC } from './curves';
import { familyLabel, formatDensity, formatGrowth, formatPrice, formatTemp } from './format';
import { Tag } from '../ui/tag';

export interface CompareViewProps {
  alloys: AlloyVersionView[];
  atC: number;
  units: UnitSystem;
}

/** Curves overlaid and one table of what a shop weighs up between alloys. */
export function CompareView({ alloys, atC, units }: CompareViewProps) {
  // Four columns on a phone leave ~90 px each, and "Austenitic" would break mid-word: list instead.
  const phone = useWindowDimensions().width < layout.phoneMaxWidth;
  const rows: { label: string; cell: (v: AlloyVersionView) => string; demo?: (v: AlloyVersionView) => boolean }[] = [
    { label: 'UNS', cell: (v) => v.uns },
    { label: 'Family', cell: (v) => familyLabel(v.family) },
    { label: 'Continuous limit', cell: (v) => formatTemp(v.maxContinuousC, units) },
    { label: 'Intermittent limit', cell: (v) => formatTemp(v.maxIntermittentC, units) },
    {
      label: `Growth at ${formatTemp(atC, units)}`,
      cell: (v) => {
        const g = growthAt(v, atC);
        return g === null ? `above data (to ${formatTemp(maxDataC(v), units)})` : formatGrowth(g, units);
      },
    },
    { label: 'Density', cell: (v) => formatDensity(v.densityKgM3, units) },
    { label: 'Price', cell: (v) => formatPrice(v.pricePerKg, v.currency, units), demo: (v) => v.priceIsDemo },
    { label: 'Data version', cell: (v) => `Version ${v.version}` },
  ];

  return (
    <View style={styles.wrapper}>
      <LineChart
        title={`Growth ${growthBasisWords(units)} from ${formatTemp(COLD_C, units)}`}
        summary={alloys
          .map((v) => {
            const g = growthAt(v, atC);
            return `${v.designation}: ${g === null ? 'above its data' : formatGrowth(g, units)} at ${formatTemp(atC, units)}`;
          })
          .join('; ')}
        series={alloys.map((v) => ({
          id: v.versionId,
          label: v.designation,
          points: growthCurve(v).map((p) => ({ x: toDisplay('temperature', p.x, units), y: toDisplay('growthPerLength', p.y, units) })),
        }))}
        xAxis={{ label: `Temperature (${unitLabel('temperature', units)})`, format: (v) => v.toFixed(0) }}
        yAxis={{ label: unitLabel('growthPerLength', units), format: (v) => v.toFixed(1) }}
      />

      {phone ? (
        <View role="list" aria-label="Comparison" style={styles.list}>
          {rows.map((r) => (
            <View key={r.label} role="listitem" style={styles.item}>
              <Text variant="label">{r.label}</Text>
              {alloys.map((v) => (
                <View key={v.versionId} style={styles.itemRow}>
                  <Text variant="caption" tone="muted" style={styles.itemName}>
                    {v.designation}
                  </Text>
                  <Text style={styles.itemValue}>{r.cell(v)}</Text>
                  {r.demo?.(v) ? <Tag label="demo" /> : null}
                </View>
              ))}
            </View>
          ))}
        </View>
      ) : (
        <View role="table" aria-label="Comparison" style={styles.table}>
          <View role="row" style={[styles.row, styles.headRow]}>
            <View role="columnheader" style={styles.labelCell}>
              <Text variant="label">Property</Text>
            </View>
            {alloys.map((v) => (
              <View key={v.versionId} role="columnheader" style={styles.cell}>
                <Text variant="bodyStrong">{v.designation}</Text>
              </View>
            ))}
          </View>
          {rows.map((r) => (
            <View key={r.label} role="row" style={styles.row}>
              <View role="rowheader" style={styles.labelCell}>
                <Text variant="label">{r.label}</Text>
              </View>
              {alloys.map((v) => (
                <View key={v.versionId} role="cell" style={styles.cell}>
                  <Text>{r.cell(v)}</Text>
                  {r.demo?.(v) ? <Tag label="demo" /> : null}
                </View>
              ))}
            </View>
          ))}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.xl },
  table: { borderTopWidth: 1, borderTopColor: colors.border },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: colors.border },
  headRow: { backgroundColor: colors.surfaceSunken },
  labelCell: { flex: 1.2, padding: spacing.sm },
  cell: { flex: 1, padding: spacing.sm, gap: spacing.xxs, minWidth: 0 },
  list: { borderTopWidth: 1, borderTopColor: colors.border },
  item: { paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.border, gap: spacing.xxs },
  itemRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: spacing.sm },
  itemName: { flexBasis: 120, flexShrink: 0 },
  itemValue: { flex: 1, minWidth: 140 },
});
