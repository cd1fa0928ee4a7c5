import { useState, type FormEvent } from 'react';
import { fieldErrorsFromApi, focusFirstInvalid, formValues, validate, type FieldErrors, type SafeParser } from './form-errors';

type SchemaFormOptions<T> = {
  /** What the schema is given, from the inputs' strings: numbers parsed, state kept outside the inputs added. By default the strings as they are. */
  toValues?: (values: Record<string, string>) => unknown;
  /**
   * Rules the shared schema cannot know, such as a repeated password. Given the inputs and the
   * schema's messages, it returns the messages to show; the form is sent only when the schema
   * passes and this returns none.
   */
  check?: (values: Record<string, string>, schemaErrors: FieldErrors) => FieldErrors;
  /** The last failed request: its field issues are shown beside the fields, under the form's own messages. */
  serverError?: unknown;
  /** Called with the parsed values once everything passes; the form is there for a reset after sending. */
  onValid: (data: NoInfer<T>, form: HTMLFormElement) => void;
};

/**
 * A form checked with the same shared schema the API uses: on submit, either one message per
 * field (the cursor moved to the first) or the parsed values handed to `onValid`.
 */
export function useSchemaForm<T>(schema: SafeParser<T>, { toValues, check, serverError, onValid }: SchemaFormOptions<T>) {
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const form = event.currentTarget;
    const values = formValues(form);
    const result = validate(schema, toValues ? toValues(values) : values);
    const schemaErrors = result.ok ? {} : result.errors;
    const errors = check ? check(values, schemaErrors) : schemaErrors;
    if (!result.ok || Object.keys(errors).length > 0) {
      setClientErrors(errors);
      focusFirstInvalid(form, errors);
      return;
    }
    setClientErrors({});
    onValid(result.data, form);
  };

  // The person's latest attempt wins over what the server said about an earlier one.
  return { errors: { ...fieldErrorsFromApi(serverError), ...clientErrors }, onSubmit };
}
