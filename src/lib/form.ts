import type { z } from 'zod';

/** Field name → the message shown under that field. */
export type FieldErrors = Record<string, string>;

/** The first message per field, in the schema's own words, so client and server read the same. */
export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const errors: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.map(String).join('.') : '_form';
    if (!(key in errors)) errors[key] = issue.message;
  }
  return errors;
}

/** Result of checking a form before sending it: typed data, or messages per field. */
export type Checked<T> = { ok: true; data: T } | { ok: false; errors: FieldErrors };

/** Checks form values with the same shared zod schema the server validates with. */
export function checkForm<S extends z.ZodType>(schema: S, values: unknown): Checked<z.output<S>> {
  const result = schema.safeParse(values);
  return result.success ? { ok: true, data: result.data } : { ok: false, errors: fieldErrorsOf(result.error) };
}

/** Plain string values of a submitted form (files and repeated names are not used by our forms). */
export function formValues(form: HTMLFormElement): Record<string, string> {
  const values: Record<string, string> = {};
  new FormData(form).forEach((value, key) => {
    if (typeof value === 'string') values[key] = value;
  });
  return values;
}

/** Moves focus to the first field with a message, so the reader hears what to fix. */
export function focusFirstError(form: HTMLFormElement, errors: FieldErrors): void {
  for (const element of Array.from(form.elements)) {
    const name = (element as HTMLInputElement).name;
    if (name && name in errors && element instanceof HTMLElement) {
      element.focus();
      return;
    }
  }
}
