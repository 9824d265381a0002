/**
 * Whether a write failed on a unique constraint (SQLSTATE 23505), as PostgreSQL and PGlite report
 * it; Drizzle wraps the driver's error, so the code may sit on a `cause`. Writes that must not race
 * let the constraint decide and turn this into a 409, rather than checking first.
 */
export function isUniqueViolation(error: unknown): boolean {
  for (let current: unknown = error; typeof current === "object" && current !== null; current = (current as { cause?: unknown }).cause) {
    if ((current as { code?: unknown }).code === "23505") return true;
  }
  return false;
}
