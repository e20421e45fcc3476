/**
 * The time a job or run is saved at, always later than the one it had: answers and results are
 * cached by `id@updatedAt`, so two saves within one millisecond must not share a revision.
 */
export function laterThan(previous: Date | string | null | undefined): Date {
  const before = previous ? new Date(previous).getTime() : Number.NEGATIVE_INFINITY;
  return new Date(Math.max(Date.now(), before + 1));
}
