import type { ReactNode } from 'react';
import { Link, useLocation } from 'react-router';
import { hasRole } from '@shared/schemas/common';
import type { CultivarFull } from '@shared/schemas/cultivars';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { FormSuccess } from '@/components/form-error';
import { ErrorState } from '@/components/error-state';
import { Page, useDocumentTitle } from '@/components/page';
import { Loading } from '@/components/spinner';
import { isApiError } from '@/lib/api';
import { useMe } from '@/lib/auth';
import { useReaderPrefs } from '@/features/preferences/hooks/use-reader-prefs';
import { WhereToSeeIt } from '@/features/watch/components/where-to-see-it';
import { richTextClasses } from '@/lib/rich-text';
import { useCultivar, useLookalikes } from '../api/cultivars-api';
import { ModeratorTools } from './moderator-tools';
import { PronunciationBlock } from './pronunciation-block';
import { StatusBadge } from './record-badges';
import { TraitList } from './trait-list';

function Section({ id, title, children, className = '' }: { id: string; title: string; children: ReactNode; className?: string }) {
  return (
    <section aria-labelledby={id} className={`mt-10 ${className}`}>
      <h2 id={id} className="text-2xl text-moss-deep">
        {title}
      </h2>
      <div className="mt-3">{children}</div>
    </section>
  );
}

function UnitSwitch() {
  const { prefs, setUnitSystem } = useReaderPrefs();
  return (
    <fieldset className="flex flex-wrap items-center gap-2 font-ui text-sm">
      <legend className="sr-only">Units for sizes</legend>
      <span aria-hidden="true" className="font-bold text-ink-soft">
        Sizes in
      </span>
      {(['metric', 'imperial'] as const).map((s) => (
        <label key={s} className={`cursor-pointer rounded-full border px-3 py-1 font-bold has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-focus ${prefs.unitSystem === s ? 'border-moss bg-moss text-card' : 'border-edge bg-card text-ink'}`}>
          <input type="radio" name="unit-system" value={s} checked={prefs.unitSystem === s} onChange={() => setUnitSystem(s)} className="sr-only" />
          {s === 'metric' ? 'metres' : 'feet'}
        </label>
      ))}
    </fieldset>
  );
}

function Lookalikes({ record }: { record: CultivarFull }) {
  const look = useLookalikes(record.slug, record.status === 'approved');
  if (record.status !== 'approved') return <p className="text-ink-soft">Look-alikes are listed once the record is approved.</p>;
  if (look.isPending) return <Loading label="Finding look-alikes…" />;
  if (look.isError) return <p className="text-ink-soft">Look-alikes could not be loaded just now.</p>;
  if (look.data.items.length === 0) return <p className="text-ink-soft">No look-alikes on record yet.</p>;
  return (
    <ul className="divide-y divide-rule rounded-lg border border-rule bg-card">
      {look.data.items.map(({ cultivar }) => (
        <li key={cultivar.id} className="px-4 py-3">
          <Link to={`/cultivars/${cultivar.slug}`} className="font-bold">
            <CultivarName record={cultivar} />
          </Link>
          <div className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1">
            <Link to={`/compare?ids=${record.id},${cultivar.id}`} className="font-ui text-sm font-bold">
              See side by side<span className="sr-only"> with ‘{cultivar.epithet}’</span>
            </Link>
            <FictionalMark record={cultivar} />
          </div>
        </li>
      ))}
    </ul>
  );
}

function CareBox({ record }: { record: CultivarFull }) {
  return (
    <aside aria-label="Safety" className="rounded-md border-l-4 border-ochre bg-ochre-wash px-4 py-3 text-ink">
      <p className="font-bold">Before you act on growing advice</p>
      {record.careNote ? (
        // The note for the advice in these notes already ends with the general caution.
        <p className="mt-1">{record.careNote.includes(record.careCaution) ? record.careNote : `${record.careNote} ${record.careCaution}`}</p>
      ) : (
        <p className="mt-1">{record.careCaution}</p>
      )}
    </aside>
  );
}

