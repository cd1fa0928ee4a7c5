import type { z } from 'zod';
import { DomainError, type FieldIssue } from '../errors/domain-error.js';

/**
 * Validates a request body, query or params object with a shared schema and returns the
 * parsed value (Express 5's `req.query` is read-only, so nothing is written back).
 * @throws DomainError `validation_failed` listing each field's problem.
 */
export function parse<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const issues: FieldIssue[] = result.error.issues.flatMap((issue) => fieldIssues(issue, []));
  const first = issues[0];
  const summary = issues.length === 1 && first
    ? `${first.path ? `${first.path}: ` : ''}${first.message}`
    : `${issues.length} fields need attention: ${issues.map((i) => i.path || 'request').join(', ')}.`;
  throw new DomainError('validation_failed', `The request was not accepted. ${summary}`, issues);
}

/**
 * A zod issue as field issues. A union that matched no branch is answered with the issues
 * of the branch that came closest (fewest issues), each at its own path, rather than one
 * "Invalid input" for the whole union — every refusal names the field that is wrong.
 */
function fieldIssues(issue: z.core.$ZodIssue, parentPath: PropertyKey[]): FieldIssue[] {
  const path = [...parentPath, ...issue.path];
  if (issue.code === 'invalid_union' && issue.errors.length > 0) {
    const closest = issue.errors.reduce((best, branch) => (branch.length < best.length ? branch : best));
    if (closest.length > 0) return closest.flatMap((inner) => fieldIssues(inner, path));
  }
  return [{ path: path.map(String).join('.'), message: issue.message }];
}
