import { TemperatureRangeError } from '../../shared/engine/errors';
import { prepareStrainCurve, strainChange } from '../../shared/engine/expansion';
import { growthPerMetreCurve } from '../../shared/engine/run-growth';
import { toAlloyData } from '../../shared/catalogue/to-alloy-data';
import type { AlloyVersionView } from '../../shared/schemas/alloy';
import type { ChartPoint } from '../charts/line-chart';

/** Growth is shown from a cold shop at 20 °C, as the list's growth column is. */
export const COLD_C = 20;

/** Growth per metre from 20 °C up to the top of the alloy's expansion data. */
export function growthCurve(version: AlloyVersionView): ChartPoint[] {
  const curve = prepareStrainCurve(toAlloyData(version));
  return growthPerMetreCurve(curve, COLD_C).map((p) => ({ x: p.tempC, y: p.growthMmPerM }));
}

/** Mean coefficient against temperature, as tabulated. */
export function cteCurve(version: AlloyVersionView): ChartPoint[] {
  return version.cte.map((p) => ({ x: p.tempC, y: p.meanUmPerMK }));
}

/** mm per metre from 20 °C to tempC; null where tempC lies outside the alloy's data. */
export function growthAt(version: AlloyVersionView, tempC: number): number | null {
  if (!Number.isFinite(tempC)) return null;
  try {
    return 1000 * strainChange(prepareStrainCurve(toAlloyData(version)), tempC, COLD_C);
  } catch (error) {
    if (error instanceof TemperatureRangeError) return null;
    throw error;
  }
}

export const maxDataC = (version: AlloyVersionView) => Math.max(...version.cte.map((p) => p.tempC));
