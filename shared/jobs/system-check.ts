import type { RunView } from '../schemas/jobs';
import { type Phrase, phrase, quantity } from '../units';
import { fixedPointLabel, fixedPointRole } from './fixed-points';
import { checkNearby, type NearbyCheck } from './nearby-check';
import { NEARBY_MINIMUMS_NOTE } from './nearby';
import { jointPositionMm } from './run-movement';
import { carryingPositions, type ComputedRun, joined, type PlannedSupport, supportPlan } from './support-plan';
import { SYSTEM_BASIS_NOTES, type SystemBasis } from './system-basis';

export interface SystemFinding {
  code: 'STRETCH_WITHOUT_JOINT' | 'ENGINE_CARRIES_WEIGHT' | 'JOINT_UNSUPPORTED' | 'FLEX_POSITION_MISSING' | 'NEARBY_TOO_CLOSE' | 'RUN_NOT_CHECKED';
  severity: 'danger' | 'warning';
  runId: string | null;
  /** Worded at the screen in the reader's units (`wordPhrase`). */
  message: Phrase;
}

/** The job as a system: its supports and what they must allow, clearances, and what is wrong. */
export interface SystemCheck {
  supports: PlannedSupport[];
  nearby: NearbyCheck[];
  findings: SystemFinding[];
  basisNotes: string[];
}

const HELD = ['engine', 'anchor'];
const len = (mm: number) => quantity('length', mm);
const kg = (m: number) => quantity('mass', m, 1);
const isHeld = (id: RunView['startFixing']) => HELD.includes(fixedPointRole(id));
const takesGrowth = (run: RunView) =>
  run.joint.type !== 'none' || ['joint', 'free'].includes(fixedPointRole(run.startFixing)) || ['joint', 'free'].includes(fixedPointRole(run.endFixing));

/**
 * Stretches between two held points (an anchor or an engine flange) along runs joined end to
 * end: each needs a joint, a free end, or a restrained stress the run can carry.
 */
function stretches(runs: ComputedRun[]): SystemFinding[] {
  const out: SystemFinding[] = [];
  let open: ComputedRun[] | null = null;
  runs.forEach((run, i) => {
    if (!joined(runs[i - 1], run) || isHeld(run.startFixing)) open = isHeld(run.startFixing) ? [] : null;
    if (open === null) return;
    open.push(run);
    if (!isHeld(run.endFixing)) return;
    const stretch: ComputedRun[] = open;
    open = isHeld(run.endFixing) ? [] : null;
    if (stretch.some(takesGrowth)) return;
    if (stretch.length === 1 && stretch[0].result.restraint.verdict === 'clear') return;
    const growth = stretch.reduce((sum, r) => sum + r.result.growthMm, 0);
    const names = stretch.map((r) => r.name).join(', ');
    out.push({
      code: 'STRETCH_WITHOUT_JOINT',
      severity: 'danger',
      runId: stretch[0].id,
      message: phrase`From the ${fixedPointLabel(stretch[0].startFixing).toLowerCase()} to the ${fixedPointLabel(run.endFixing).toLowerCase()} (${names}) the pipe is held at both ends with no joint: its ${len(growth)} of growth has nowhere to go and cracks welds or brackets. Fit a flex section or a slip joint, or let one end slide`,
    });
  });
  return out;
}

/** The first thing that carries the pipe after an engine flange, and what the flange carries meanwhile. */
function engineLoad(run: ComputedRun, fromStart: boolean, basis: SystemBasis): SystemFinding | null {
  const length = run.result.totalLengthMm;
  const perMm = run.result.massKg / length;
  const carriers = carryingPositions(run, length, false).map((x) => (fromStart ? x : length - x)).filter((d) => d > 0);
  const first = carriers.length ? Math.min(...carriers) : null;
  const flange = fixedPointLabel(fromStart ? run.startFixing : run.endFixing).toLowerCase();
  if (first === null) {
    return {
      code: 'ENGINE_CARRIES_WEIGHT',
      severity: 'danger',
      runId: run.id,
      message: phrase`Nothing in ${run.name} carries the pipe: its ${kg(run.result.massKg)} hangs on the ${flange}. Add a sliding support or hanger within ${len(basis.engineSupportMm)} of it`,
    };
  }
  if (first <= basis.engineSupportMm) return null;
  const j = jointPositionMm(run, length);
  const flexBefore = run.joint.type === 'flex' && j !== null && (fromStart ? j : length - j) < first;
  const carried = flexBefore ? perMm * (fromStart ? j! : length - j!) : (perMm * first) / 2;
  return {
    code: 'ENGINE_CARRIES_WEIGHT',
    severity: 'warning',
    runId: run.id,
    message: phrase`The first support of ${run.name} is ${len(first)} from the ${flange} (more than ${len(basis.engineSupportMm)}): the flange carries about ${kg(carried)} of pipe. Add a support nearer the ${flange}`,
  };
}

