import { Link, useSearchParams } from 'react-router';
import type { TourDto } from '@shared/schemas/tours';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { useDocumentTitle } from '@/components/page';
import { Loading } from '@/components/spinner';
import { isApiError } from '@/lib/api';
import { clockText, tourMomentHref } from '@/lib/tour-moment';
import { useTracks, useTranscript } from '../api/captions-api';
import { languageName } from './language-fields';
import { TranscriptFlagButton } from '@/features/spelling/components/transcript-flag-button';
import './transcript-print.css';

/**
 * A tour's captions as readable paragraphs, each opening with its time as a link to that moment
 * of the tour; a language picker when there are several tracks; prints without the site's frame.
 * Public for published tours (the server decides who may see the tour).
 */
export function TranscriptPage({ tour }: { tour: TourDto }) {
  const [params, setParams] = useSearchParams();
  const lang = params.get('lang');
  const tracks = useTracks(tour.id);
  const transcript = useTranscript(tour.id, lang);
  useDocumentTitle(`Transcript · ${tour.title}`);
  const list = tracks.data ?? [];
  const shownLang = transcript.data?.lang ?? lang;
  const noCaptions = transcript.isError && isApiError(transcript.error) && transcript.error.status === 404;

  return (
    <article className="gw-transcript mx-auto w-full max-w-3xl px-4 py-8 sm:px-6 sm:py-12" lang={shownLang ?? undefined}>
      <p className="font-ui text-sm print:hidden">
        <Link to={`/tours/${tour.id}`}>
          <span aria-hidden="true">← </span>Watch the tour
        </Link>
      </p>
      <h1 className="mt-1 text-3xl text-moss-deep sm:text-4xl" lang="en">
        Transcript
      </h1>
      <p className="mt-1 text-lg text-ink-soft" lang="en">
        {tour.title}
        {tour.garden ? ` — ${tour.garden}` : ''}
      </p>

      <div className="mt-5 flex flex-wrap items-end gap-3 print:hidden" lang="en">
        {list.length > 1 && (
          <div className="space-y-1">
            <label htmlFor="transcript-lang" className="block text-sm font-bold">
              Language
            </label>
            <select
              id="transcript-lang"
              value={shownLang ?? ''}
              onChange={(e) => setParams({ lang: e.target.value }, { replace: true })}
              className="block rounded-md border border-edge bg-card px-3 py-2 text-base"
            >
              {list.map((t) => (
                <option key={t.id} value={t.lang}>
                  {t.label} — {languageName(t.lang)}
                </option>
              ))}
            </select>
          </div>
        )}
        <Button size="sm" variant="secondary" onClick={() => window.print()} disabled={!transcript.data}>
          Print
        </Button>
        <TranscriptFlagButton tourId={tour.id} lang={shownLang} />
        <p className="w-full text-sm text-ink-soft">Each time opens the tour at that moment.</p>
      </div>

      <div className="mt-6" lang={shownLang ?? undefined}>
        {transcript.isPending ? (
          <Loading label="Loading the transcript…" />
        ) : noCaptions ? (
          <EmptyState title={lang ? `No captions in “${lang}”` : 'No captions yet'}>This tour has no captions{lang ? ' in that language' : ''}, so there is no transcript to read.</EmptyState>
        ) : transcript.isError ? (
          <ErrorState title="The transcript could not be loaded" error={transcript.error} onRetry={() => void transcript.refetch()} />
        ) : transcript.data.paragraphs.length === 0 ? (
          <EmptyState title="The captions are empty">The caption track has no cues yet.</EmptyState>
        ) : (
          <div className="space-y-5 text-lg leading-relaxed">
            {transcript.data.paragraphs.map((p) => (
              <p key={p.startMs}>
                <Link to={tourMomentHref(tour.id, p.startMs)} className="mr-2 font-ui text-sm font-bold tabular-nums" lang="en">
                  <span className="sr-only">Watch from </span>
                  {clockText(p.startMs)}
                </Link>
                {p.text}
              </p>
            ))}
          </div>
        )}
      </div>
    </article>
  );
}
