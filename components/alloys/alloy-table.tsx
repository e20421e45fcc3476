import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing, typography } from '../../constants/theme';
import type { AlloySummary } from '../../shared/schemas/alloy';
import type { UnitSystem } from '../../shared/units';
import { Text } from '../ui/text';
import { CheckBox } from '../ui/check-box';
import { familyLabel, formatTemp } from './format';
import { statusTags, summaryValues } from './summary-values';
import { Tag } from '../ui/tag';

export interface AlloyTableProps {
  alloys: AlloySummary[];
  atC: number;
  units: UnitSystem;
  selectedIds: string[];
  onToggleCompare: (id: string, selected: boolean) => void;
  compareFull: boolean;
}

const COLUMNS = [
  { key: 'compare', label: 'Compare', flex: 1.1 },
  { key: 'designation', label: 'Designation', flex: 2 },
  { key: 'uns', label: 'UNS', flex: 1 },
  { key: 'family', label: 'Family', flex: 2 },
  { key: 'continuous', label: 'Continuous', flex: 1.1 },
  { key: 'intermittent', label: 'Intermittent', flex: 1.1 },
  { key: 'growth', label: 'Growth', flex: 1.3 },
  { key: 'price', label: 'Price', flex: 1.5 },
] as const;

export function AlloyTable({ alloys, atC, units, selectedIds, onToggleCompare, compareFull }: AlloyTableProps) {
  return (
    <View role="table" aria-label="Alloys" style={styles.table}>
      <View role="row" style={[styles.row, styles.headerRow]}>
        {COLUMNS.map((c) => (
          <View key={c.key} role="columnheader" style={[styles.cell, { flex: c.flex }]}>
            <Text variant="label">{c.key === 'growth' ? `Growth at ${formatTemp(atC, units)}` : c.label}</Text>
          </View>
        ))}
      </View>
      {alloys.map((alloy) => {
        const v = summaryValues(alloy, units);
        const selected = selectedIds.includes(alloy.id);
        return (
          <View key={alloy.id} role="row" style={[styles.row, selected && styles.selectedRow]}>
            <View role="cell" style={[styles.cell, { flex: COLUMNS[0].flex }]}>
              <CheckBox
                label="Compare"
                accessibilityLabel={`Compare ${alloy.designation}`}
                checked={selected}
                disabled={compareFull && !selected}
                onChange={(on) => onToggleCompare(alloy.id, on)}
              />
            </View>
            <View role="cell" style={[styles.cell, { flex: COLUMNS[1].flex }]}>
              <Link href={`/alloys/${alloy.id}`} style={styles.link} accessibilityRole="link">
                {alloy.designation}
              </Link>
              {statusTags(alloy).map((t) => (
                <Tag key={t.label} {...t} />
              ))}
            </View>
            <Cell flex={COLUMNS[2].flex} text={alloy.uns} />
            <Cell flex={COLUMNS[3].flex} text={familyLabel(alloy.family)} />
            <Cell flex={COLUMNS[4].flex} text={v.continuous} />
            <Cell flex={COLUMNS[5].flex} text={v.intermittent} />
            <Cell flex={COLUMNS[6].flex} text={v.growth} />
            <View role="cell" style={[styles.cell, { flex: COLUMNS[7].flex }]}>
              <Text>{v.price}</Text>
              {alloy.priceIsDemo ? <Tag label="demo" /> : null}
            </View>
          </View>
        );
      })}
    </View>
  );
}

function Cell({ flex, text }: { flex: number; text: string }) {
  return (
    <View role="cell" style={[styles.cell, { flex }]}>
      <Text>{text}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surfaceRaised },
  row: { flexDirection: 'row', alignItems: 'center', borderBottomWidth: 1, borderBottomColor: colors.border },
  headerRow: { backgroundColor: colors.surfaceSunken },
  selectedRow: { backgroundColor: colors.accentSoft },
  cell: { paddingHorizontal: spacing.sm, paddingVertical: spacing.xs, gap: spacing.xxs, minWidth: 0 },
  link: { ...typography.bodyStrong, color: colors.primary, textDecorationLine: 'underline', paddingVertical: spacing.sm },
});
