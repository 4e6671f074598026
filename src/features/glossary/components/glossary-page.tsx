import { useEffect, useId, useState } from 'react';
import { Link, useSearchParams } from 'react-router';
import type { GlossaryEntry } from '@shared/schemas/glossary';
import { Badge } from '@/components/badge';
import { Button } from '@/components/button';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { HearItButton } from '@/components/hear-it-button';
import { useDocumentTitle } from '@/components/page';
import { Loading, Spinner } from '@/components/spinner';
import { isHepburn } from '@shared/names/hepburn';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { clockText, tourMomentHref } from '@/lib/tour-moment';
import { useGlossary } from '../api/glossary-api';
import { letterBar, letterParam, matchNote, spokenSummary, variantsText } from '../lib/glossary-words';
import './glossary-print.css';

function Entry({ entry }: { entry: GlossaryEntry }) {
  const guide = entry.pronunciation ?? entry.respelling;
  const variants = variantsText(entry.variants);
  const note = matchNote(entry.match);
  const first = entry.spoken.first;
  return (
    <article aria-labelledby={`g-${entry.id}`} className="glossary-entry mb-4 rounded-lg border border-rule bg-card p-4 shadow-leaf">
      <h3 id={`g-${entry.id}`} className="text-lg leading-snug">
        <Link to={`/cultivars/${entry.slug}`} className="text-ink no-underline hover:underline">
          <CultivarName record={entry} />
        </Link>
      </h3>
      <div className="mt-1 flex flex-wrap gap-1.5">
        <FictionalMark record={entry} />
        {note && <Badge tone="plain">{note}</Badge>}
      </div>
      {guide ? (
        <p className="mt-2">
          <span className="font-ui text-sm font-bold text-ink-soft">Say it: </span>
          <span className="text-lg font-bold tracking-wide">{guide}</span>
        </p>
      ) : (
        <p className="mt-2 text-sm text-ink-soft">Read as written in English.</p>
      )}
      <div className="no-print mt-2">
        <HearItButton epithet={entry.epithet} hepburn={isHepburn(entry.epithet)} respelling={entry.respelling} size="sm" label={`Hear it: ‘${entry.epithet}’`} />
      </div>
      {entry.meaning && <p className="mt-2">{entry.meaning}</p>}
      {variants && <p className="mt-2 text-sm">{variants}</p>}
      <p className="mt-2 text-sm text-ink-soft">
        {spokenSummary(entry.spoken)}
        {first && (
          <>
            {' '}
            First heard in{' '}
            <Link to={tourMomentHref(first.tourId, first.startMs)} className="font-bold">
              {first.tourTitle} at {clockText(first.startMs)}
            </Link>
            .
          </>
        )}
      </p>
    </article>
  );
}

/** Entries under letter headings, in the order the server sent them (A–Z within each letter). */
function byLetter(items: readonly GlossaryEntry[]): { letter: string; items: GlossaryEntry[] }[] {
  const groups: { letter: string; items: GlossaryEntry[] }[] = [];
  for (const item of items) {
    const last = groups[groups.length - 1];
    if (last && last.letter === item.letter) last.items.push(item);
    else groups.push({ letter: item.letter, items: [item] });
  }
  return groups;
}

