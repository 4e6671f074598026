import { lazy, Suspense, useId } from 'react';

/** Tiptap loads with the first form that shows this field, not with every page. */
const RichTextEditor = lazy(() => import('./rich-text-editor'));

/** Props of RichTextField. */
export interface RichTextFieldProps {
  label: string;
  hint?: string;
  error?: string;
  initialHtml: string;
  onChange: (html: string) => void;
}

/**
 * A labelled rich-text field (tour descriptions, record notes, pair notes): the label, a hint, an
 * error tied to the editor for screen readers, and the editor itself, loaded on first use.
 */
export function RichTextField({ label, hint, error, initialHtml, onChange }: RichTextFieldProps) {
  const id = useId();
  const ids = { label: `${id}-label`, hint: `${id}-hint`, error: `${id}-error` };
  return (
    <div className="space-y-1">
      <p id={ids.label} className="font-bold">
        {label}
      </p>
      {hint && (
        <p id={ids.hint} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={ids.error} className="text-sm font-bold text-maple">
          <span className="sr-only">Error: </span>
          {error}
        </p>
      )}
      <Suspense fallback={<div className="grid min-h-52 place-items-center rounded-md border border-edge bg-card text-ink-soft">Loading the editor…</div>}>
        <RichTextEditor
          initialHtml={initialHtml}
          onChange={onChange}
          labelId={ids.label}
          describedBy={[hint ? ids.hint : null, error ? ids.error : null].filter(Boolean).join(' ') || undefined}
          invalid={Boolean(error)}
        />
      </Suspense>
    </div>
  );
}
