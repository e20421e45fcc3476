import { isRestrained } from '../../shared/jobs/fixed-points';
import type { LimitStatus } from '../../shared/engine/types';
import type { RunView } from '../../shared/schemas/jobs';
import type { TagTone } from '../ui/tag';

export interface Verdict {
  label: string;
  tone: TagTone;
}

export const LIMIT_VERDICTS: Record<LimitStatus, Verdict> = {
  ok: { label: 'Within limit', tone: 'success' },
  caution: { label: 'Near limit', tone: 'warning' },
  over: { label: 'Over limit', tone: 'danger' },
};

const PROBLEM_LABELS: Record<NonNullable<RunView['problem']>['code'], string> = {
  alloy_retired: 'Alloy retired',
  alloy_unavailable: 'Alloy unavailable',
  outside_data: 'Outside the alloy data',
};

type VerdictRun = Pick<RunView, 'result' | 'problem' | 'joint' | 'startFixing' | 'endFixing'>;

/** What the joint (or the lack of one) comes to: sized, not sized, needed or not. */
export function jointVerdict(run: VerdictRun): Verdict | null {
  const r = run.result;
  if (!r) return null;
  if (run.joint.type === 'flex') {
    if (r.flex?.chosen) return { label: `Flex sized: ${r.flex.chosen.name}`, tone: 'success' };
    return { label: 'No flex part fits', tone: 'danger' };
  }
  if (run.joint.type === 'slip') {
    const s = r.slip;
    if (!s) return null;
    if (s.verdict === 'seizes') return { label: 'Slip joint seizes', tone: 'danger' };
    if (s.bottomsOut) return { label: 'Slip joint bottoms out', tone: 'danger' };
    if (!s.engagementOk) return { label: 'Slip engagement too short', tone: 'warning' };
    return { label: 'Slip joint sized', tone: 'success' };
  }
  if (!isRestrained(run.startFixing, run.endFixing, 'none')) return { label: 'An end takes the growth', tone: 'neutral' };
  if (r.jointNeeded === true) return { label: 'Joint needed, none fitted', tone: 'danger' };
  if (r.jointNeeded === false) return { label: 'No joint needed', tone: 'success' };
  return { label: 'Joint need not known', tone: 'neutral' };
}

/** The verdicts shown at a glance beside a run. */
export function runVerdicts(run: VerdictRun): Verdict[] {
  if (run.problem) return [{ label: PROBLEM_LABELS[run.problem.code], tone: 'danger' }];
  if (!run.result) return [];
  const joint = jointVerdict(run);
  return [LIMIT_VERDICTS[run.result.limit.status], ...(joint ? [joint] : [])];
}
