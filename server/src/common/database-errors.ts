/** PostgreSQL SQLSTATE for a unique-constraint violation (PostgreSQL manual, Appendix A "Error Codes"). */
const uniqueViolation = '23505';

/**
 * Whether `error` (or the error it wraps: Drizzle wraps driver errors in `cause`) is a unique-constraint
 * violation, optionally of one named constraint.
 */
export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  for (let current: unknown = error, depth = 0; current && depth < 5; depth += 1) {
    if (typeof current === 'object') {
      const { code, constraint: name } = current as { code?: unknown; constraint?: unknown };
      if (code === uniqueViolation) return constraint === undefined || name === constraint;
      current = (current as { cause?: unknown }).cause;
    } else {
      return false;
    }
  }
  return false;
}
