import { prepareStrainCurve, uniformGrowthMm } from '../../shared/engine/expansion';
import type { AlloyListQuery, AlloySummary } from '../../shared/schemas/alloy';
import type { AlloyListFilter, AlloyListRow, AlloyListRows, CtePoint } from './alloy-list.repository';

function growthPerMetreAt(referenceTempC: number, cte: CtePoint[], atC: number): number | null {
  try {
    return uniformGrowthMm(prepareStrainCurve({ referenceTempC, cte }), 1000, atC, 20);
  } catch {
    return null;
  }
}

function summaryOf(row: AlloyListRow, cte: CtePoint[], atC: number, editor: boolean): AlloySummary {
  return {
    id: row.id,
    designation: row.designation,
    uns: row.uns,
    family: row.family,
    status: row.status,
    version: row.isPublished ? row.version : null,
    hasDraft: editor && row.hasDraft,
    densityKgM3: row.densityKgM3,
    maxContinuousC: row.maxContinuousC,
    maxIntermittentC: row.maxIntermittentC,
    pricePerKg: row.pricePerKg,
    currency: row.currency,
    priceIsDemo: row.priceIsDemo,
    maxDataC: Math.max(...cte.map((p) => p.tempC)),
    growthAtMmPerM: growthPerMetreAt(row.referenceTempC, cte, atC),
  };
}

/**
 * One page of the alloy list. Search, filters, order and page run in the database and only the
 * page's expansion tables are read. Growth at the asked temperature depends on a whole table, so
 * ordering by it reads every matching alloy's table (three columns) and orders here.
 */
export async function alloyListPage(
  rows: AlloyListRows,
  ctePoints: (versionIds: string[]) => Promise<Map<string, CtePoint[]>>,
  count: (filter: AlloyListFilter) => Promise<number>,
  query: AlloyListQuery,
  filter: AlloyListFilter,
  editor: boolean,
): Promise<{ items: AlloySummary[]; total: number }> {
  const offset = (query.page - 1) * query.pageSize;
  if (query.sort === 'expansion') {
    const all = await rows.rows(filter, 'designation');
    const cte = await ctePoints(all.map((r) => r.versionId));
    const items = all.map((r) => summaryOf(r, cte.get(r.versionId)!, query.atC, editor));
    // Stable sort: equal growth keeps the designation order the query gave.
    items.sort((a, b) => (a.growthAtMmPerM ?? Infinity) - (b.growthAtMmPerM ?? Infinity));
    return { items: items.slice(offset, offset + query.pageSize), total: items.length };
  }
  const page = await rows.rows(filter, query.sort, { offset, limit: query.pageSize });
  // A page that is not full is the last one: the total follows without counting.
  const total = page.length < query.pageSize && (page.length > 0 || offset === 0) ? offset + page.length : await count(filter);
  const cte = await ctePoints(page.map((r) => r.versionId));
  return { items: page.map((r) => summaryOf(r, cte.get(r.versionId)!, query.atC, editor)), total };
}
