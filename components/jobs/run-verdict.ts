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
    const chosen = r.flex?.chosen;
    if (chosen?.fits) {
      const notForGrowth = chosen.warnings.some((w) => w.code === 'FLEX_NOT_FOR_GROWTH');
      return notForGrowth ? { label: `Flex not meant for growth: ${chosen.name}`, tone: 'warning' } : { label: `Flex sized: ${chosen.name}`, tone: 'success' };
    }
    return { label: chosen ? 'Chosen flex does not fit' : 'No flex part fits', tone: 'danger' };
  }
  if (run.joint.type === 'slip') {
    const s = r.slip;
    if (!s) return null;
    const failed = (code: string) => s.checks.some((c) => c.code === code && !c.ok);
    if (failed('hot_min_clearance') || failed('cold_min_clearance') || failed('assembles')) return { label: 'Slip joint may seize', tone: 'danger' };
    if (s.bottomsOut) return { label: 'Slip joint bottoms out', tone: 'danger' };
    if (s.verdict === 'fails') return { label: 'Slip joint needs changes', tone: 'danger' };
    return { label: 'Slip joint sized', tone: 'success' };
  }
  if (!isRestrained(run.startFixing, run.endFixing, 'none')) return { label: 'An end takes the growth', tone: 'neutral' };
  const verdict = r.restraint.verdict;
  if (verdict === 'yields') return { label: 'Joint needed, none fitted', tone: 'danger' };
  if (verdict === 'marginal') return { label: 'Joint advised: near yield', tone: 'warning' };
  if (verdict === 'clear') return { label: 'No joint needed', tone: 'success' };
  return { label: 'Joint need not known', tone: 'neutral' };
}

/** The verdicts shown at a glance beside a run. */
export function runVerdicts(run: VerdictRun): Verdict[] {
  if (run.problem) return [{ label: PROBLEM_LABELS[run.problem.code], tone: 'danger' }];
  if (!run.result) return [];
  const joint = jointVerdict(run);
  return [LIMIT_VERDICTS[run.result.limit.status], ...(joint ? [joint] : [])];
}
