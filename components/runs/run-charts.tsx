import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { RunResult } from '../../shared/engine/types';
import { growthPerMetreAt } from '../../shared/jobs/run-movement';
import { growthBasisWords, toDisplay, unitLabel, type UnitSystem } from '../../shared/units';
import { LineChart } from '../charts/line-chart';
import { show } from '../units/format';

const fixed = (decimals: number) => (v: number) => v.toFixed(decimals);

export function RunCharts({ result, designation, units }: { result: RunResult; designation: string; units: UnitSystem }) {
  const lengthDecimals = units === 'metric' ? 0 : 1;
  const along = result.curve.map((p) => ({ x: toDisplay('length', p.atMm, units), y: toDisplay('smallLength', p.growthMm, units) }));
  const temps = result.curve.map((p) => ({ x: toDisplay('length', p.atMm, units), y: toDisplay('temperature', p.tempC, units) }));
  const perMetre = result.growthPerMetreCurve.map((p) => ({ x: toDisplay('temperature', p.tempC, units), y: toDisplay('growthPerLength', p.growthMmPerM, units) }));
  const atPeak = growthPerMetreAt(result.growthPerMetreCurve, result.peakTempC);
  const first = result.curve[0];
  const last = result.curve[result.curve.length - 1];

  return (
    <View style={styles.charts}>
      <LineChart
        title="Growth along the run"
        summary={`The run grows ${show('smallLength', result.growthMm, units)} over ${show('length', result.totalLengthMm, units)}; the tube runs from ${
          first ? show('temperature', first.tempC, units) : '—'
        } at the start to ${last ? show('temperature', last.tempC, units) : '—'} at the end, peak ${show('temperature', result.peakTempC, units)}.`}
        series={[
          { id: 'growth', label: 'Growth from the start', points: along },
          { id: 'temperature', label: 'Tube temperature', points: temps, secondary: true },
        ]}
        xAxis={{ label: `Distance from the start (${unitLabel('length', units)})`, format: fixed(lengthDecimals) }}
        yAxis={{ label: `Growth (${unitLabel('smallLength', units)})`, format: fixed(units === 'metric' ? 1 : 2) }}
        secondaryYAxis={{ label: `Temperature (${unitLabel('temperature', units)})`, format: fixed(0) }}
      />
      <LineChart
        title={`Growth ${growthBasisWords(units)} against temperature, ${designation}`}
        summary={`At the run's peak of ${show('temperature', result.peakTempC, units)} the alloy grows ${
          atPeak === null ? 'an unknown amount' : show('growthPerLength', atPeak, units)
        } from the install temperature.`}
        series={[{ id: 'per-metre', label: `${designation}, growth from install`, points: perMetre }]}
        xAxis={{ label: `Temperature (${unitLabel('temperature', units)})`, format: fixed(0) }}
        yAxis={{ label: unitLabel('growthPerLength', units), format: fixed(1) }}
        marker={
          atPeak === null
            ? undefined
            : {
                x: toDisplay('temperature', result.peakTempC, units),
                y: toDisplay('growthPerLength', atPeak, units),
                label: `Run peak ${show('temperature', result.peakTempC, units)}: ${show('growthPerLength', atPeak, units)}`,
              }
        }
      />
    </View>
  );
}

const styles = StyleSheet.create({
  charts: { gap: spacing.xl },
});
