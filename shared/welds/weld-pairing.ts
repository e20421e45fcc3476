import { fumeCautions, isTitanium, metalName, type WeldMetal } from './weld-metals';
import { ruleFor, type RuleSides } from './weld-rule-match';

/** What the pairing needs of a shop rule. */
export interface PairRule extends RuleSides {
  id: string;
  version: number;
  filler: string;
  fillerSpec: string;
  purge: string;
  notes: string;
  procedureRef: string;
  source: string;
}

export type PairOutcome =
  | { status: 'rule'; rule: PairRule; message: null; fumes: string[] }
  | { status: 'refused' | 'no_rule'; rule: null; message: string; fumes: string[] };

export const TITANIUM_REFUSAL_SOURCE = 'AWS Welding Handbook, vol. 4, titanium and its alloys (from memory)';

/** Why titanium is never fusion-welded to another metal, in words the bench acts on. */
export function titaniumRefusal(a: WeldMetal, b: WeldMetal): string {
  const other = isTitanium(a) ? b : a;
  return (
    `Titanium is never fusion-welded to ${metalName(other)}: iron, nickel and chromium form brittle intermetallic compounds with titanium in the weld, which cracks. ` +
    `Join them with a bolted flange or clamp, or through a bimetallic transition piece (explosion-bonded), and weld titanium only to titanium (${TITANIUM_REFUSAL_SOURCE})`
  );
}

/** True when the pair may never be fusion-welded, whatever the shop's table says. */
export function neverFusionWelded(a: WeldMetal, b: WeldMetal): boolean {
  return isTitanium(a) !== isTitanium(b);
}

/**
 * The shop's rule for a pair of base metals. Titanium to anything but titanium is refused before
 * the table is read; a pair without a rule says so rather than guessing a filler.
 */
export function pairWeld(a: WeldMetal, b: WeldMetal, rules: readonly PairRule[]): PairOutcome {
  if (neverFusionWelded(a, b)) return { status: 'refused', rule: null, message: titaniumRefusal(a, b), fumes: fumeCautions(a, b, null) };
  const rule = ruleFor(rules, a.uns, b.uns);
  if (!rule) {
    const pair = a.uns === b.uns ? `${metalName(a)} to itself` : `${metalName(a)} to ${metalName(b)}`;
    return {
      status: 'no_rule',
      rule: null,
      message: `No rule for this pair (${pair}): an engineer adds one to the weld rules before this joint is welded; no filler is guessed`,
      fumes: fumeCautions(a, b, null),
    };
  }
  return { status: 'rule', rule, message: null, fumes: fumeCautions(a, b, rule.filler) };
}

export const WPS_CAUTION =
  'A qualified welding procedure specification (WPS) and qualified welders govern every weld (for example ISO 15614-1 and ISO 9606-1, or ASME Section IX): the fillers and purges here are suggestions from published guidance and the shop table, not a procedure.';
