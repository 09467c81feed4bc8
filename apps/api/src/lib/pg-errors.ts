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
