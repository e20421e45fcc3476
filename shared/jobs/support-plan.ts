import type { RunResult } from '../engine/types';
import type { RunView } from '../schemas/jobs';
import { fixedPointLabel, fixedPointRole, type FixingRole } from './fixed-points';
import { runMovement } from './run-movement';

export type SupportRole = 'engine' | 'anchor' | 'slide' | 'hanger';

/** One place that holds or carries the pipe, and the movement it must allow when hot. */
export interface PlannedSupport {
  runId: string;
  runName: string;
  atMm: number;
  role: SupportRole;
  label: string;
  /** Hot axial movement there (positive = towards the run's end); 0 where the pipe is held. */
  movementMm: number;
  /** Where the support is a run end shared with the next run, the next run's name. */
  sharedWith: string | null;
}

export type ComputedRun = RunView & { result: RunResult };

const SUPPORT_ROLES: readonly FixingRole[] = ['engine', 'anchor', 'slide', 'hanger'];
const isSupport = (role: FixingRole): role is SupportRole => SUPPORT_ROLES.includes(role);

/** Consecutive runs meet where one's end fixing is the next one's start fixing. */
export const joined = (a: RunView | undefined, b: RunView | undefined) => a !== undefined && b !== undefined && a.endFixing === b.startFixing;

/**
 * Every support of the job in order: run ends that hold or carry the pipe and the supports
 * part-way along each run. A fixing shared by two runs is listed once, with the earlier run.
 */
export function supportPlan(runs: ComputedRun[]): PlannedSupport[] {
  const out: PlannedSupport[] = [];
  runs.forEach((run, i) => {
    const move = runMovement(run, run.result);
    const length = run.result.totalLengthMm;
    const add = (atMm: number, role: SupportRole, label: string, sharedWith: string | null = null) =>
      out.push({ runId: run.id, runName: run.name, atMm, role, label, movementMm: role === 'engine' || role === 'anchor' ? 0 : move.at(atMm), sharedWith });
    const startRole = fixedPointRole(run.startFixing);
    if (isSupport(startRole) && !joined(runs[i - 1], run)) add(0, startRole, fixedPointLabel(run.startFixing));
    for (const s of [...run.supports].sort((a, b) => a.atMm - b.atMm)) add(s.atMm, s.kind === 'sliding' ? 'slide' : 'hanger', s.kind === 'sliding' ? 'Sliding support' : 'Hanger');
    const endRole = fixedPointRole(run.endFixing);
    const next = runs[i + 1];
    if (isSupport(endRole)) add(length, endRole, fixedPointLabel(run.endFixing), joined(run, next) ? next!.name : null);
  });
  return out;
}

/** Positions along a run where something carries the pipe (the run's own supports and carrying ends; engine flanges hold it too). */
export function carryingPositions(run: RunView, lengthMm: number, includeEngine: boolean): number[] {
  const roles: FixingRole[] = includeEngine ? ['engine', 'anchor', 'slide', 'hanger'] : ['anchor', 'slide', 'hanger'];
  const at = run.supports.map((s) => s.atMm);
  if (roles.includes(fixedPointRole(run.startFixing))) at.push(0);
  if (roles.includes(fixedPointRole(run.endFixing))) at.push(lengthMm);
  return at.sort((a, b) => a - b);
}

/** In words, the movement a support must let the pipe make: "slide 4.2 mm towards the end". */
export function movementWords(s: PlannedSupport, fmt: (mm: number) => string): string {
  if (s.role === 'engine' || s.role === 'anchor') return 'Holds the pipe: no movement';
  if (Math.abs(s.movementMm) < 0.05) return 'Carries the pipe; it barely moves here';
  const way = s.movementMm > 0 ? 'towards the run’s end' : 'towards the run’s start';
  return `${s.role === 'slide' ? 'Let it slide' : 'Let it swing'} ${fmt(Math.abs(s.movementMm))} ${way}`;
}
