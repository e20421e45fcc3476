/** Column defaults written so that SQLite and PostgreSQL both accept them as they stand. */
export const NOW = 'CURRENT_TIMESTAMP';
export const EMPTY_TEXT = "''";
/** TRUE/FALSE are keywords on both (SQLite stores 1/0). */
export const flagDefault = (value: boolean) => (value ? 'true' : 'false');
