import { useId, useState } from 'react';
import type { TrackDto } from '@shared/schemas/captions';
import { checkLanguageTag, LANGUAGE_CHOICES, sameLanguage, suggestedLabel } from '../lib/languages';

const OTHER = '__other__';

/** The state of a language + label pair of fields, with the check the form runs before sending. */
export interface LanguageFieldsState {
  choice: string;
  other: string;
  label: string;
  errors: { lang?: string; label?: string };
  setChoice: (choice: string) => void;
  setOther: (other: string) => void;
  setLabel: (label: string) => void;
  /** Shows server messages per field (e.g. an unknown language). */
  setErrors: (errors: { lang?: string; label?: string }) => void;
  /** The tag and label when both are acceptable; otherwise null, with the messages set. */
  check: () => { lang: string; label: string } | null;
}

/** State for LanguageFields; a listed tag starts selected, anything else starts as typed text. */
export function useLanguageFields(initial: { lang: string; label: string }): LanguageFieldsState {
  const listed = LANGUAGE_CHOICES.find((c) => sameLanguage(c.tag, initial.lang));
  const [choice, setChoiceRaw] = useState(listed ? listed.tag : OTHER);
  const [other, setOther] = useState(listed ? '' : initial.lang);
  const [label, setLabelRaw] = useState(initial.label);
  const [touched, setTouched] = useState(false);
  const [errors, setErrors] = useState<{ lang?: string; label?: string }>({});

  const tag = choice === OTHER ? other.trim() : choice;
  return {
    choice,
    other,
    label,
    errors,
    setChoice: (next) => {
      setChoiceRaw(next);
      setErrors((e) => ({ ...e, lang: undefined }));
      if (!touched && next !== OTHER) setLabelRaw(suggestedLabel(next));
    },
    setOther: (next) => {
      setOther(next);
      setErrors((e) => ({ ...e, lang: undefined }));
      if (!touched) setLabelRaw(suggestedLabel(next));
    },
    setLabel: (next) => {
      setTouched(true);
      setLabelRaw(next);
      setErrors((e) => ({ ...e, label: undefined }));
    },
    setErrors,
    check: () => {
      const next: { lang?: string; label?: string } = {};
      const langProblem = checkLanguageTag(tag);
      if (langProblem) next.lang = tag === '' ? 'Type a language tag, e.g. "en" or "pt-BR".' : langProblem;
      if (label.trim() === '') next.label = 'Give the track a label, e.g. "English".';
      setErrors(next);
      return next.lang || next.label ? null : { lang: tag, label: label.trim() };
    },
  };
}

const languageNames = typeof Intl !== 'undefined' && 'DisplayNames' in Intl ? new Intl.DisplayNames(['en'], { type: 'language', fallback: 'none' }) : null;

/** "English (en-GB)": a tag with its English name, when the browser knows it. */
export function languageName(tag: string): string {
  let name: string | undefined;
  try {
    name = languageNames?.of(tag);
  } catch {
    name = undefined;
  }
  return name ? `${name} (${tag})` : tag;
}

/**
 * The language of a caption track — a few common BCP 47 tags or any other typed in — and the
 * label viewers see for it. Languages that already have a track say so in the list.
 */
export function LanguageFields({ state, tracks }: { state: LanguageFieldsState; tracks: readonly TrackDto[] }) {
  const id = useId();
  const has = (tag: string) => tracks.some((t) => sameLanguage(t.lang, tag));
  return (
    <div className="flex flex-wrap items-start gap-x-4 gap-y-3">
      <div className="space-y-1">
        <label htmlFor={`${id}-lang`} className="block text-sm font-bold">
          Language
        </label>
        <select
          id={`${id}-lang`}
          value={state.choice}
          onChange={(e) => state.setChoice(e.target.value)}
          aria-invalid={state.errors.lang && state.choice !== OTHER ? true : undefined}
          className="block rounded-md border border-edge bg-card px-3 py-2 text-base"
        >
          {LANGUAGE_CHOICES.map((c) => (
            <option key={c.tag} value={c.tag}>
              {c.name} ({c.tag}){has(c.tag) ? ' — has a track' : ''}
            </option>
          ))}
          <option value={OTHER}>Another language…</option>
        </select>
      </div>
      {state.choice === OTHER && (
        <div className="space-y-1">
          <label htmlFor={`${id}-other`} className="block text-sm font-bold">
            Language tag (BCP 47)
          </label>
          <input
            id={`${id}-other`}
            value={state.other}
            onChange={(e) => state.setOther(e.target.value)}
            placeholder="e.g. pt-BR"
            spellCheck={false}
            autoComplete="off"
            aria-invalid={state.errors.lang ? true : undefined}
            aria-describedby={`${id}-other-hint${state.errors.lang ? ` ${id}-lang-error` : ''}`}
            className={`block w-40 rounded-md border bg-card px-3 py-2 text-base ${state.errors.lang ? 'border-2 border-maple' : 'border-edge'}`}
          />
          <p id={`${id}-other-hint`} className="text-xs text-ink-soft">
            {state.other.trim() && !checkLanguageTag(state.other.trim()) ? languageName(state.other.trim()) : 'Language, then optional script and region: "ja", "sr-Latn", "pt-BR".'}
          </p>
        </div>
      )}
      <div className="space-y-1">
        <label htmlFor={`${id}-label`} className="block text-sm font-bold">
          Label viewers see
        </label>
        <input
          id={`${id}-label`}
          value={state.label}
          maxLength={80}
          onChange={(e) => state.setLabel(e.target.value)}
          aria-invalid={state.errors.label ? true : undefined}
          aria-describedby={state.errors.label ? `${id}-label-error` : undefined}
          className={`block w-56 rounded-md border bg-card px-3 py-2 text-base ${state.errors.label ? 'border-2 border-maple' : 'border-edge'}`}
        />
        {state.errors.label && (
          <p id={`${id}-label-error`} className="text-sm font-bold text-maple">
            {state.errors.label}
          </p>
        )}
      </div>
      {state.errors.lang && (
        <p id={`${id}-lang-error`} className="w-full text-sm font-bold text-maple">
          <span className="sr-only">Error: </span>
          {state.errors.lang}
        </p>
      )}
    </div>
  );
}
