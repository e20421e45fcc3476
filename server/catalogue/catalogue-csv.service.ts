import Papa from 'papaparse';
import { CSV_COLUMNS, CSV_EXPORT_ONLY_COLUMNS, CSV_PROPERTIES, type CsvProperty, type CsvRow } from '../../shared/catalogue/catalogue-csv';
import { toBeVerified } from '../../shared/catalogue/to-be-verified';
import { alloyInputSchema, type AlloyVersionView } from '../../shared/schemas/alloy';
import { AppError } from '../http/app-error';
import { fieldsFromZod } from '../http/validate';
import type { CatalogueStore } from './catalogue.repository';
import { stripMeta, type Actor, type CatalogueService } from './catalogue.service';

export interface ImportReport {
  created: string[];
  updated: string[];
  unchanged: string[];
  refused: { line: number; uns: string; message: string }[];
}

const TABLE_KEY = { cte: 'meanUmPerMK', modulus: 'gpa', yield: 'mpa' } as const;
const PROPERTY_OF_TABLE = Object.fromEntries(Object.entries(CSV_PROPERTIES).map(([p, t]) => [t, p])) as Record<
  (typeof CSV_PROPERTIES)[CsvProperty],
  CsvProperty
>;
const ALLOY_COLUMNS = CSV_COLUMNS.slice(0, 12);

export class CatalogueCsvService {
  constructor(
    private readonly catalogue: CatalogueService,
    private readonly store: CatalogueStore,
  ) {}

  private async sourceNames() {
    const sources = await this.store.read().allSources();
    return {
      nameOf: new Map(sources.map((s) => [s.id, s.key ?? s.id])),
      idOf: new Map(sources.flatMap((s) => [[s.id, s.id] as [string, string], ...(s.key ? [[s.key, s.id] as [string, string]] : [])])),
    };
  }

  async export(actor: Actor): Promise<string> {
    const { items } = await this.catalogue.list(
      { sort: 'designation', atC: 20, includeDrafts: false, includeRetired: false, page: 1, pageSize: 10_000 },
      actor,
    );
    const { nameOf } = await this.sourceNames();
    const memory = new Set((await this.store.read().allSources()).filter((s) => s.kind === 'memory').map((s) => s.id));
    const rows: (CsvRow & Record<(typeof CSV_EXPORT_ONLY_COLUMNS)[number], string>)[] = [];
    for (const item of items) {
      const v = (await this.catalogue.detail(item.id, actor)).published!;
      const base = {
        uns: v.uns,
        designation: v.designation,
        family: v.family,
        density_kg_m3: String(v.densityKgM3),
        density_source: nameOf.get(v.densitySourceId) ?? v.densitySourceId,
        max_continuous_c: String(v.maxContinuousC),
        max_intermittent_c: String(v.maxIntermittentC),
        limits_source: nameOf.get(v.limitsSourceId) ?? v.limitsSourceId,
        price_per_kg: String(v.pricePerKg),
        currency: v.currency,
        price_set_on: v.priceSetOn,
        reference_temp_c: String(v.referenceTempC),
        data_cautions: v.dataCautions,
      };
      const alloyWide = toBeVerified({ ...v, cte: [], modulus: [], yield: [] }, (id) => memory.has(id));
      for (const table of ['cte', 'modulus', 'yield'] as const) {
        for (const p of v[table] as { tempC: number; sourceId: string }[]) {
          rows.push({
            ...base,
            property: PROPERTY_OF_TABLE[table],
            temp_c: String(p.tempC),
            value: String((p as unknown as Record<string, number>)[TABLE_KEY[table]]),
            source: nameOf.get(p.sourceId) ?? p.sourceId,
            to_be_verified: [...(memory.has(p.sourceId) ? ['value'] : []), ...alloyWide].join('; '),
          });
        }
      }
    }
    const fields = [...CSV_COLUMNS, ...CSV_EXPORT_ONLY_COLUMNS];
    return Papa.unparse({ fields, data: rows.map((r) => fields.map((c) => r[c])) });
  }

