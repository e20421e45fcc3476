import { stressFigure } from '../../shared/jobs/stress-figure';
import type { CompareRow, CompareView } from '../../shared/schemas/jobs';
import { AppError } from '../http/app-error';
import type { JobRun } from './job.entities';
import { revisionOf, runFieldsOf } from './jobs.views';
import type { Computed, ResultSession } from './run-results';

function figuresOf(c: Computed): CompareRow['figures'] {
  if (!c.result || !c.currency) return null;
  const r = c.result;
  return {
    growthMm: r.growthMm,
    limitStatus: r.limit.status,
    marginC: r.limit.marginC,
    stress: stressFigure(r.restraint),
    jointNeeded: r.restraint.jointNeeded,
    massKg: r.massKg,
    materialCost: r.materialCost,
    currency: c.currency,
  };
}

/** The run computed with each candidate alloy and with its own, and each candidate's difference from its own. */
export async function compareAlloys(run: JobRun, session: ResultSession, alloyIds: string[]): Promise<CompareView> {
    const lookups = await Promise.all(alloyIds.map((a) => session.alloy(a)));
    const bad = alloyIds.filter((_, i) => lookups[i].state !== 'published');
    if (bad.length > 0) {
      throw AppError.badRequest('invalid_query', 'Some alloys cannot be compared.', {
        alloyIds: `No published alloy with id ${bad.join(', ')}`,
      });
    }
    const fields = runFieldsOf(run);
    const revision = revisionOf(run);
    // The joint is left out: the figures compared do not depend on it, and a slip member's data must not veto a candidate.
    const opts = { withJoint: false };
    const current = await session.compute(fields, fields.alloyId, opts, revision);
    const base = figuresOf(current);
    const candidates = await Promise.all(
      alloyIds.map(async (alloyId): Promise<CompareRow> => {
        const c = await session.compute(fields, alloyId, opts, revision);
        const figures = figuresOf(c);
        const difference =
          figures && base
            ? {
                growthMm: figures.growthMm - base.growthMm,
                marginC: figures.marginC - base.marginC,
                massKg: figures.massKg - base.massKg,
                materialCost: figures.currency === base.currency ? figures.materialCost - base.materialCost : null,
              }
            : null;
        return { alloy: c.alloy, figures, problem: c.problem, difference };
      }),
    );
    return { runId: run.id, current: { alloy: current.alloy, figures: base, problem: current.problem, difference: null }, candidates };
}
