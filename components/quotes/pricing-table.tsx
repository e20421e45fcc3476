import { ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';
import { colors, layout, radii, spacing } from '../../constants/theme';
import { useUnits } from '../../hooks/use-units';
import type { OptionComparison, PricedOption } from '../../shared/quotes/pricing';
import type { UnitSystem } from '../../shared/units';
import { Text } from '../ui/text';
import {
  formatDegrees,
  formatDegreesDifference,
  formatKg,
  formatKgDifference,
  formatMoney,
  formatMoneyDifference,
  formatPercentDifference,
} from './format';

export interface PricingTableProps {
  currency: string;
  labels: string[];
  options: (PricedOption | null)[];
  comparisons: (OptionComparison | null)[];
  scrapAllowancePct: number;
  marginPct: number;
  /** The option the customer accepted, marked in its column. */
  acceptedIndex?: number | null;
}

type Row = { name: string; strong?: boolean; cell: (o: PricedOption, c: OptionComparison | null, i: number) => string };

const marginWords = (c: number, units: UnitSystem) => (c < 0 ? `over the limit by ${formatDegrees(-c, units)}` : `${formatDegrees(c, units)} in hand`);

function rowsFor({ currency, scrapAllowancePct, marginPct }: PricingTableProps, units: UnitSystem): Row[] {
  return [
    { name: 'Material mass', cell: (o) => formatKg(o.massKg, units) },
    { name: `Material cost (with ${scrapAllowancePct} % scrap)`, cell: (o) => formatMoney(o.materialCost, currency) },
    { name: 'Labour', cell: (o) => `${formatMoney(o.labourCost, currency)} (${o.labourHours.toFixed(1)} h)` },
    { name: `Margin (${marginPct} %)`, cell: (o) => formatMoney(o.margin, currency) },
    { name: 'Total', strong: true, cell: (o) => formatMoney(o.total, currency) },
    {
      name: 'Cost against option 1',
      cell: (_o, c, i) => (i === 0 || !c ? '–' : `${formatMoneyDifference(c.costDifference, currency)} (${formatPercentDifference(c.costDifferencePct)})`),
    },
    { name: 'Weight against option 1', cell: (_o, c, i) => (i === 0 || !c ? '–' : formatKgDifference(c.massDifferenceKg, units)) },
    { name: 'Temperature margin (hottest run)', cell: (o) => marginWords(o.tempMarginC, units) },
    { name: 'Temperature margin gained', cell: (_o, c, i) => (i === 0 || !c ? '–' : formatDegreesDifference(c.tempMarginGainedC, units)) },
  ];
}

/**
 * Each option's figures in a column, the rows against option 1 reading "–" for option 1 itself;
 * on a phone, one card per option so no option hides off the side of the screen.
 */
export function PricingTable(props: PricingTableProps) {
  const units = useUnits();
  const phone = useWindowDimensions().width < layout.phoneMaxWidth;
  const rows = rowsFor(props, units);
  return phone ? <OptionCards {...props} rows={rows} /> : <OptionColumns {...props} rows={rows} />;
}

const optionName = (labels: string[], i: number) => `${i + 1}. ${labels[i] || 'Unnamed'}`;

function OptionCards({ labels, options, comparisons, acceptedIndex, rows }: PricingTableProps & { rows: Row[] }) {
  return (
    <View style={styles.cards} role="list" aria-label="Options compared">
      {options.map((o, i) => (
        <View key={i} role="listitem" aria-label={`Option ${optionName(labels, i)}`} style={[styles.card, acceptedIndex === i && styles.accepted]}>
          <Text variant="bodyStrong">{optionName(labels, i)}</Text>
          {acceptedIndex === i ? (
            <Text variant="caption" tone="success">
              Accepted
            </Text>
          ) : null}
          {o ? (
            rows.map((row) => (
              <View key={row.name} style={[styles.cardRow, row.strong && styles.strongRow]}>
                <Text variant={row.strong ? 'bodyStrong' : 'caption'} tone={row.strong ? 'default' : 'muted'} style={styles.cardName}>
                  {row.name}
                </Text>
                <Text variant={row.strong ? 'bodyStrong' : 'caption'} style={styles.cardValue}>
                  {row.cell(o, comparisons[i], i)}
                </Text>
              </View>
            ))
          ) : (
            <Text variant="caption" tone="muted">
              Choose an alloy
            </Text>
          )}
        </View>
      ))}
    </View>
  );
}

function OptionColumns({ labels, options, comparisons, acceptedIndex, rows }: PricingTableProps & { rows: Row[] }) {
  return (
    <ScrollView horizontal contentContainerStyle={styles.scroll}>
      <View role="table" aria-label="Options compared" style={styles.table}>
        <View role="row" style={styles.row}>
          <View role="columnheader" style={[styles.cell, styles.nameCell]}>
            <Text variant="label">Option</Text>
          </View>
          {labels.map((_label, i) => (
            <View key={i} role="columnheader" style={[styles.cell, acceptedIndex === i && styles.accepted]}>
              <Text variant="label">{optionName(labels, i)}</Text>
              {acceptedIndex === i ? (
                <Text variant="caption" tone="success">
                  Accepted
                </Text>
              ) : null}
            </View>
          ))}
        </View>
        {rows.map((row) => (
          <View key={row.name} role="row" style={[styles.row, row.strong && styles.strongRow]}>
            <View role="rowheader" style={[styles.cell, styles.nameCell]}>
              <Text variant={row.strong ? 'bodyStrong' : 'caption'}>{row.name}</Text>
            </View>
            {options.map((o, i) => (
              <View key={i} role="cell" style={[styles.cell, acceptedIndex === i && styles.accepted]}>
                <Text variant={row.strong ? 'bodyStrong' : 'caption'} tone={o ? 'default' : 'muted'}>
                  {o ? row.cell(o, comparisons[i], i) : 'Choose an alloy'}
                </Text>
              </View>
            ))}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1 },
  // Fixed column widths: in a horizontal scroller, flexible cells would grow to their text.
  table: { flexGrow: 1, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surfaceRaised },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: colors.border },
  strongRow: { backgroundColor: colors.accentSoft },
  cell: { flexGrow: 1, flexBasis: 124, width: 124, paddingHorizontal: spacing.sm, paddingVertical: spacing.sm, justifyContent: 'center' },
  nameCell: { flexBasis: 136, width: 136, backgroundColor: colors.surfaceSunken },
  accepted: { backgroundColor: colors.successSoft },
  cards: { gap: spacing.md },
  card: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surfaceRaised, padding: spacing.md, gap: spacing.xs },
  cardRow: { flexDirection: 'row', justifyContent: 'space-between', gap: spacing.md, paddingVertical: spacing.xxs },
  cardName: { flex: 1 },
  cardValue: { flex: 1, textAlign: 'right' },
});