  /** Validates every row; each alloy whose rows all pass becomes a draft (new or beside the published one). */
  async import(csv: string, actor: Actor): Promise<ImportReport> {
    const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: 'greedy', transform: (v) => v.trim() });
    const missing = CSV_COLUMNS.filter((c) => !parsed.meta.fields?.includes(c));
    if (missing.length > 0) {
      throw AppError.badRequest('invalid_csv', `The CSV lacks the columns ${missing.join(', ')}.`, { file: `Missing columns: ${missing.join(', ')}` });
    }
    const report: ImportReport = { created: [], updated: [], unchanged: [], refused: [] };
    const { idOf } = await this.sourceNames();
    const groups = new Map<string, { line: number; row: Record<string, string> }[]>();
    parsed.data.forEach((row, i) => {
      const uns = (row.uns ?? '').toUpperCase();
      groups.set(uns, [...(groups.get(uns) ?? []), { line: i + 2, row }]);
    });
    for (const e of parsed.errors) report.refused.push({ line: (e.row ?? 0) + 2, uns: '', message: e.message });

    for (const [uns, rows] of groups) {
      const refuse = (line: number, message: string) => report.refused.push({ line, uns, message });
      const first = rows[0].row;
      const conflicting = rows.find(({ row }) => ALLOY_COLUMNS.some((c) => row[c] !== first[c]));
      if (conflicting) {
        refuse(conflicting.line, `The alloy's own columns differ from line ${rows[0].line}; every row of one alloy must repeat them.`);
        continue;
      }
      const tables = { cte: [] as Record<string, unknown>[], modulus: [] as Record<string, unknown>[], yield: [] as Record<string, unknown>[] };
      let rowsOk = true;
      for (const { line, row } of rows) {
        const table = CSV_PROPERTIES[row.property as CsvProperty];
        const sourceId = idOf.get(row.source);
        if (!table) {
          refuse(line, `Unknown property "${row.property}"; use ${Object.keys(CSV_PROPERTIES).join(', ')}.`);
          rowsOk = false;
        } else if (!sourceId) {
          refuse(line, `Unknown source "${row.source}"; add the source first or use its key.`);
          rowsOk = false;
        } else {
          tables[table].push({ tempC: Number(row.temp_c), [TABLE_KEY[table]]: Number(row.value), sourceId });
        }
      }
      if (!rowsOk) continue;
      const existing = await this.store.read().findAlloyByUns(uns);
      const current = existing ? await this.catalogue.detail(existing.id, actor) : null;
      const base = stripMeta((current?.draft ?? current?.published ?? null) as AlloyVersionView | null);
      const byTemp = (a: Record<string, unknown>, b: Record<string, unknown>) => Number(a.tempC) - Number(b.tempC);
      const candidate = alloyInputSchema.safeParse({
        ...(base ?? {}),
        uns,
        designation: first.designation,
        family: first.family,
        densityKgM3: Number(first.density_kg_m3),
        densitySourceId: idOf.get(first.density_source) ?? first.density_source,
        maxContinuousC: Number(first.max_continuous_c),
        maxIntermittentC: Number(first.max_intermittent_c),
        limitsSourceId: idOf.get(first.limits_source) ?? first.limits_source,
        pricePerKg: Number(first.price_per_kg),
        currency: first.currency,
        priceSetOn: first.price_set_on,
        referenceTempC: Number(first.reference_temp_c),
        cte: tables.cte.sort(byTemp),
        modulus: tables.modulus.sort(byTemp),
        yield: tables.yield.sort(byTemp),
      });
      if (!candidate.success) {
        const fields = fieldsFromZod(candidate.error);
        refuse(rows[0].line, Object.entries(fields).map(([path, message]) => `${path}: ${message}`).join('; '));
        continue;
      }
      try {
        if (!existing) {
          await this.catalogue.create(candidate.data, actor, 'Imported from CSV');
          report.created.push(uns);
        } else {
          await this.catalogue.patch(existing.id, { ...candidate.data, note: 'Imported from CSV' }, actor);
          report.updated.push(uns);
        }
      } catch (err) {
        if (err instanceof AppError && err.code === 'no_change') report.unchanged.push(uns);
        else if (err instanceof AppError) refuse(rows[0].line, err.fields ? Object.values(err.fields).join('; ') : err.message);
        else throw err;
      }
    }
    report.refused.sort((a, b) => a.line - b.line);
    return report;
  }
}
