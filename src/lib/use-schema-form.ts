import { useCallback, useState, type FormEvent } from 'react';
import type { z } from 'zod';
import { isApiError } from './api';
import { checkForm, focusFirstError, formValues, type FieldErrors } from './form';

/**
 * Submit handling shared by every form: read the fields, check them with the shared schema, show
 * the schema's messages beside the fields (focusing the first), and only send valid data.
 * `showServerErrors` puts the server's per-field hints in the same place.
 */
export function useSchemaForm<S extends z.ZodType>(schema: S, onValid: (data: z.output<S>, form: HTMLFormElement) => void) {
  const [errors, setErrors] = useState<FieldErrors>({});

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const form = event.currentTarget;
    const checked = checkForm(schema, formValues(form));
    if (!checked.ok) {
      setErrors(checked.errors);
      focusFirstError(form, checked.errors);
      return;
    }
    setErrors({});
    onValid(checked.data, form);
  };

  const showServerErrors = useCallback((error: unknown) => {
    if (isApiError(error) && Object.keys(error.fields).length > 0) setErrors({ ...error.fields });
  }, []);

  return { errors, onSubmit, showServerErrors, clearErrors: () => setErrors({}) };
}
