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
