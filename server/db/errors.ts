/** A write refused by a UNIQUE index: two requests raced to make the same thing. */
export function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; driverError?: { code?: string } } | null;
  const code = e?.driverError?.code ?? e?.code;
  // 23505 is PostgreSQL's unique_violation.
  return code === 'SQLITE_CONSTRAINT_UNIQUE' || code === 'SQLITE_CONSTRAINT_PRIMARYKEY' || code === '23505';
}
