import { joinPhrases, phrase, quantity, wordPhrase } from '../../shared/units';
import { optionKey, optionLimitState } from '../../shared/quotes/limit-cautions';
import type { LimitOverrideView, QuotePricing } from '../../shared/schemas/quotes';
import { AppError } from '../http/app-error';
import type { Quote } from './quote.entities';
import type { QuotesRepository } from './quotes.repository';
import { overrideFor } from './public-options';

/** A draft's overrides that still fit its options: one recorded for other alloys no longer counts. */
export async function overridesInForce(repo: QuotesRepository, quote: Quote): Promise<LimitOverrideView[]> {
  return (await repo.limitOverridesOf(quote.id))
    .filter((o) => quote.options[o.optionIndex] && optionKey(quote.options[o.optionIndex]) === o.optionKey)
    .map((o) => ({ optionIndex: o.optionIndex, reason: o.reason, by: o.byName, at: new Date(o.at).toISOString() }));
}

/** Sending needs an override for every option over its limit; the refusal names each one. Returns the overrides to freeze. */
export function requireOverrides(pricing: QuotePricing, overrides: LimitOverrideView[]): LimitOverrideView[] {
  const missing = pricing.options.map((o, i) => ({ o, i })).filter(({ o, i }) => optionLimitState(o) === 'over' && !overrideFor(overrides, i));
  if (missing.length > 0) {
    const names = joinPhrases(
      missing.map(({ o, i }) => phrase`option ${i + 1} (${o.label}, ${quantity('temperatureDelta', Math.round(-o.tempMarginC))} over)`),
      ', ',
    );
    const words = phrase`Over its temperature limit: ${names}. An engineer or admin must record an override with a reason before the quote can be sent, or change the option.`;
    throw AppError.conflict(
      'limit_override_needed',
      wordPhrase(words, 'metric'),
      Object.fromEntries(missing.map(({ i }) => [`options.${i}.alloyId`, 'Over its temperature limit: needs an override'])),
    ).worded(words);
  }
  return overrides;
}
