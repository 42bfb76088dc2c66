/** True when PostgreSQL refused a row for breaking the named unique constraint (SQLSTATE 23505). */
export function isUniqueViolation(error: unknown, constraint: string): boolean {
  const e = error as { code?: string; constraint?: string; cause?: { code?: string; constraint?: string } };
  const pg = e?.code ? e : e?.cause;
  return pg?.code === "23505" && pg.constraint === constraint;
}

/** True when a row still referenced elsewhere was deleted, or a reference points nowhere (SQLSTATE 23503). */
export function isForeignKeyViolation(error: unknown): boolean {
  const e = error as { code?: string; cause?: { code?: string } };
  return (e?.code ?? e?.cause?.code) === "23503";
}
