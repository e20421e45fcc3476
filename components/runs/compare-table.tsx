import { wordFieldMessage } from '../../shared/field-messages';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import type { CompareRow } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Fact } from '../ui/fact';
import { LIMIT_VERDICTS } from '../jobs/run-verdict';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { show, showMoney, showSigned, showSignedMoney } from '../units/format';
import { stressShare } from './restraint-words';

export interface CompareTableProps {
  current: CompareRow;
  candidates: CompareRow[];
  units: UnitSystem;
  wide: boolean;
  /** Absent for readers: the "Use …" buttons only show for editors of an open job. */
  onAdopt?: (alloyId: string, designation: string) => void;
  adopting: string | null;
}

interface Cell {
  label: string;
  value: string;
  difference?: string;
}

function cellsOf(row: CompareRow, units: UnitSystem): Cell[] {
  const f = row.figures;
  const d = row.difference;
  if (!f) return [];
  return [
    { label: 'Growth', value: show('smallLength', f.growthMm, units), difference: d ? showSigned('smallLength', d.growthMm, units) : undefined },
    { label: 'Limit', value: LIMIT_VERDICTS[f.limitStatus].label },
    { label: 'Margin', value: showSigned('temperatureDelta', f.marginC, units), difference: d ? showSigned('temperatureDelta', d.marginC, units) : undefined },
    { label: 'Stress if held', value: stressShare(f.stress) },
    { label: 'Mass', value: show('mass', f.massKg, units), difference: d ? showSigned('mass', d.massKg, units) : undefined },
    {
      label: 'Material cost',
      value: showMoney(f.materialCost, f.currency),
      difference: d ? showSignedMoney(d.materialCost, d.materialCost === null ? null : f.currency) : undefined,
    },
  ];
}

const COLUMNS = ['Alloy', 'Growth', 'Limit', 'Margin', 'Stress if held', 'Mass', 'Material cost', ''] as const;
const nameOf = (row: CompareRow) => (row.alloy ? `${row.alloy.designation} (${row.alloy.uns})` : 'Unknown alloy');

/** The run worked out with each candidate alloy, against the alloy it has now. */
export function CompareTable({ current, candidates, units, wide, onAdopt, adopting }: CompareTableProps) {
  const rows = [current, ...candidates];
  const action = (row: CompareRow, isCurrent: boolean) =>
    isCurrent ? (
      <Text variant="label" tone="primary">
        Current alloy
      </Text>
    ) : onAdopt && row.alloy && row.figures ? (
      <Button
        label={`Use ${row.alloy.designation}`}
        compact
        loading={adopting === row.alloy.id}
        disabled={adopting !== null}
        onPress={() => onAdopt(row.alloy!.id, row.alloy!.designation)}
      />
    ) : null;

  if (!wide) {
    return (
      <View role="list" aria-label="Alloys compared" style={styles.cards}>
        {rows.map((row, i) => (
          <View role="listitem" key={row.alloy?.id ?? i}>
            <Card edge={i === 0 ? 'primary' : undefined} role="article" aria-label={nameOf(row)}>
              <AlloyCell row={row} variant="heading" units={units} />
              <View style={styles.facts}>
                {cellsOf(row, units).map((c) => (
                  <Fact key={c.label} label={c.label} value={c.value}>
                    {c.difference ? (
                      <Text variant="caption" tone="muted">
                        {c.difference} against current
                      </Text>
                    ) : null}
                  </Fact>
                ))}
              </View>
              {action(row, i === 0)}
            </Card>
          </View>
        ))}
      </View>
    );
  }

  return (
    <View role="table" aria-label="Alloys compared" style={styles.table}>
      <View role="row" style={[styles.row, styles.headerRow]}>
        {COLUMNS.map((c, i) => (
          <View key={c || i} role="columnheader" style={[styles.cell, i === 0 && styles.nameCell]}>
            <Text variant="label">{c}</Text>
          </View>
        ))}
      </View>
      {rows.map((row, i) => {
        const cells = cellsOf(row, units);
        return (
          <View key={row.alloy?.id ?? i} role="row" style={[styles.row, i === 0 && styles.currentRow]}>
            <View role="rowheader" style={[styles.cell, styles.nameCell]}>
              <AlloyCell row={row} variant="bodyStrong" units={units} />
            </View>
            {cells.length === 0
              ? COLUMNS.slice(1, -1).map((c) => (
                  <View key={c} role="cell" style={styles.cell}>
                    <Text tone="muted">—</Text>
                  </View>
                ))
              : cells.map((c) => (
                  <View key={c.label} role="cell" style={styles.cell}>
                    <Text>{c.value}</Text>
                    {c.difference ? (
                      <Text variant="caption" tone="muted">
                        {c.difference}
                      </Text>
                    ) : null}
                  </View>
                ))}
            <View role="cell" style={styles.cell}>
              {action(row, i === 0)}
            </View>
          </View>
        );
      })}
    </View>
  );
}

function AlloyCell({ row, variant, units }: { row: CompareRow; variant: 'heading' | 'bodyStrong'; units: UnitSystem }) {
  return (
    <>
      <Text variant={variant}>{nameOf(row)}</Text>
      {row.alloy ? (
        <Text variant="caption" tone="muted">
          Data version {row.alloy.version}
        </Text>
      ) : null}
      {row.problem ? <Text tone="danger">{wordFieldMessage(row.problem.message, units)}</Text> : null}
    </>
  );
}

const styles = StyleSheet.create({
  cards: { gap: spacing.md },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  table: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.lg, backgroundColor: colors.surfaceRaised, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', borderTopWidth: 1, borderTopColor: colors.border },
  headerRow: { borderTopWidth: 0, backgroundColor: colors.surfaceSunken },
  currentRow: { backgroundColor: colors.primarySoft },
  cell: { flex: 1, padding: spacing.sm, gap: spacing.xxs },
  nameCell: { flex: 1.6 },
});
