import { CSV_COLUMNS, CSV_PROPERTIES, type CsvProperty, type ImportReport } from '../../../shared/catalogue/catalogue-csv';
import { alloyInputSchema, type AlloyInput } from '../../../shared/schemas/alloy';
import { fieldsFromZod } from '../../http/validate';
import { TimeSlicer } from '../../util/time-slice';

/** The value column's key in each property table. */
export const TABLE_KEY = { cte: 'meanUmPerMK', modulus: 'gpa', yield: 'mpa' } as const;
const ALLOY_COLUMNS = CSV_COLUMNS.slice(0, 12);

/** The fields a CSV carries for one alloy; notes, data cautions, warnings and the demo flag stay as the catalogue has them. */
export type CsvAlloyFields = Omit<AlloyInput, 'notes' | 'dataCautions' | 'warningRanges' | 'priceIsDemo'>;

export interface Candidate {
  uns: string;
  line: number;
  fields: CsvAlloyFields;
}

type Line = { line: number; row: Record<string, string> };

/** Groups the rows by alloy and checks each alloy whole; alloys with any bad row are refused, by line. */
export async function checkRows(
  rows: Record<string, string>[],
  sourceIdOf: Map<string, string>,
  onProgress: (done: number, total: number) => void,
): Promise<{ candidates: Candidate[]; refused: ImportReport['refused'] }> {
  const groups = new Map<string, Line[]>();
  rows.forEach((row, i) => {
    const uns = (row.uns ?? '').toUpperCase();
    let group = groups.get(uns);
    if (!group) groups.set(uns, (group = []));
    group.push({ line: i + 2, row });
  });
  const candidates: Candidate[] = [];
  const refused: ImportReport['refused'] = [];
  const slicer = new TimeSlicer();
  let done = 0;
  for (const [uns, lines] of groups) {
    const result = checkAlloy(uns, lines, sourceIdOf);
    if ('fields' in result) candidates.push(result);
    else refused.push(...result.refused);
    done += 1;
    if (slicer.due()) {
      onProgress(done, groups.size);
      await slicer.pause();
    }
  }
  onProgress(groups.size, groups.size);
  return { candidates, refused };
}

function checkAlloy(uns: string, lines: Line[], idOf: Map<string, string>): Candidate | { refused: ImportReport['refused'] } {
  const refuse = (line: number, message: string) => ({ refused: [{ line, uns, message }] });
  const first = lines[0].row;
  const conflicting = lines.find(({ row }) => ALLOY_COLUMNS.some((c) => row[c] !== first[c]));
  if (conflicting) return refuse(conflicting.line, `The alloy's own columns differ from line ${lines[0].line}; every row of one alloy must repeat them.`);
  const tables = { cte: [] as Record<string, unknown>[], modulus: [] as Record<string, unknown>[], yield: [] as Record<string, unknown>[] };
  const bad: ImportReport['refused'] = [];
  for (const { line, row } of lines) {
    const table = CSV_PROPERTIES[row.property as CsvProperty];
    const sourceId = idOf.get(row.source);
    if (!table) bad.push({ line, uns, message: `Unknown property "${row.property}"; use ${Object.keys(CSV_PROPERTIES).join(', ')}.` });
    else if (!sourceId) bad.push({ line, uns, message: `Unknown source "${row.source}"; add the source first or use its key.` });
    else tables[table].push({ tempC: Number(row.temp_c), [TABLE_KEY[table]]: Number(row.value), sourceId });
  }
  if (bad.length > 0) return { refused: bad };
  const byTemp = (a: Record<string, unknown>, b: Record<string, unknown>) => Number(a.tempC) - Number(b.tempC);
  const parsed = alloyInputSchema.safeParse({
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
  if (!parsed.success) {
    const fields = fieldsFromZod(parsed.error);
    return refuse(lines[0].line, Object.entries(fields).map(([path, message]) => `${path}: ${message}`).join('; '));
  }
  const { notes: _n, dataCautions: _c, warningRanges: _w, priceIsDemo: _p, ...fields } = parsed.data;
  return { uns, line: lines[0].line, fields };
}
