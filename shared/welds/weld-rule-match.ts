/** The part of a weld rule that decides which pairs it covers. */
export interface RuleSides {
  sideA: readonly string[];
  sideB: readonly string[];
}

const meets = (x: readonly string[], y: readonly string[]) => x.some((u) => y.includes(u));

/** True when the rule covers the pair, either way round. */
export function ruleCovers(rule: RuleSides, unsA: string, unsB: string): boolean {
  return (rule.sideA.includes(unsA) && rule.sideB.includes(unsB)) || (rule.sideA.includes(unsB) && rule.sideB.includes(unsA));
}

/** The one rule covering the pair, or null. The table never holds two rules for one pair (see `overlapping`). */
export function ruleFor<R extends RuleSides>(rules: readonly R[], unsA: string, unsB: string): R | null {
  return rules.find((r) => ruleCovers(r, unsA, unsB)) ?? null;
}

/** Some pair both rules would cover: a table where a pair had two answers would have to guess between them. */
export function sharedPair(x: RuleSides, y: RuleSides): [string, string] | null {
  for (const [p, q] of [
    [y.sideA, y.sideB],
    [y.sideB, y.sideA],
  ] as const) {
    if (meets(x.sideA, p) && meets(x.sideB, q)) return [x.sideA.find((u) => p.includes(u))!, x.sideB.find((u) => q.includes(u))!];
  }
  return null;
}
