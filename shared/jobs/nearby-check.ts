import type { NearbyItem } from '../schemas/jobs';
import { type Phrase, phrase, quantity } from '../units';
import { FIRE_RISK_KINDS, NEARBY_LABELS, type NearbyKind } from './nearby';
import { growthPerMetreAt, runMovement, tempAt } from './run-movement';
import type { ComputedRun } from './support-plan';

/** One nearby item judged hot. */
export interface NearbyCheck {
  runId: string;
  runName: string;
  /** The item's place in the run's list. */
  index: number;
  item: NearbyItem;
  tempC: number;
  /** How far the pipe closes on the item: swelling and sideways movement beside it, movement along it in line. */
  closingMm: number;
  hotGapMm: number;
  minimumMm: number;
  ok: boolean;
  message: Phrase;
}

const len = (mm: number) => quantity('length', mm);

/**
 * The pipe closes on an item beside it by its radial growth (half the OD's growth at the
 * temperature there) and by the sideways movement entered for the run's flex (taken along the
 * whole run, which errs towards "too close"); on an item in line with it, by its hot movement
 * along its length at that point.
 */
export function checkNearby(run: ComputedRun, index: number, minimums: Record<NearbyKind, number>): NearbyCheck {
  const item = run.nearby[index];
  const r = run.result;
  const tempC = tempAt(r.curve, item.atMm);
  let closing: number;
  if (item.direction === 'in_line') {
    closing = Math.abs(runMovement(run, r).at(item.atMm));
  } else {
    const perMetre = growthPerMetreAt(r.growthPerMetreCurve, tempC) ?? 0;
    const swell = (run.tube.odMm / 2) * (perMetre / 1000);
    const sideways = run.joint.type === 'flex' ? (run.joint.lateralOffsetMm ?? 0) : 0;
    closing = Math.max(0, swell) + sideways;
  }
  const hot = item.coldGapMm - closing;
  const minimum = minimums[item.kind];
  const ok = hot >= minimum;
  const name = item.label ? `${item.label} (${NEARBY_LABELS[item.kind].toLowerCase()})` : NEARBY_LABELS[item.kind];
  const fire = FIRE_RISK_KINDS.includes(item.kind) ? '. Fuel and brake lines near a hot exhaust skin are a fire risk' : '';
  const message = ok
    ? phrase`${name} at ${len(item.atMm)} keeps ${len(hot)} hot (at least ${len(minimum)})`
    : phrase`${name} at ${len(item.atMm)} keeps only ${len(hot)} hot, under the ${len(minimum)} minimum: fit a heat shield or reroute it${fire}`;
  return { runId: run.id, runName: run.name, index, item, tempC, closingMm: closing, hotGapMm: hot, minimumMm: minimum, ok, message };
}