/** /glossary — the A–Z of accepted names with how to say them, what they mean and where they are said; printable. */
export function GlossaryPage() {
  useDocumentTitle('Glossary of cultivar names');
  const [params, setParams] = useSearchParams();
  const letter = letterParam(params.get('letter'));
  const qParam = (params.get('q') ?? '').trim();
  const [text, setText] = useState(qParam);
  const q = useDebouncedValue(text.trim(), 300);
  const glossary = useGlossary(q, letter);
  const searchId = useId();

  // The typed search goes into the address (replacing the entry), so a reload or a shared link keeps it.
  useEffect(() => {
    if (q === qParam) return;
    const next = new URLSearchParams(params);
    if (q) next.set('q', q);
    else next.delete('q');
    setParams(next, { replace: true });
  }, [q, qParam, params, setParams]);

  const hrefFor = (l: string) => {
    const next = new URLSearchParams();
    if (qParam) next.set('q', qParam);
    if (l) next.set('letter', l);
    const s = next.toString();
    return s ? `/glossary?${s}` : '/glossary';
  };

  let body;
  if (glossary.isPending) body = <Loading label="Loading the glossary…" />;
  else if (glossary.isError) body = <ErrorState title="The glossary could not be loaded" error={glossary.error} onRetry={() => void glossary.refetch()} />;
  else if (glossary.data.items.length === 0) {
    body = (
      <EmptyState title={q ? `No name sounds or looks like “${q}”${letter ? ` under ${letter}` : ''}.` : letter ? `No names under ${letter}.` : 'The glossary is empty.'}>
        {q || letter ? (
          <p>
            Try another spelling, or <Link to="/glossary">show every name</Link>.
          </p>
        ) : (
          <p>Names appear here once their records are approved.</p>
        )}
      </EmptyState>
    );
  } else if (q) {
    body = (
      <div className="glossary-columns sm:columns-2 sm:gap-6">
        {glossary.data.items.map((e) => (
          <Entry key={e.id} entry={e} />
        ))}
      </div>
    );
  } else {
    body = (
      <div className="glossary-columns sm:columns-2 sm:gap-6">
        {byLetter(glossary.data.items).map((g) => (
          <section key={g.letter} aria-labelledby={`letter-${g.letter}`}>
            <h2 id={`letter-${g.letter}`} className="glossary-letter mb-2 border-b-2 border-moss text-2xl text-moss-deep">
              {g.letter}
            </h2>
            {g.items.map((e) => (
              <Entry key={e.id} entry={e} />
            ))}
          </section>
        ))}
      </div>
    );
  }

  const bar = glossary.data ? letterBar(glossary.data.letters) : [];
  return (
    <div className="glossary-print mx-auto w-full max-w-6xl px-4 py-8 sm:px-6 sm:py-12">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <h1 className="text-3xl text-moss-deep sm:text-4xl">Glossary of cultivar names</h1>
          <p className="mt-3 max-w-prose text-lg text-ink-soft">
            Every accepted name, how to say it, what it means, how it gets misheard — and where a tour says it.
          </p>
        </div>
        <Button variant="secondary" className="no-print" onClick={() => window.print()}>
          Print the glossary
        </Button>
      </div>

      <div className="no-print mt-6 space-y-4">
        <div>
          <label htmlFor={searchId} className="block font-bold">
            Search the names
          </label>
          <p id={`${searchId}-hint`} className="text-sm text-ink-soft">
            Type it as you heard it: misspellings and sound-alikes are found too.
          </p>
          <div className="mt-1 flex max-w-xl items-center gap-2">
            <input id={searchId} type="search" value={text} onChange={(e) => setText(e.target.value)} aria-describedby={`${searchId}-hint`} autoComplete="off" className="block w-full rounded-md border border-edge bg-card px-3 py-2 text-base" />
            {glossary.isFetching && <Spinner className="size-5 text-moss" />}
          </div>
        </div>
        <nav aria-label="Names by first letter">
          <ul className="flex flex-wrap gap-1 font-ui">
            <li>
              <Link to={hrefFor('')} aria-current={letter === '' ? 'page' : undefined} className={`grid h-10 min-w-10 place-items-center rounded-md px-2 text-sm font-bold no-underline ${letter === '' ? 'bg-moss text-card hover:text-card' : 'border border-rule bg-card text-moss'}`}>
                All
              </Link>
            </li>
            {bar.map((l) => (
              <li key={l.letter}>
                {l.count > 0 ? (
                  <Link
                    to={hrefFor(l.letter)}
                    aria-current={letter === l.letter ? 'page' : undefined}
                    aria-label={`${l.letter}, ${l.count} name${l.count === 1 ? '' : 's'}`}
                    className={`grid h-10 min-w-10 place-items-center rounded-md px-2 text-sm font-bold no-underline ${letter === l.letter ? 'bg-moss text-card hover:text-card' : 'border border-rule bg-card text-moss hover:bg-moss-wash'}`}
                  >
                    {l.letter}
                  </Link>
                ) : (
                  <span aria-disabled="true" aria-label={`${l.letter}, no names`} className="grid h-10 min-w-10 place-items-center rounded-md px-2 text-sm text-ink-soft/70 line-through decoration-rule">
                    {l.letter}
                  </span>
                )}
              </li>
            ))}
          </ul>
        </nav>
      </div>

      <div className="mt-8">{body}</div>
      <p className="mt-6 text-sm text-ink-soft">Names marked “Invented for the demo” belong to Grovewalk’s fictional garden club and are not real cultivars.</p>
    </div>
  );
}
