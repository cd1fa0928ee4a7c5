import { ApiError } from './api-error';

export type FieldErrors = Partial<Record<string, string>>;

/** The shape of a failed zod safeParse, without importing zod into the web app. */
type ValidationFailure = { issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }> };

/** First message per top-level field, as forms show one message beside each field. */
export function fieldErrorsFromValidation(error: ValidationFailure): FieldErrors {
  const errors: FieldErrors = {};
  for (const issue of error.issues) {
    const field = String(issue.path[0] ?? '');
    errors[field] ??= issue.message;
  }
  return errors;
}

/** Field issues the server sent back, keyed like the form's field names. */
export function fieldErrorsFromApi(error: unknown): FieldErrors {
  const errors: FieldErrors = {};
  if (!(error instanceof ApiError)) return errors;
  for (const issue of error.issues) {
    const field = issue.path.split('.')[0] ?? issue.path;
    errors[field] ??= issue.message;
  }
  return errors;
}

/** A form's current values as plain strings, keyed by input name. */
export function formValues(form: HTMLFormElement): Record<string, string> {
  const values: Record<string, string> = {};
  new FormData(form).forEach((value, key) => {
    if (typeof value === 'string') values[key] = value;
  });
  return values;
}

/** Any schema with zod's safeParse, such as the shared ones in @porestack/types. */
export type SafeParser<T> = {
  safeParse: (value: unknown) => { success: true; data: T } | { success: false; error: ValidationFailure };
};

/** Checks a form with the same shared schema the API uses; either the parsed values or one message per field. */
export function validate<T>(
  schema: SafeParser<T>,
  values: unknown,
): { ok: true; data: T } | { ok: false; errors: FieldErrors } {
  const result = schema.safeParse(values);
  return result.success ? { ok: true, data: result.data } : { ok: false, errors: fieldErrorsFromValidation(result.error) };
}

/** Moves the cursor to the first field with a message, so a keyboard user lands on what to fix. */
export function focusFirstInvalid(form: HTMLFormElement, errors: FieldErrors): void {
  const first = Array.from(form.elements).find(
    (element): element is HTMLInputElement | HTMLSelectElement =>
      (element instanceof HTMLInputElement || element instanceof HTMLSelectElement) && errors[element.name] !== undefined,
  );
  first?.focus();
}
