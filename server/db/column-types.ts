/**
 * Column types that give the same API answers on SQLite (the embedded default) and
 * PostgreSQL (`DATABASE_URL=postgres://…`). Entities and migrations name their
 * column types through these, never as literals, so one schema serves both drivers.
 */
export type DatabaseKind = 'sqlite' | 'postgres';

export function databaseKind(url: string | undefined = process.env.DATABASE_URL): DatabaseKind {
  return url && /^postgres(ql)?:\/\//.test(url) ? 'postgres' : 'sqlite';
}

const onPostgres = () => databaseKind() === 'postgres';

export const columnType = {
  /** A point in time; PostgreSQL keeps the zone so both give back the same instant. */
  // Spelled out (not 'timestamptz'), so TypeScript takes both in @Column's one precision overload.
  get time(): 'timestamp with time zone' | 'datetime' {
    return onPostgres() ? 'timestamp with time zone' : 'datetime';
  },
  /** A measured value: 8-byte float on both (SQLite's REAL is already 8 bytes). */
  get real(): 'double precision' | 'real' {
    return onPostgres() ? 'double precision' : 'real';
  },
  /** True or false; SQLite stores 0/1 and TypeORM maps it back. */
  get flag(): 'boolean' {
    return 'boolean';
  },
  /** Structured data held as JSON text on both, so answers stay byte-for-byte alike. */
  get json(): 'text' {
    return 'text';
  },
};
