import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import type { AlloyVersionView } from '../../shared/schemas/alloy';
import { phraseOfText, type UnitSystem, wordPhrase } from '../../shared/units';
import { Text } from '../ui/text';
import { formatCte, formatDensity, formatModulus, formatPrice, formatStress, formatTemp, formatTempRange } from './format';
import { Fact } from '../ui/fact';
import { Cite, type SourceIndex } from './source-citation';
import { Tag } from '../ui/tag';
import { toBeVerified } from '../../shared/catalogue/to-be-verified';

export interface AlloyPropertiesProps {
  version: AlloyVersionView;
  index: SourceIndex;
  units: UnitSystem;
}

/** Every property of one version, each beside the source it cites. */
export function AlloyProperties({ version: v, index, units }: AlloyPropertiesProps) {
  const unverified = toBeVerified(v, (id) => index.get(id)?.source.kind === 'memory');
  // The catalogue's texts are written in °C; their temperatures read in the user's units.
  const inUnits = (text: string) => wordPhrase(phraseOfText(text), units);
  return (
    <View style={styles.wrapper}>
      {v.dataCautions || unverified.length > 0 ? (
        <View role="note" aria-label="Data cautions" style={[styles.block, styles.cautions]}>
          <Text variant="heading" headingLevel={3}>
            Data cautions
          </Text>
          {v.dataCautions ? <Text selectable>{inUnits(v.dataCautions)}</Text> : null}
          {unverified.length > 0 ? (
            <View style={styles.inline}>
              <Tag label="To be verified" tone="warning" />
              <Text>{inUnits(unverified.join('; '))}</Text>
            </View>
          ) : null}
        </View>
      ) : null}

      <View style={styles.grid}>
        <Fact large label="Density" value={formatDensity(v.densityKgM3, units)}>
          <Cite sourceId={v.densitySourceId} index={index} />
        </Fact>
        <Fact large label="Continuous service limit in air" value={formatTemp(v.maxContinuousC, units)}>
          <Cite sourceId={v.limitsSourceId} index={index} />
        </Fact>
        <Fact large label="Intermittent service limit in air" value={formatTemp(v.maxIntermittentC, units)}>
          <Cite sourceId={v.limitsSourceId} index={index} />
        </Fact>
        <Fact large label="Price" value={formatPrice(v.pricePerKg, v.currency, units)}>
          <View style={styles.inline}>
            <Text variant="caption" tone="muted">
              Set on {v.priceSetOn}
            </Text>
            {v.priceIsDemo ? <Tag label="demo" /> : null}
          </View>
        </Fact>
      </View>

      {v.warningRanges.length > 0 ? (
        <View style={styles.block}>
          <Text variant="heading" headingLevel={3}>
            Warning ranges
          </Text>
          {v.warningRanges.map((w) => (
            <View key={`${w.code}-${w.fromC}`} style={styles.warning}>
              <Text variant="bodyStrong" tone="warning">
                {formatTempRange(w.fromC, w.toC, units)}
              </Text>
              <Text>{inUnits(w.message)}</Text>
            </View>
          ))}
        </View>
      ) : null}

      {v.notes ? (
        <View style={styles.block}>
          <Text variant="heading" headingLevel={3}>
            Notes
          </Text>
          <Text selectable>{inUnits(v.notes)}</Text>
        </View>
      ) : null}

      <PointTable
        title={`Mean coefficient of thermal expansion from ${formatTemp(v.referenceTempC, units)}`}
        rows={v.cte.map((p) => ({ tempC: p.tempC, text: formatCte(p.meanUmPerMK, units), sourceId: p.sourceId }))}
        index={index}
        units={units}
      />
      <PointTable
        title="Elastic modulus"
        rows={v.modulus.map((p) => ({ tempC: p.tempC, text: formatModulus(p.gpa, units), sourceId: p.sourceId }))}
        index={index}
        units={units}
      />
      <PointTable
        title="0.2 % yield strength"
        rows={v.yield.map((p) => ({ tempC: p.tempC, text: formatStress(p.mpa, units), sourceId: p.sourceId }))}
        index={index}
        units={units}
      />
    </View>
  );
}

interface Row {
  tempC: number;
  text: string;
  sourceId: string;
}

function PointTable({ title, rows, index, units }: { title: string; rows: Row[]; index: SourceIndex; units: UnitSystem }) {
  return (
    <View style={styles.block}>
      <Text variant="heading" headingLevel={3}>
        {title}
      </Text>
      {rows.length === 0 ? (
        <Text tone="muted">No published values on record.</Text>
      ) : (
        <View role="table" aria-label={title} style={styles.table}>
          <View role="row" style={[styles.row, styles.headRow]}>
            <Text role="columnheader" variant="label" style={styles.tempCol}>
              Temperature
            </Text>
            <Text role="columnheader" variant="label" style={styles.valueCol}>
              Value
            </Text>
            <Text role="columnheader" variant="label" style={styles.sourceCol}>
              Source
            </Text>
          </View>
          {rows.map((r) => (
            <View key={r.tempC} role="row" style={styles.row}>
              <Text role="cell" style={styles.tempCol}>
                {formatTemp(r.tempC, units)}
              </Text>
              <Text role="cell" variant="bodyStrong" style={styles.valueCol}>
                {r.text}
              </Text>
              <View role="cell" style={styles.sourceCol}>
                <Cite sourceId={r.sourceId} index={index} />
              </View>
            </View>
          ))}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.xl },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  inline: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.xs },
  block: { gap: spacing.sm },
  cautions: { padding: spacing.md, borderLeftWidth: 3, borderLeftColor: colors.warning, backgroundColor: colors.warningSoft },
  warning: { gap: spacing.xxs, paddingLeft: spacing.md, borderLeftWidth: 3, borderLeftColor: colors.warning },
  table: { borderTopWidth: 1, borderTopColor: colors.border },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.border },
  headRow: { backgroundColor: colors.surfaceSunken, paddingHorizontal: spacing.xs },
  tempCol: { width: 96 },
  valueCol: { width: 140 },
  sourceCol: { flex: 1, minWidth: 160 },
});
