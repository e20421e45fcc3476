import { memo, useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { CurvePoint, GrowthPerMetrePoint, RunResult } from '../../shared/engine/types';
import { growthPerMetreAt } from '../../shared/jobs/run-movement';
import { growthBasisWords, toDisplay, unitLabel, type UnitSystem } from '../../shared/units';
import { LineChart } from '../charts/line-chart';
import { show } from '../units/format';
import { useAfterPaint } from '../ui/use-after-paint';

const fixed = (decimals: number) => (v: number) => v.toFixed(decimals);

interface AlongProps {
  curve: CurvePoint[];
  growthMm: number;
  totalLengthMm: number;
  peakTempC: number;
  units: UnitSystem;
}

/** Growth and temperature along the run; draws again only when its own series change. */
const GrowthAlongChart = memo(function GrowthAlongChart({ curve, growthMm, totalLengthMm, peakTempC, units }: AlongProps) {
  const lengthDecimals = units === 'metric' ? 0 : 1;
  const along = curve.map((p) => ({ x: toDisplay('length', p.atMm, units), y: toDisplay('smallLength', p.growthMm, units) }));
  const temps = curve.map((p) => ({ x: toDisplay('length', p.atMm, units), y: toDisplay('temperature', p.tempC, units) }));
  const first = curve[0];
  const last = curve[curve.length - 1];
  return (
    <LineChart
      title="Growth along the run"
      summary={`The run grows ${show('smallLength', growthMm, units)} over ${show('length', totalLengthMm, units)}; the tube runs from ${
        first ? show('temperature', first.tempC, units) : '—'
      } at the start to ${last ? show('temperature', last.tempC, units) : '—'} at the end, peak ${show('temperature', peakTempC, units)}.`}
      series={[
        { id: 'growth', label: 'Growth from the start', points: along },
        { id: 'temperature', label: 'Tube temperature', points: temps, secondary: true },
      ]}
      xAxis={{ label: `Distance from the start (${unitLabel('length', units)})`, format: fixed(lengthDecimals) }}
      yAxis={{ label: `Growth (${unitLabel('smallLength', units)})`, format: fixed(units === 'metric' ? 1 : 2) }}
      secondaryYAxis={{ label: `Temperature (${unitLabel('temperature', units)})`, format: fixed(0) }}
    />
  );
});

interface PerMetreProps {
  curve: GrowthPerMetrePoint[];
  peakTempC: number;
  designation: string;
  units: UnitSystem;
}

/** The alloy's growth per metre against temperature: a length edit leaves it alone. */
const PerMetreChart = memo(function PerMetreChart({ curve, peakTempC, designation, units }: PerMetreProps) {
  const perMetre = curve.map((p) => ({ x: toDisplay('temperature', p.tempC, units), y: toDisplay('growthPerLength', p.growthMmPerM, units) }));
  const atPeak = growthPerMetreAt(curve, peakTempC);
  return (
    <LineChart
      title={`Growth ${growthBasisWords(units)} against temperature, ${designation}`}
      summary={`At the run's peak of ${show('temperature', peakTempC, units)} the alloy grows ${
        atPeak === null ? 'an unknown amount' : show('growthPerLength', atPeak, units)
      } from the install temperature.`}
      series={[{ id: 'per-metre', label: `${designation}, growth from install`, points: perMetre }]}
      xAxis={{ label: `Temperature (${unitLabel('temperature', units)})`, format: fixed(0) }}
      yAxis={{ label: unitLabel('growthPerLength', units), format: fixed(1) }}
      marker={
        atPeak === null
          ? undefined
          : {
              x: toDisplay('temperature', peakTempC, units),
              y: toDisplay('growthPerLength', atPeak, units),
              label: `Run peak ${show('temperature', peakTempC, units)}: ${show('growthPerLength', atPeak, units)}`,
            }
      }
    />
  );
});

/**
 * Both charts of a run, each fed only its series (kept the same object while its points are the same).
 * The charts follow the result one frame behind (`useAfterPaint`): a keystroke paints the field and the
 * figures in the next frame, the charts redraw in the task after it, and a redraw a newer keystroke
 * has made stale is dropped.
 */
export function RunCharts({ result: current, designation, units }: { result: RunResult; designation: string; units: UnitSystem }) {
  const result = useAfterPaint(current);
  const perMetreKey = JSON.stringify(result.growthPerMetreCurve);
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const perMetre = useMemo(() => result.growthPerMetreCurve, [perMetreKey]);
  return (
    <View style={styles.charts}>
      <GrowthAlongChart curve={result.curve} growthMm={result.growthMm} totalLengthMm={result.totalLengthMm} peakTempC={result.peakTempC} units={units} />
      <PerMetreChart curve={perMetre} peakTempC={result.peakTempC} designation={designation} units={units} />
    </View>
  );
}

const styles = StyleSheet.create({
  charts: { gap: spacing.xl },
});
