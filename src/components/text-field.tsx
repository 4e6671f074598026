import { useId, type InputHTMLAttributes, type ReactNode } from 'react';

/** Props of TextField: a visible label always, an optional hint, and the message for this field. */
export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  label: string;
  name: string;
  hint?: ReactNode;
  error?: string;
}

/**
 * A labelled input whose hint and error are tied to it with aria-describedby, so a screen reader
 * reads what to type and what went wrong when the field gets focus.
 */
export function TextField({ label, name, hint, error, className = '', type = 'text', ...input }: TextFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ') || undefined;

  return (
    <div className={`space-y-1 ${className}`}>
      <label htmlFor={id} className="block font-bold">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-bold text-maple">
          <span aria-hidden="true">!</span>
          <span>
            <span className="sr-only">Error: </span>
            {error}
          </span>
        </p>
      )}
      <input
        id={id}
        name={name}
        type={type}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={
          'block w-full rounded-md border bg-card px-3 py-2 text-base text-ink placeholder:text-ink-soft ' +
          (error ? 'border-2 border-maple' : 'border-edge')
        }
        {...input}
      />
    </div>
  );
}
