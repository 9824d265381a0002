/** The driver's error under Drizzle's wrapping (the code may sit on a `cause`), with its SQLSTATE. */
function driverError(error: unknown): { code: string; constraint?: string } | null {
  for (let current: unknown = error; typeof current === "object" && current !== null; current = (current as { cause?: unknown }).cause) {
    const { code, constraint } = current as { code?: unknown; constraint?: unknown };
    if (typeof code === "string" && /^[0-9A-Z]{5}$/.test(code)) return { code, constraint: typeof constraint === "string" ? constraint : undefined };
  }
  return null;
}

/**
 * Whether a write failed on a unique constraint (SQLSTATE 23505), as PostgreSQL and PGlite report
 * it. Writes that must not race let the constraint decide and turn this into a 409, rather than
 * checking first.
 */
export function isUniqueViolation(error: unknown): boolean {
  return driverError(error)?.code === "23505";
}

/** Whether a write failed on the named check constraint (SQLSTATE 23514), e.g. tires held beyond those on hand. */
export function isCheckViolation(error: unknown, constraint: string): boolean {
  const found = driverError(error);
  return found?.code === "23514" && found.constraint === constraint;
}
