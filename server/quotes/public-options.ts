import { temperatureLimit } from '../../shared/engine/limits';
import { limitCautionWords, optionLimitState } from '../../shared/quotes/limit-cautions';
import type { PricedAlloy, PricedOption, PricedRunInput } from '../../shared/quotes/pricing';
import { FAMILY_LABELS } from '../../shared/schemas/alloy';
import type { LimitOverrideView, PublicQuoteView, QuotePricing } from '../../shared/schemas/quotes';
import { phrase, quantity } from '../../shared/units';

type PublicOption = PublicQuoteView['options'][number];
type PublicAlloy = PublicOption['alloys'][number];

/**
 * One alloy of an option in plain words, judged on the runs it is used on only: in an option with a
 * 625 collector and 321 elsewhere, the 321's margin comes from the 321 runs, the 625's from the collector.
 */
function alloyWords(alloy: PricedAlloy, option: PricedOption, runs: ReadonlyMap<string, PricedRunInput>): PublicAlloy {
  const used = option.runs.filter((r) => r.alloyId === alloy.alloyId);
  const hottest = Math.max(...used.map((r) => runs.get(r.runId)?.peakTempC ?? -Infinity));
  const limit = temperatureLimit(alloy, hottest);
  const family = FAMILY_LABELS[alloy.family];
  const where = used.length === option.runs.length ? 'The hottest part of your system' : `Where it is used (${used.map((r) => r.name).join(', ')}), the hottest part`;
  return {
    designation: alloy.designation,
    uns: alloy.uns,
    familyLabel: family,
    serviceLimitC: limit.governingC,
    // Temperatures as quantities, so the customer's own unit switch words them; the margin is a difference.
    plainWords:
      limit.marginC >= 0
        ? phrase`${alloy.designation} (${family.toLowerCase()}) is good for about ${quantity('temperature', limit.governingC)} in air. ${where} runs at about ${quantity('temperature', hottest)}, which leaves ${quantity('temperatureDelta', limit.marginC)} in hand.`
        : phrase`${alloy.designation} (${family.toLowerCase()}) is good for about ${quantity('temperature', limit.governingC)} in air. ${where} runs at about ${quantity('temperature', hottest)}, above what it is rated for: ask us before choosing it there.`,
  };
}

export function overrideFor(overrides: readonly LimitOverrideView[] | undefined, index: number): LimitOverrideView | null {
  return overrides?.find((o) => o.optionIndex === index) ?? null;
}

/** The options as the customer reads them: totals against option 1, weight, heat with its caution, and each alloy in plain words. */
export function publicOptions(pricing: QuotePricing): PublicOption[] {
  const alloys = new Map(pricing.alloys.map((a) => [a.alloyId, a]));
  const runs = new Map(pricing.runs.map((r) => [r.runId, r]));
  return pricing.options.map((o, i) => {
    const override = overrideFor(pricing.limitOverrides, i);
    const limitState = optionLimitState(o);
    return {
      label: o.label,
      total: o.total,
      costDifference: pricing.comparisons[i].costDifference,
      costDifferencePct: pricing.comparisons[i].costDifferencePct,
      massKg: o.massKg,
      massDifferenceKg: pricing.comparisons[i].massDifferenceKg,
      tempMarginC: o.tempMarginC,
      tempMarginGainedC: pricing.comparisons[i].tempMarginGainedC,
      limitState,
      limitCaution: limitCautionWords(o, override),
      acceptable: limitState !== 'over' || override !== null,
      alloys: [...new Set(o.runs.map((r) => r.alloyId))].map((id) => alloyWords(alloys.get(id)!, o, runs)),
    };
  });
}
