import type { AlloyInput } from '../schemas/alloy';

type Cited = Pick<AlloyInput, 'densitySourceId' | 'limitsSourceId' | 'cte' | 'modulus' | 'yield'>;

const TABLE_NAMES = { cte: 'expansion', modulus: 'modulus', yield: 'yield' } as const;

function temps(list: number[]): string {
  if (list.length <= 3) return `${list.join(', ')} °C`;
  return `${list[0]}–${list[list.length - 1]} °C (${list.length} points)`;
}

/** What of an alloy's data cites a source from memory, in words: "density", "yield at 100–550 °C (10 points)". */
export function toBeVerified(v: Cited, isMemory: (sourceId: string) => boolean): string[] {
  const out: string[] = [];
  if (isMemory(v.densitySourceId)) out.push('density');
  if (isMemory(v.limitsSourceId)) out.push('service limits');
  for (const table of ['cte', 'modulus', 'yield'] as const) {
    const hits = (v[table] as { tempC: number; sourceId: string }[]).filter((p) => isMemory(p.sourceId)).map((p) => p.tempC);
    if (hits.length > 0) out.push(`${TABLE_NAMES[table]} at ${temps(hits)}`);
  }
  return out;
}
