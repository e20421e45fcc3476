import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { AlloyVersionView } from '../../shared/schemas/alloy';
import { cteMetricToImperial, growthBasisWords, toDisplay, unitLabel, type UnitSystem } from '../../shared/units';
import { LineChart } from '../charts/line-chart';
import { COLD_C, cteCurve, growthCurve, maxDataC } from './curves';
import { cteUnit, formatTemp } from './format';
import { limitMarking } from './limit-marker';

/** Points in the chosen unit system (the engine answers in SI). */
function shown(points: { x: number; y: number }[], units: UnitSystem, y: (v: number) => number) {
  return points.map((p) => ({ x: toDisplay('temperature', p.x, units), y: y(p.y) }));
}

export function AlloyCharts({ version, units }: { version: AlloyVersionView; units: UnitSystem }) {
  const tUnit = unitLabel('temperature', units);
  const growth = shown(growthCurve(version), units, (v) => toDisplay('growthPerLength', v, units));
  const cte = shown(cteCurve(version), units, (v) => (units === 'metric' ? v : cteMetricToImperial(v)));
  const marking = limitMarking(version, units);
  const top = growth[growth.length - 1];
  return (
    <View style={styles.charts}>
      <LineChart
        title={`Growth ${growthBasisWords(units)} against temperature`}
        summary={`From ${formatTemp(COLD_C, units)} up to ${formatTemp(maxDataC(version), units)} the tube grows ${
          top ? `${top.y.toFixed(2)} ${unitLabel('growthPerLength', units)}` : 'by an unknown amount'
        }.${marking.note ? ` ${marking.note}` : ''}`}
        series={[{ id: 'growth', label: `${version.designation}, growth from ${formatTemp(COLD_C, units)}`, points: growth }]}
        xAxis={{ label: `Temperature (${tUnit})`, format: (v) => v.toFixed(0) }}
        yAxis={{ label: unitLabel('growthPerLength', units), format: (v) => v.toFixed(1) }}
        marker={
          marking.marker
            ? { x: toDisplay('temperature', marking.marker.tempC, units), y: toDisplay('growthPerLength', marking.marker.growth, units), label: marking.marker.label }
            : undefined
        }
        legendNote={marking.note ?? undefined}
      />
      <LineChart
        title={`Mean CTE from ${formatTemp(version.referenceTempC, units)} against temperature`}
        summary={`The mean coefficient goes from ${cte[0]?.y.toFixed(2)} to ${cte[cte.length - 1]?.y.toFixed(2)} ${cteUnit(units)} over the table.`}
        series={[{ id: 'cte', label: `${version.designation}, mean CTE`, points: cte }]}
        xAxis={{ label: `Temperature (${tUnit})`, format: (v) => v.toFixed(0) }}
        yAxis={{ label: cteUnit(units), format: (v) => v.toFixed(1) }}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  charts: { gap: spacing.xl },
});
