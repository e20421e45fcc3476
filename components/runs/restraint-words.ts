import type { RestraintVerdict } from '../../shared/engine/types';
import type { StressFigure } from '../../shared/jobs/stress-figure';
import type { UnitSystem } from '../../shared/units';
import { show } from '../units/format';

/** What the restrained stress means, in the same words on the run page, in compare and on the job sheet. */
export const RESTRAINT_MEANING =
  'The stress the tube would carry if both ends were held rigidly and nothing gave. It is a flag, not a design stress: above yield the tube yields, buckles or cracks its welds.';

export const STRESS_VERDICT_LABELS: Record<RestraintVerdict, string> = {
  clear: 'Can stay rigidly held',
  marginal: 'Too close to yield to hold rigidly',
  yields: 'Would yield if held',
  unknown: 'Not in the data',
};

/** "1805 MPa at 850 °C, 183 % of its 98 MPa minimum yield" or the part the data lacks. */
export function stressLine(f: StressFigure, units: UnitSystem): string {
  if (f.stressMPa === null) return 'Not in the data: the alloy has no modulus table';
  const at = f.tempC === null ? '' : ` at ${show('temperature', f.tempC, units)}`;
  const stress = `${show('stress', f.stressMPa, units)}${at}`;
  if (f.ratio === null || f.yieldMPa === null) return `${stress}; yield there is not in the data`;
  if (f.yieldDataEndC !== null) {
    return `${stress}, at least ${Math.round(f.ratio * 100)} % of yield: ${show('stress', f.yieldMPa, units)} at ${show('temperature', f.yieldDataEndC, units)}, where the yield data stop, and lower above`;
  }
  return `${stress}, ${Math.round(f.ratio * 100)} % of its ${show('stress', f.yieldMPa, units)} yield`;
}

/** Short form for tables: "183 % of yield", "at least 1520 % of yield". */
export function stressShare(f: StressFigure): string {
  if (f.ratio === null) return 'not in the data';
  return `${f.yieldDataEndC === null ? '' : 'at least '}${Math.round(f.ratio * 100)} % of yield`;
}
