import Papa from 'papaparse';
import { CSV_COLUMNS, CSV_EXPORT_ONLY_COLUMNS, CSV_PROPERTIES, type CsvProperty, type ImportJobView, type ImportReport } from '../../shared/catalogue/catalogue-csv';
import { toBeVerified } from '../../shared/catalogue/to-be-verified';
import { AppError } from '../http/app-error';
import { TimeSlicer } from '../util/time-slice';
import type { CatalogueStore } from './catalogue.repository';
import type { Actor, CatalogueService } from './catalogue.service';
import { checkRows, TABLE_KEY, type Candidate } from './csv-import/check-rows';
import type { ImportJobs, Progress } from './csv-import/import-jobs';
import { csvHeader, readCsv } from './csv-import/read-csv';

const PROPERTY_OF_TABLE = Object.fromEntries(Object.entries(CSV_PROPERTIES).map(([p, t]) => [t, p])) as Record<
  (typeof CSV_PROPERTIES)[CsvProperty],
  CsvProperty
>;

/**
 * Text cells a spreadsheet would run as a formula get a leading quote (OWASP "CSV injection"):
 * =, +, -, @, tab, carriage return and their full-width forms. Numbers are written as numbers and left alone.
 */
export const FORMULA_START = /^[=+\-@\t\r\uFF1D\uFF0B\uFF0D\uFF20]/;

export class CatalogueCsvService {
  constructor(
    private readonly catalogue: CatalogueService,
    private readonly store: CatalogueStore,
    private readonly jobs: ImportJobs,
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
    const rows: (string | number)[][] = [];
    for (const item of items) {
      const v = (await this.catalogue.detail(item.id, actor)).published!;
      const base = [
        v.uns,
        v.designation,
        v.family,
        v.densityKgM3,
        nameOf.get(v.densitySourceId) ?? v.densitySourceId,
        v.maxContinuousC,
        v.maxIntermittentC,
        nameOf.get(v.limitsSourceId) ?? v.limitsSourceId,
        v.pricePerKg,
        v.currency,
        v.priceSetOn,
        v.referenceTempC,
      ];
      const alloyWide = toBeVerified({ ...v, cte: [], modulus: [], yield: [] }, (id) => memory.has(id));
      for (const table of ['cte', 'modulus', 'yield'] as const) {
        for (const p of v[table] as { tempC: number; sourceId: string }[]) {
          const value = (p as unknown as Record<string, number>)[TABLE_KEY[table]];
          const toVerify = [...(memory.has(p.sourceId) ? ['value'] : []), ...alloyWide].join('; ');
          rows.push([...base, PROPERTY_OF_TABLE[table], p.tempC, value, nameOf.get(p.sourceId) ?? p.sourceId, toVerify, v.dataCautions]);
        }
      }
    }
    // Numbers stay numbers (a −100 °C point is not a formula); text that starts like a formula is neutralised.
    return Papa.unparse({ fields: [...CSV_COLUMNS, ...CSV_EXPORT_ONLY_COLUMNS], data: rows }, { escapeFormulae: FORMULA_START });
  }

  /** Refuses a file without the right columns at once; everything else runs in the background (see `ImportJobs`). */
  async startImport(csv: string, actor: Actor): Promise<ImportJobView> {
    const header = csvHeader(csv);
    const missing = CSV_COLUMNS.filter((c) => !header.includes(c));
    if (missing.length > 0) {
      throw AppError.badRequest('invalid_csv', `The CSV lacks the columns ${missing.join(', ')}.`, { file: `Missing columns: ${missing.join(', ')}` });
    }
    return this.jobs.start(actor?.name ?? null, (progress) => this.runImport(csv, actor, progress));
  }

  importStatus(id: string): Promise<ImportJobView> {
    return this.jobs.get(id);
  }

  /** Validates every row; each alloy whose rows all pass becomes a draft (new or beside the published one). */
  private async runImport(csv: string, actor: Actor, progress: Progress): Promise<ImportReport> {
    const parsed = await readCsv(csv, (done) => progress.phase('reading', done, csv.length));
    const { idOf } = await this.sourceNames();
    const { candidates, refused } = await checkRows(parsed.rows, idOf, (done, total) => progress.phase('checking', done, total));
    const report: ImportReport = { created: [], updated: [], unchanged: [], refused: [...parsed.errors.map((e) => ({ ...e, uns: '' })), ...refused] };
    await this.write(candidates, actor, report, (done) => progress.phase('writing', done, candidates.length));
    report.refused.sort((a, b) => a.line - b.line);
    return report;
  }

  /** Writes the alloys in transactions of about one time slice each, yielding between them. */
  private async write(candidates: Candidate[], actor: Actor, report: ImportReport, onProgress: (done: number) => void) {
    const slicer = new TimeSlicer();
    let next = 0;
    while (next < candidates.length) {
      next = await this.store.write(async (repo) => {
        let i = next;
        do {
          const { uns, line, fields } = candidates[i++];
          try {
            const existing = await repo.findAlloyByUns(uns);
            if (!existing) {
              await this.catalogue.createIn(repo, { ...fields, notes: '', dataCautions: '', warningRanges: [], priceIsDemo: false }, actor, 'Imported from CSV');
              report.created.push(uns);
            } else {
              await this.catalogue.patchIn(repo, existing.id, { ...fields, note: 'Imported from CSV' }, actor);
              report.updated.push(uns);
            }
          } catch (err) {
            // Every check comes before the first write, so a refused alloy leaves nothing behind in the batch.
            if (err instanceof AppError && err.code === 'no_change') report.unchanged.push(uns);
            else if (err instanceof AppError) report.refused.push({ line, uns, message: err.fields ? Object.values(err.fields).join('; ') : err.message });
            else throw err;
          }
        } while (i < candidates.length && !slicer.due());
        return i;
      });
      onProgress(next);
      await slicer.pause();
    }
  }
}
