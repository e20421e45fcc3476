import Papa from 'papaparse';
import { CSV_COLUMNS } from '../../shared/catalogue/catalogue-csv';

export interface BigCsvOptions {
  /** Property rows to write (each alloy keeps the row count of the alloy it copies). */
  rows: number;
  /** Pads each row through an extra "comment" column (ignored on import) until the file is about this size. */
  targetBytes?: number;
  /** Rows per alloy (its first expansion points); by default as many as the alloy copied has. */
  rowsPerAlloy?: number;
}

/**
 * A large import made from the catalogue's own export: its alloys copied under new UNS numbers
 * (Z00001, Z00002, …) and designations, so that every row is valid and every alloy is new.
 */
export function bigImportCsv(exportCsv: string, { rows, targetBytes, rowsPerAlloy }: BigCsvOptions): { csv: string; alloys: number; rows: number } {
  const parsed = Papa.parse<Record<string, string>>(exportCsv, { header: true, skipEmptyLines: true }).data;
  const byUns = new Map<string, Record<string, string>[]>();
  for (const row of parsed) byUns.set(row.uns, [...(byUns.get(row.uns) ?? []), row]);
  const templates = [...byUns.values()];
  const out: Record<string, string>[] = [];
  let alloys = 0;
  while (out.length < rows) {
    const template = templates[alloys % templates.length];
    alloys += 1;
    const uns = `Z${String(alloys).padStart(5, '0')}`;
    for (const row of rowsPerAlloy ? template.slice(0, rowsPerAlloy) : template) {
      if (out.length >= rows) break;
      out.push({ ...row, uns, designation: `Imported ${uns}` });
    }
  }
  const bare = Papa.unparse({ fields: [...CSV_COLUMNS], data: out.map((r) => CSV_COLUMNS.map((c) => r[c])) });
  const pad = targetBytes ? Math.max(0, Math.floor((targetBytes - bare.length) / out.length) - 1) : 0;
  const comment = 'x'.repeat(pad);
  const csv = pad > 0
    ? Papa.unparse({ fields: [...CSV_COLUMNS, 'comment'], data: out.map((r) => [...CSV_COLUMNS.map((c) => r[c]), comment]) })
    : bare;
  // The last alloy may have been cut short of its rows; it still has its expansion points first.
  return { csv, alloys, rows: out.length };
}
