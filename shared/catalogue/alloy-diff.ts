import type { AlloyInput, AlloyVersionView } from '../schemas/alloy';

export interface DiffEntry {
  path: string;
  before: unknown;
  after: unknown;
}

const TABLES = ['cte', 'modulus', 'yield'] as const;
const VALUE_KEY = { cte: 'meanUmPerMK', modulus: 'gpa', yield: 'mpa' } as const;

type Comparable = Partial<AlloyInput>;

function same(a: unknown, b: unknown) {
  return JSON.stringify(a) === JSON.stringify(b);
}

/**
 * What changed from `before` to `after`, as paths a person can read: scalar fields by name,
 * table points by temperature (`cte@600 °C`), each with its value and cited source.
 */
export function diffAlloy(before: Comparable | null, after: Comparable): DiffEntry[] {
  const entries: DiffEntry[] = [];
  const keys = new Set([...Object.keys(before ?? {}), ...Object.keys(after)]);
  for (const key of [...keys].sort()) {
    if ((TABLES as readonly string[]).includes(key)) continue;
    const a = (before as Record<string, unknown> | null)?.[key];
    const b = (after as Record<string, unknown>)[key];
    if (!same(a, b)) entries.push({ path: key, before: a ?? null, after: b ?? null });
  }
  for (const table of TABLES) {
    const valueKey = VALUE_KEY[table];
    const rows = (side: Comparable | null) =>
      new Map(
        ((side?.[table] ?? []) as { tempC: number; sourceId: string }[]).map((row) => [
          row.tempC,
          { value: (row as unknown as Record<string, number>)[valueKey], sourceId: row.sourceId },
        ]),
      );
    const a = rows(before);
    const b = rows(after);
    const temps = [...new Set([...a.keys(), ...b.keys()])].sort((x, y) => x - y);
    for (const t of temps) {
      if (!same(a.get(t), b.get(t))) {
        entries.push({ path: `${table}@${t} °C`, before: a.get(t) ?? null, after: b.get(t) ?? null });
      }
    }
  }
  return entries;
}

/** A version's data without its bookkeeping (number, state, who and when), as diffs compare it. */
export function stripMeta(v: AlloyVersionView | null): AlloyInput | null {
  if (!v) return null;
  const { versionId: _a, version: _b, state: _c, createdAt: _d, createdBy: _e, publishedAt: _f, publishedBy: _g, ...input } = v;
  return input;
}

/** The open draft against the published version, computed where both are at hand (no request of its own). */
export function draftChanges(published: AlloyVersionView | null, draft: AlloyVersionView): DiffEntry[] {
  return diffAlloy(stripMeta(published), stripMeta(draft)!);
}