function jointSupports(runs: ComputedRun[], i: number, basis: SystemBasis): SystemFinding[] {
  const run = runs[i];
  if (run.joint.type === 'none') return [];
  const length = run.result.totalLengthMm;
  const what = run.joint.type === 'flex' ? 'flex section' : 'slip joint';
  const j = jointPositionMm(run, length);
  if (j === null) {
    return [{ code: 'FLEX_POSITION_MISSING', severity: 'warning', runId: run.id, message: [`Give the position of the flex section in ${run.name} to check the supports either side of it`] }];
  }
  const d = basis.supportNearJointMm;
  const here = carryingPositions(run, length, true);
  const near = (side: 'start' | 'end'): boolean => {
    if (here.some((x) => (side === 'start' ? x <= j && j - x <= d && !(x === j && x > 0) : x >= j && x - j <= d && !(x === j && x < length)))) return true;
    const neighbour = side === 'end' && j >= length && joined(run, runs[i + 1]) ? runs[i + 1] : side === 'start' && j <= 0 && joined(runs[i - 1], run) ? runs[i - 1] : null;
    if (!neighbour) return false;
    const nl = neighbour.result.totalLengthMm;
    return carryingPositions(neighbour, nl, true).some((x) => (side === 'end' ? x > 0 && x <= d : x < nl && nl - x <= d));
  };
  const out: SystemFinding[] = [];
  for (const side of ['start', 'end'] as const) {
    const beyondRun = (side === 'end' && j >= length && !joined(run, runs[i + 1])) || (side === 'start' && j <= 0 && !joined(runs[i - 1], run));
    if (beyondRun || near(side)) continue;
    out.push({
      code: 'JOINT_UNSUPPORTED',
      severity: 'warning',
      runId: run.id,
      message: phrase`No support within ${len(d)} on the ${side === 'start' ? 'start' : 'end'} side of the ${what} in ${run.name} (at ${len(j)}): support both sides so the joint never carries weight`,
    });
  }
  return out;
}

/** The whole job checked as one system, in run order. Runs without a result are named and left out. */
export function checkSystem(runs: RunView[], basis: SystemBasis): SystemCheck {
  const computed = runs.filter((r): r is ComputedRun => r.result !== null);
  const findings: SystemFinding[] = runs
    .filter((r) => r.result === null)
    .map((r) => ({ code: 'RUN_NOT_CHECKED', severity: 'warning', runId: r.id, message: [`${r.name} has no result, so its supports and clearances are not checked`] }));
  findings.push(...stretches(computed));
  computed.forEach((run, i) => {
    // A run between two engine flanges (manifold to turbo) is part of the engine assembly; the rule is for the system leaving it.
    const startEngine = fixedPointRole(run.startFixing) === 'engine';
    const endEngine = fixedPointRole(run.endFixing) === 'engine';
    if (startEngine !== endEngine) {
      const f = engineLoad(run, startEngine, basis);
      if (f) findings.push(f);
    }
    findings.push(...jointSupports(computed, i, basis));
  });
  const nearby = computed.flatMap((run) => run.nearby.map((_item, i) => checkNearby(run, i, basis.nearbyMinimumsMm)));
  for (const n of nearby) if (!n.ok) findings.push({ code: 'NEARBY_TOO_CLOSE', severity: 'danger', runId: n.runId, message: n.message });
  return { supports: supportPlan(computed), nearby, findings, basisNotes: [...SYSTEM_BASIS_NOTES, NEARBY_MINIMUMS_NOTE] };
}
