import Papa from 'papaparse';
import { TimeSlicer } from '../../util/time-slice';

export interface ReadCsv {
  fields: string[];
  rows: Record<string, string>[];
  errors: { line: number; message: string }[];
}

const CHUNK_CHARS = 128 * 1024;

/** The header of a CSV, read at once (to refuse a file without the right columns before any work starts). */
export function csvHeader(text: string): string[] {
  return Papa.parse<string[]>(stripBom(text), { preview: 1 }).data[0]?.map((f) => f.trim()) ?? [];
}

export const stripBom = (text: string) => text.replace(/^\uFEFF/, '');

// The export writes a quote before cells that a spreadsheet would run as a formula; reading it back drops it.
const FORMULA_GUARD = /^'(?=[=+\-@\t\r\uFF1D\uFF0B\uFF0D\uFF20])/;

/**
 * Parses the file in chunks of about 128 KB, yielding to the event loop between them so that the
 * server keeps answering; `onProgress` hears how many characters have been read.
 */
export function readCsv(text: string, onProgress: (done: number) => void): Promise<ReadCsv> {
  const rows: Record<string, string>[] = [];
  const errors: ReadCsv['errors'] = [];
  const slicer = new TimeSlicer();
  let fields: string[] = [];
  let consumed = 0;
  return new Promise((resolve, reject) => {
    Papa.parse<Record<string, string>>(stripBom(text), {
      header: true,
      skipEmptyLines: 'greedy',
      chunkSize: CHUNK_CHARS,
      transform: (value) => value.trim().replace(FORMULA_GUARD, ''),
      chunk(result: Papa.ParseResult<Record<string, string>>, parser: Papa.Parser) {
        fields = result.meta.fields ?? fields;
        for (const e of result.errors) errors.push({ line: rows.length + (e.row ?? 0) + 2, message: e.message });
        for (const row of result.data) rows.push(row);
        consumed = Math.min(text.length, consumed + CHUNK_CHARS);
        onProgress(consumed);
        parser.pause();
        slicer.pause().then(() => parser.resume(), reject);
      },
      complete: () => {
        onProgress(text.length);
        resolve({ fields, rows, errors });
      },
      error: (err: Error) => reject(err),
    });
  });
}
