import { CAUTION_MARGIN_C } from '../engine/limits';
import { phrase, type Phrase, quantity } from '../units';
import type { PricedOption } from './pricing';

/** How an option stands against its temperature limit at the hottest run: the run that limits it. */
export type OptionLimitState = 'over' | 'near' | 'ok';

export function optionLimitState(option: Pick<PricedOption, 'tempMarginC'>): OptionLimitState {
  if (option.tempMarginC < 0) return 'over';
  return option.tempMarginC < CAUTION_MARGIN_C ? 'near' : 'ok';
}

/** What an override was recorded for: the option's alloys. A changed option needs a new override. */
export function optionKey(option: { alloyId: string; runAlloys?: Record<string, string> }): string {
  const runs = Object.entries(option.runAlloys ?? {})
    .filter(([, alloyId]) => alloyId && alloyId !== option.alloyId)
    .sort(([a], [b]) => a.localeCompare(b));
  return JSON.stringify([option.alloyId, runs]);
}

/** The reason as a sentence, so it can stand inside quotation marks with its own full stop. */
const sentence = (text: string) => (/[.!?]$/.test(text.trim()) ? text.trim() : `${text.trim()}.`);

export interface OverrideWords {
  reason: string;
  by: string;
}

/**
 * The caution the customer reads beside an option that runs over, or near, what its material is
 * rated for, in words without jargon. Null for an option with room to spare.
 */
export function limitCautionWords(option: Pick<PricedOption, 'tempMarginC'>, override: OverrideWords | null): Phrase | null {
  const state = optionLimitState(option);
  // A margin is a difference of temperature: 380 °C reads 684 °F, with no 32 °F offset.
  const degrees = quantity('temperatureDelta', Math.abs(option.tempMarginC));
  if (state === 'over') {
    const vouched = override ? `${override.by} checked this option and recorded why it is still offered: “${sentence(override.reason)}” ` : '';
    return phrase`Caution: at the hottest part of your system this material would run about ${degrees} hotter than it is rated for in air. Metal that hot scales and weakens faster, so parts there may need replacing sooner. ${vouched}Please talk to us before choosing it.`;
  }
  if (state === 'near') {
    return phrase`Caution: at the hottest part of your system this material has only about ${degrees} to spare before its rated temperature. Real temperatures often vary by tens of degrees, so ask us if your system may run hotter than planned.`;
  }
  return null;
}
