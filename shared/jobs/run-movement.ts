import type { CurvePoint, GrowthPerMetrePoint, RunResult } from '../engine/types';
import { fixedPointRole, type FixingRole } from './fixed-points';
import type { RunFields } from '../schemas/jobs';

const HOLDS: readonly FixingRole[] = ['engine', 'anchor'];

/** Cumulative growth from the run's start at a distance along it, straight between the curve's points. */
export function growthAt(curve: CurvePoint[], atMm: number): number {
  if (atMm <= curve[0].atMm) return curve[0].growthMm;
  for (let i = 1; i < curve.length; i++) {
    const a = curve[i - 1];
    const b = curve[i];
    if (atMm <= b.atMm) return b.atMm === a.atMm ? b.growthMm : a.growthMm + ((atMm - a.atMm) * (b.growthMm - a.growthMm)) / (b.atMm - a.atMm);
  }
  return curve[curve.length - 1].growthMm;
}

/** Temperature at a distance along the run, from the growth curve's points. */
export function tempAt(curve: CurvePoint[], atMm: number): number {
  if (atMm <= curve[0].atMm) return curve[0].tempC;
  for (let i = 1; i < curve.length; i++) {
    const a = curve[i - 1];
    const b = curve[i];
    if (atMm <= b.atMm) return b.atMm === a.atMm ? b.tempC : a.tempC + ((atMm - a.atMm) * (b.tempC - a.tempC)) / (b.atMm - a.atMm);
  }
  return curve[curve.length - 1].tempC;
}

/** Growth per metre at a temperature, straight between the curve's points; null outside it. */
export function growthPerMetreAt(curve: GrowthPerMetrePoint[], tempC: number): number | null {
  for (let i = 1; i < curve.length; i++) {
    const a = curve[i - 1];
    const b = curve[i];
    if (tempC >= a.tempC && tempC <= b.tempC) {
      return b.tempC === a.tempC ? a.growthMmPerM : a.growthMmPerM + ((tempC - a.tempC) * (b.growthMmPerM - a.growthMmPerM)) / (b.tempC - a.tempC);
    }
  }
  return null;
}

/** Where the run's joint sits: the flex's given position; a slip joint's, or the end held by it, else the run's end. */
export function jointPositionMm(run: Pick<RunFields, 'joint' | 'startFixing' | 'endFixing'>, lengthMm: number): number | null {
  const j = run.joint;
  if (j.type === 'flex') return j.atMm ?? null;
  if (j.type === 'slip') {
    if (j.atMm !== undefined) return j.atMm;
    return run.startFixing === 'slip_joint' ? 0 : lengthMm;
  }
  return null;
}

export type MovementReference = 'start' | 'end' | 'both' | 'held' | 'assumed_start';

export interface RunMovement {
  reference: MovementReference;
  /** Hot axial movement at a point, from its cold place (positive = towards the run's end). */
  at: (atMm: number) => number;
}

/**
 * How each point of a run moves when hot, from the ends that hold it: from a held start the
 * pipe grows towards the end; from a held end, towards the start; held at both ends, each side
 * of the joint grows towards it, and without a joint nothing moves (the growth turns into
 * stress). With neither end held the start is taken as the reference. A run joined to another
 * at a support moves with that run too; this is the run's own movement.
 */
export function runMovement(run: Pick<RunFields, 'joint' | 'startFixing' | 'endFixing'>, result: RunResult): RunMovement {
  const total = result.growthMm;
  const g = (x: number) => growthAt(result.curve, x);
  const startHeld = HOLDS.includes(fixedPointRole(run.startFixing));
  const endHeld = HOLDS.includes(fixedPointRole(run.endFixing));
  if (startHeld && endHeld) {
    if (run.joint.type === 'none') return { reference: 'held', at: () => 0 };
    // A flex without a position is taken at mid-run (the system check asks for the position).
    const j = jointPositionMm(run, result.totalLengthMm) ?? result.totalLengthMm / 2;
    return { reference: 'both', at: (x) => (x <= j ? g(x) : -(total - g(x))) };
  }
  if (startHeld) return { reference: 'start', at: g };
  if (endHeld) return { reference: 'end', at: (x) => -(total - g(x)) };
  return { reference: 'assumed_start', at: g };
}
