/** One changed field as the activity log keeps it: what it was and what it became. */
export interface FieldChange {
  field: string;
  from: unknown;
  to: unknown;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/**
 * The fields of `after` whose value differs from `before`, old → new, for the audit entry of an
 * edit (`details.changes`), so the activity page can say which field changed and how.
 * Fields left undefined in `after` were not sent and are not changes.
 */
export function fieldChanges(before: Record<string, unknown>, after: Record<string, unknown>): FieldChange[] {
  return Object.entries(after)
    .filter(([field, value]) => value !== undefined && !same(before[field], value))
    .map(([field, value]) => ({ field, from: before[field] ?? null, to: value }));
}
