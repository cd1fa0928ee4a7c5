/**
 * Form inputs give strings; the shared schemas want numbers. An empty field becomes null (or
 * undefined), a comma decimal is accepted, and anything else stays as text so the schema's own
 * message ("Enter the … as a number") reaches the person.
 */
export function numberOrNull(value: string | undefined): number | string | null {
  const trimmed = (value ?? '').trim();
  if (trimmed === '') return null;
  const parsed = Number(trimmed.replace(',', '.'));
  return Number.isFinite(parsed) ? parsed : trimmed;
}

export function numberOrUndefined(value: string | undefined): number | string | undefined {
  const parsed = numberOrNull(value);
  return parsed === null ? undefined : parsed;
}
