/** PostgreSQL SQLSTATE codes we turn into clear API errors (see the PostgreSQL manual, Appendix A). */
export const PG_UNIQUE_VIOLATION = '23505';
export const PG_FOREIGN_KEY_VIOLATION = '23503';
export const PG_CHECK_VIOLATION = '23514';

function codeOf(err: unknown): string | undefined {
  const e = err as { code?: unknown; cause?: { code?: unknown } };
  const code = e?.code ?? e?.cause?.code;
  return typeof code === 'string' ? code : undefined;
}

export const isUniqueViolation = (err: unknown) => codeOf(err) === PG_UNIQUE_VIOLATION;
export const PG_EXCLUSION_VIOLATION = '23P01';

export const isExclusionViolation = (err: unknown) => codeOf(err) === PG_EXCLUSION_VIOLATION;

/** The name of the constraint a failed statement broke, when PostgreSQL reported one. */
export function constraintOf(err: unknown): string | undefined {
  const e = err as { constraint_name?: unknown; cause?: { constraint_name?: unknown } };
  const name = e?.constraint_name ?? e?.cause?.constraint_name;
  return typeof name === 'string' ? name : undefined;
}
