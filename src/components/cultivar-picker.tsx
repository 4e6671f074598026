import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { useEffect, useId, useRef, useState } from 'react';
import { pageOf } from '@shared/schemas/common';
import { cultivarSummarySchema } from '@shared/schemas/cultivars';
import { glossaryResponseSchema } from '@shared/schemas/glossary';
import { api, errorMessage } from '@/lib/api';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { Button } from './button';
import { CultivarName, FictionalMark } from './cultivar-name';
import { Spinner } from './spinner';

/** What the picker hands back: enough to name the record and to send its id. */
export interface PickedCultivar {
  id: number;
  slug: string;
  acceptedName: string;
  epithet: string;
  nameSegments: { text: string; italic: boolean }[];
  fictional: boolean;
}

const PICKER_SIZE = 8;
const pickerKeys = {
  all: ['cultivar-picker'] as const,
  search: (q: string) => [...pickerKeys.all, 'search', q] as const,
};

/**
 * Approved records whose name or recorded variant contains the text; when nothing contains it,
 * the glossary's fuzzy search (misspellings and sound-alikes) offers its closest names instead.
 */
async function searchRecords(q: string, signal?: AbortSignal): Promise<{ items: PickedCultivar[]; fuzzy: boolean }> {
  const page = await api.get('/api/cultivars', { query: { q, pageSize: PICKER_SIZE }, schema: pageOf(cultivarSummarySchema), signal });
  if (page.items.length > 0 || q.trim() === '') return { items: page.items, fuzzy: false };
  const glossary = await api.get('/api/glossary', { query: { q }, schema: glossaryResponseSchema, signal });
  return {
    items: glossary.items.slice(0, PICKER_SIZE).map((e) => ({ id: e.id, slug: e.slug, acceptedName: e.acceptedName, epithet: e.epithet, nameSegments: e.nameSegments, fictional: e.fictional })),
    fuzzy: true,
  };
}

/** Query options for one picker search, shared so two pickers on a page reuse the answer. */
export function cultivarPickerQueryOptions(q: string) {
  return queryOptions({ queryKey: pickerKeys.search(q), queryFn: ({ signal }) => searchRecords(q, signal), placeholderData: keepPreviousData, staleTime: 60_000 });
}

/** Props of CultivarPicker. */
export interface CultivarPickerProps {
  label: string;
  hint?: string;
  value: PickedCultivar | null;
  onChange: (record: PickedCultivar | null) => void;
  /** Records that may not be chosen here (e.g. the record being merged). */
  exclude?: readonly number[];
  /** Text the search box starts with (e.g. the misheard words). */
  initialQuery?: string;
  error?: string;
  /**
   * For building a list (side by side, with `value` left null): each result reads "Add …" with a
   * plus, and the picker stays a search box after each pick.
   */
  adds?: boolean;
}

/**
 * Choosing one approved cultivar record by typing part of its name: results are buttons, the
 * choice is shown with a way to change it. Used wherever a form needs "which record?".
 */
export function CultivarPicker({ label, hint, value, onChange, exclude = [], initialQuery = '', error, adds = false }: CultivarPickerProps) {
  const id = useId();
  const [text, setText] = useState(initialQuery);
  const typed = useRef(false);
  // Until the reader types here, the search follows the text the form suggests.
  useEffect(() => {
    if (!typed.current) setText(initialQuery);
  }, [initialQuery]);
  const q = useDebouncedValue(text.trim(), 250);
  const search = useQuery({ ...cultivarPickerQueryOptions(q), enabled: value === null });
  const items = (search.data?.items ?? []).filter((c) => !exclude.includes(c.id));

  if (value) {
    return (
      <div>
        <p className="font-bold" id={`${id}-label`}>
          {label}
        </p>
        <div className="mt-1 flex flex-wrap items-center gap-3 rounded-md border border-moss bg-moss-wash px-3 py-2" aria-labelledby={`${id}-label`} role="group">
          <span className="flex-1">
            <span className="sr-only">Chosen: </span>
            <CultivarName record={value} /> <FictionalMark record={value} />
          </span>
          <Button variant="quiet" size="sm" onClick={() => onChange(null)}>
            Choose another
          </Button>
        </div>
        {error && <p className="mt-1 text-sm font-bold text-maple">{error}</p>}
      </div>
    );
  }

  return (
    <div>
      <label htmlFor={`${id}-q`} className="block font-bold">
        {label}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      <input
        id={`${id}-q`}
        type="search"
        value={text}
        onChange={(e) => {
          typed.current = true;
          setText(e.target.value);
        }}
        aria-describedby={`${hint ? `${id}-hint ` : ''}${id}-status`}
        aria-invalid={error ? true : undefined}
        autoComplete="off"
        className={`mt-1 block w-full rounded-md border bg-card px-3 py-2 text-base ${error ? 'border-2 border-maple' : 'border-edge'}`}
      />
      {error && <p className="mt-1 text-sm font-bold text-maple">{error}</p>}
      <p id={`${id}-status`} role="status" className="mt-2 flex items-center gap-2 text-sm text-ink-soft">
        {search.isFetching && <Spinner className="size-4" />}
        {search.isError
          ? null
          : search.isPending
            ? 'Looking…'
            : items.length === 0
              ? q
                ? `No record matches “${q}”.`
                : 'No records to choose from.'
              : search.data?.fuzzy
                ? `No name contains “${q}”; these sound or look close:`
                : `${items.length} record${items.length === 1 ? '' : 's'}${q ? ` for “${q}”` : ''}; choose one.`}
      </p>
      {search.isError && (
        <p role="alert" className="text-sm font-bold text-maple">
          {errorMessage(search.error)}
        </p>
      )}
      {items.length > 0 && (
        <ul className="mt-1 max-h-72 divide-y divide-rule overflow-y-auto rounded-md border border-rule bg-card">
          {items.map((c) => (
            <li key={c.id}>
              <button type="button" onClick={() => onChange(c)} className="flex min-h-11 w-full flex-wrap items-center gap-2 px-3 py-2 text-left hover:bg-moss-wash">
                {adds && (
                  <span aria-hidden="true" className="font-bold text-moss">
                    +
                  </span>
                )}
                <span className="sr-only">{adds ? 'Add ' : 'Choose '}</span>
                <span className="flex-1">
                  <CultivarName record={c} />
                </span>
                <FictionalMark record={c} />
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
