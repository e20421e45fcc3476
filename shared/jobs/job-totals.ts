import type { JobTotals, RunView } from '../schemas/jobs';

type TotalsRun = Pick<RunView, 'result' | 'currency'>;

/** A job's totals over the runs with a result: a run the data no longer covers is counted as a problem and in nothing else. */
export function jobTotals(runs: TotalsRun[]): JobTotals {
  const computed = runs.filter((r) => r.result !== null);
  const currencies = new Set(computed.map((r) => r.currency));
  const oneCurrency = currencies.size <= 1;
  const temps = computed.map((r) => r.result!.peakTempC);
  return {
    growthMm: computed.reduce((sum, r) => sum + r.result!.growthMm, 0),
    massKg: computed.reduce((sum, r) => sum + r.result!.massKg, 0),
    materialCost: oneCurrency ? computed.reduce((sum, r) => sum + r.result!.materialCost, 0) : null,
    currency: oneCurrency ? (computed[0]?.currency ?? null) : null,
    costNote: oneCurrency ? null : `The runs are priced in ${[...currencies].sort().join(' and ')}; prices in different currencies are not added up. An admin can set a rate under Currency rates.`,
    lengthMm: computed.reduce((sum, r) => sum + r.result!.totalLengthMm, 0),
    peakTempC: temps.length > 0 ? Math.max(...temps) : null,
    runCount: runs.length,
    runsWithProblems: runs.length - computed.length,
  };
}
