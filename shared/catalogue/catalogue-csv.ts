/**
 * The catalogue's CSV layout: one row per property point, the alloy's own fields repeated on
 * each row, so that a spreadsheet can sort and filter it. Sources are named by key (or id).
 */
export const CSV_COLUMNS = [
  'uns',
  'designation',
  'family',
  'density_kg_m3',
  'density_source',
  'max_continuous_c',
  'max_intermittent_c',
  'limits_source',
  'price_per_kg',
  'currency',
  'price_set_on',
  'reference_temp_c',
  'property',
  'temp_c',
  'value',
  'source',
] as const;

/** Written on export for people reading the file; an import does not need them and ignores them. */
export const CSV_EXPORT_ONLY_COLUMNS = ['to_be_verified', 'data_cautions'] as const;

export type CsvColumn = (typeof CSV_COLUMNS)[number];
export type CsvRow = Record<CsvColumn, string>;

/** Units of the value column, by property. */
export const CSV_PROPERTIES = {
  cte_mean_um_per_m_k: 'cte',
  modulus_gpa: 'modulus',
  yield_mpa: 'yield',
} as const;
export type CsvProperty = keyof typeof CSV_PROPERTIES;

/** What an import did, alloy by alloy; refused rows are named by their line in the file (the header is line 1). */
export interface ImportReport {
  created: string[];
  updated: string[];
  unchanged: string[];
  refused: { line: number; uns: string; message: string }[];
}

export const IMPORT_PHASES = ['reading', 'checking', 'writing', 'done', 'failed'] as const;
export type ImportPhase = (typeof IMPORT_PHASES)[number];

/** An import runs in the background; the client polls it until `phase` is done or failed. */
export interface ImportJobView {
  id: string;
  phase: ImportPhase;
  /** Work done and to do in the current phase (bytes while reading, alloys while checking and writing). */
  done: number;
  total: number;
  /** 0 to 1 over the whole import. */
  fraction: number;
  startedAt: string;
  finishedAt: string | null;
  startedBy: string | null;
  report: ImportReport | null;
  /** Why a failed import stopped (alloys written before that stay written). */
  error: string | null;
}

/** The largest CSV file an import takes. */
export const MAX_IMPORT_BYTES = 8 * 1024 * 1024;