function RecordView({ record }: { record: CultivarFull }) {
  const { data: me } = useMe();
  const { prefs } = useReaderPrefs();
  useDocumentTitle(`'${record.epithet}'`);
  const moderator = hasRole(me?.role, 'moderator');
  // Only the proposer and moderators can see a proposal at all, so an author seeing one proposed it.
  const canAddPhotos = moderator || (record.status === 'proposed' && hasRole(me?.role, 'author'));
  const notice = (useLocation().state as { notice?: unknown } | null)?.notice;

  return (
    <div className="mx-auto w-full max-w-6xl px-4 py-8 sm:px-6 sm:py-12">
      <nav aria-label="Breadcrumb" className="mb-3 font-ui text-sm">
        <Link to="/cultivars">Cultivar records</Link> <span aria-hidden="true">›</span> <span>‘{record.epithet}’</span>
      </nav>
      {typeof notice === 'string' && (
        <div className="mb-4">
          <FormSuccess>{notice}</FormSuccess>
        </div>
      )}
      {record.mergedInto && (
        <p role="note" className="mb-4 rounded-md border-l-4 border-bark bg-bark-wash px-4 py-3">
          This record was merged into <Link to={`/cultivars/${record.mergedInto.slug}`}>{record.mergedInto.acceptedName}</Link>, which holds its tours, variants and photos now.
        </p>
      )}
      <header>
        <h1 className="text-3xl text-moss-deep sm:text-4xl">
          <CultivarName record={record} />
        </h1>
        <div className="mt-3 flex flex-wrap items-center gap-2">
          <FictionalMark record={record} />
          <StatusBadge status={record.status} />
          {record.groupName && <span className="font-ui text-sm text-ink-soft">Cultivar Group: {record.groupName}</span>}
        </div>
      </header>

      <div className="mt-8 grid gap-8 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="order-2 min-w-0 lg:order-1">
          {record.meaning && (
            <section aria-labelledby="meaning">
              <h2 id="meaning" className="text-xl text-moss-deep">
                What the name means
              </h2>
              <p className="mt-2 max-w-prose text-lg">{record.meaning}</p>
            </section>
          )}

          <Section id="traits" title="How it grows">
            <div className="mb-3">
              <UnitSwitch />
            </div>
            <TraitList traits={record.traits} system={prefs.unitSystem} />
          </Section>

          <Section id="notes" title="Notes">
            {record.notesHtml.trim() ? (
              // notesHtml is sanitised by the server (tags and attributes on an allow-list).
              <div className={richTextClasses} dangerouslySetInnerHTML={{ __html: record.notesHtml }} />
            ) : (
              <p className="text-ink-soft">No notes yet.</p>
            )}
            <div className="mt-4 max-w-prose">
              <CareBox record={record} />
            </div>
          </Section>

          <Section id="where" title="Where to see it">
            <WhereToSeeIt slug={record.slug} />
          </Section>
        </div>

        {/* On a phone, how to say the name comes first; on a wide screen it sits beside the traits. */}
        <div className="order-1 min-w-0 space-y-8 lg:order-2">
          <PronunciationBlock record={record} />

          <section aria-labelledby="variants">
            <h2 id="variants" className="text-xl text-moss-deep">
              Also written or heard as
            </h2>
            {record.variants.length ? (
              <ul className="mt-2 flex flex-wrap gap-2">
                {record.variants.map((v) => (
                  <li key={v.id} className="rounded-full border border-rule bg-card px-3 py-0.5">
                    {v.text}
                  </li>
                ))}
              </ul>
            ) : (
              <p className="mt-2 text-ink-soft">No name variants recorded.</p>
            )}
            <p className="mt-2 text-sm text-ink-soft">Search finds the tree by any of these; they are never shown as its name.</p>
          </section>

          <section aria-labelledby="lookalikes">
            <h2 id="lookalikes" className="text-xl text-moss-deep">
              Easily confused with
            </h2>
            <div className="mt-2">
              <Lookalikes record={record} />
            </div>
          </section>
        </div>
      </div>

      <Section id="photos" title="Photos">
        {record.photos.length ? (
          <ul className="grid grid-cols-2 gap-4 md:grid-cols-3 lg:grid-cols-4">
            {record.photos.map((p) => (
              <li key={p.id}>
                <figure>
                  <a href={p.url} className="block">
                    <img src={p.thumbUrl} alt={p.altText} width={p.thumbWidth} height={p.thumbHeight} loading="lazy" className="aspect-[4/3] w-full rounded-md border border-rule object-cover" />
                  </a>
                  <figcaption className="mt-1 text-sm text-ink-soft">{p.altText}</figcaption>
                </figure>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-ink-soft">No photos yet.</p>
        )}
      </Section>

      {(moderator || canAddPhotos) && (
        <Section id="tools" title={moderator ? 'Moderator tools' : 'Your proposal'}>
          <ModeratorTools record={record} moderator={moderator} />
        </Section>
      )}
    </div>
  );
}

/** /cultivars/:slug — the record page. */
export function CultivarRecordPage({ slug }: { slug: string }) {
  const record = useCultivar(slug);
  if (record.isPending) {
    return (
      <div className="mx-auto max-w-6xl px-4 sm:px-6">
        <Loading label="Loading the record…" />
      </div>
    );
  }
  if (record.isError) {
    if (isApiError(record.error) && record.error.status === 404) {
      return (
        <Page title="No such cultivar record">
          <p>There is no record at this address. It may still be waiting for approval, or the name is spelt differently.</p>
          <p className="mt-4">
            <Link to="/cultivars">Search the cultivar records</Link> or <Link to="/glossary">browse the glossary</Link>.
          </p>
        </Page>
      );
    }
    return (
      <div className="mx-auto max-w-3xl px-4 sm:px-6">
        <ErrorState title="The record could not be loaded" error={record.error} onRetry={() => void record.refetch()} />
      </div>
    );
  }
  return <RecordView record={record.data} />;
}
