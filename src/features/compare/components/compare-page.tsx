import { Link, useNavigate, useSearchParams } from 'react-router';
import { fitsZone, type ZoneFit } from '@shared/hardiness';
import { hasRole } from '@shared/schemas/common';
import type { CultivarSummary } from '@shared/schemas/cultivars';
import type { UnitSystem } from '@shared/units';
import { Button, buttonClasses } from '@/components/button';
import { Card } from '@/components/card';
import { ClipVideo } from '@/components/clip-video';
import { CultivarPicker } from '@/components/cultivar-picker';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { ErrorState } from '@/components/error-state';
import { Page } from '@/components/page';
import { Loading } from '@/components/spinner';
import { ZoneFitNote } from '@/components/zone-fit-badge';
import { isApiError } from '@/lib/api';
import { useMe } from '@/lib/auth';
import { colourOf } from '@/lib/trait-words';
import { clockText, tourMomentHref } from '@/lib/tour-moment';
import { GardenSettingsPanel } from '@/features/preferences/components/garden-settings';
import { useReaderPrefs } from '@/features/preferences/hooks/use-reader-prefs';
import { useCompare, type CompareResponse, type CompareRowDto } from '../api/compare-api';
import { compareHref, MAX_COMPARE, parseCompareIds } from '../lib/compare-ids';
import { formatCompareCell } from '../lib/compare-values';
import { noteFor, pairsOf } from '../lib/pair-notes';
import { PairNote } from './pair-note';

const INTRO = 'Look-alike cultivars in columns, the traits that tell them apart first, each with a clip from a tour.';

/** The epithet in single quotes, as the full names print it (ICNCP style per the RHS summary). */
function shortName(c: Pick<CultivarSummary, 'epithet'>): string {
  return `'${c.epithet}'`;
}

/** The shared record picker in its adding form: each pick puts one more record beside the others. */
function AddRecordPicker({ ids, onIds }: { ids: number[]; onIds: (next: number[]) => void }) {
  return (
    <CultivarPicker
      adds
      label="Find a cultivar record"
      hint="Type part of a name; common misspellings are found too."
      value={null}
      onChange={(c) => c && onIds([...ids, c.id])}
      exclude={ids}
    />
  );
}

function zoneFitOf(hardiness: unknown, zone: string | null, container: boolean): ZoneFit | null {
  if (!zone) return null;
  try {
    return fitsZone((hardiness ?? null) as Parameters<typeof fitsZone>[0], zone, { container });
  } catch {
    return null;
  }
}

function Cell({ row, index, system }: { row: CompareRowDto; index: number; system: UnitSystem }) {
  const value = row.values[index];
  const cell = formatCompareCell(row.trait, value, system);
  if (value === null || value === undefined) return <td className="px-3 py-2 align-top italic">Not recorded</td>;
  return (
    <td className="px-3 py-2 align-top">
      {cell.colours ? (
        <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
          {cell.colours.map((id) => {
            const c = colourOf(id);
            return (
              <span key={id} className="inline-flex items-center gap-1.5">
                <span
                  aria-hidden="true"
                  className="inline-block size-4 shrink-0 rounded-full border border-edge"
                  style={{ background: c.accentHex ? `linear-gradient(135deg, ${c.hex} 0 55%, ${c.accentHex} 55% 100%)` : c.hex }}
                />
                {c.label}
              </span>
            );
          })}
        </span>
      ) : (
        cell.text
      )}
    </td>
  );
}

function TraitTable({ rows, records, system, caption }: { rows: CompareRowDto[]; records: CompareResponse['records']; system: UnitSystem; caption: string }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-card" tabIndex={0} role="region" aria-label={caption}>
      <table className={`w-full border-collapse text-left text-sm sm:text-base ${records.length > 2 ? 'min-w-[34rem]' : ''}`}>
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b border-rule bg-paper">
            <th scope="col" className="w-1/4 px-3 py-2 font-ui text-sm">
              Trait
            </th>
            {records.map((r) => (
              <th key={r.cultivar.id} scope="col" className="px-3 py-2">
                {shortName(r.cultivar)}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.trait} className={`border-b border-rule last:border-0 ${row.differs ? 'bg-maple-wash' : ''}`}>
              <th scope="row" className={`px-3 py-2 align-top ${row.differs ? 'border-l-4 border-maple' : ''}`}>
                <span className="block">{row.label}</span>
                {row.differs ? (
                  <span className="mt-0.5 inline-block font-ui text-xs font-bold tracking-wide whitespace-nowrap text-maple uppercase">
                    <span aria-hidden="true">≠ </span>Differs
                  </span>
                ) : row.known < records.length ? (
                  <span className="mt-0.5 inline-block font-ui text-xs font-semibold text-ink-soft">Not on every record</span>
                ) : null}
              </th>
              {records.map((r, i) => (
                <Cell key={r.cultivar.id} row={row} index={i} system={system} />
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function RecordColumn({
  record,
  zone,
  container,
  onRemove,
}: {
  record: CompareResponse['records'][number];
  zone: string | null;
  container: boolean;
  onRemove?: () => void;
}) {
  const fit = zoneFitOf(record.traits?.hardiness, zone, container);
  const clip = record.clip;
  return (
    <article aria-label={record.cultivar.acceptedName} className="flex flex-col rounded-lg border border-rule bg-card p-4 shadow-leaf">
      <h2 className="text-lg leading-snug">
        <CultivarName record={record.cultivar} />
      </h2>
      <div className="mt-1">
        <FictionalMark record={record.cultivar} />
      </div>
      <div className="mt-3">
        {clip ? (
          <>
            <ClipVideo videoUrl={clip.videoUrl} posterUrl={clip.posterUrl} startMs={clip.startMs} endMs={clip.endMs} label={`Clip of ${record.cultivar.acceptedName}`} />
            <p className="mt-1 text-sm">
              From <Link to={tourMomentHref(clip.tourId, clip.startMs)}>{clip.tourTitle}</Link> <span className="tabular-nums">at {clockText(clip.startMs)}</span>
            </p>
          </>
        ) : (
          <p className="grid aspect-video place-items-center rounded-md border border-dashed border-edge bg-paper p-3 text-center text-sm text-ink-soft">
            Not in a published tour yet.
          </p>
        )}
      </div>
      {fit && (
        <ZoneFitNote fit={fit} zone={zone} className="mt-3 text-sm" />
      )}
      <div className="mt-auto flex flex-wrap items-center gap-3 pt-3">
        <Link to={`/cultivars/${record.cultivar.slug}`} className="font-bold">
          Cultivar record<span className="sr-only">: {record.cultivar.acceptedName}</span>
        </Link>
        {onRemove && (
          <Button variant="quiet" size="sm" onClick={onRemove}>
            <span>
              Remove<span className="sr-only"> {record.cultivar.acceptedName}</span> from the comparison
            </span>
          </Button>
        )}
      </div>
    </article>
  );
}

function Comparison({ data, ids, onIds }: { data: CompareResponse; ids: number[]; onIds: (ids: number[]) => void }) {
  const { prefs } = useReaderPrefs();
  const { data: me } = useMe();
  const canEdit = hasRole(me?.role, 'author');
  const records = data.records;
  const rows = data.comparison.rows;
  const differs = rows.filter((r) => r.differs);
  const partly = rows.filter((r) => !r.differs && r.known < records.length);
  const alike = rows.filter((r) => !r.differs && r.known === records.length);
  const byId = new Map(records.map((r) => [r.cultivar.id, r.cultivar]));

  return (
    <div className="space-y-8">
      <div className={`grid gap-4 ${records.length === 3 ? 'md:grid-cols-3' : 'sm:grid-cols-2'}`}>
        {records.map((r) => (
          <RecordColumn
            key={r.cultivar.id}
            record={r}
            zone={prefs.zone}
            container={prefs.container}
            // Removing one of two leads to the picker, which is also how a record is swapped.
            onRemove={() => onIds(ids.filter((x) => x !== r.cultivar.id))}
          />
        ))}
      </div>
      {!prefs.zone && (
        <div className="max-w-md">
          <p className="mb-2 text-sm text-ink-soft">Set your hardiness zone to see whether each one suits your garden.</p>
          <GardenSettingsPanel />
        </div>
      )}

      <section aria-labelledby="diff-h" className="space-y-3">
        <h2 id="diff-h" className="text-2xl text-moss-deep">
          {differs.length ? `Where they differ (${differs.length})` : 'Where they differ'}
        </h2>
        {differs.length === 0 && partly.length === 0 ? (
          <p>On the traits on record these look the same. A tour clip, or the note below, may show what tells them apart.</p>
        ) : (
          <TraitTable rows={[...differs, ...partly]} records={records} system={prefs.unitSystem} caption="Traits that differ, then traits not on every record" />
        )}
        {alike.length > 0 && (
          <details className="rounded-lg border border-rule bg-paper p-3">
            <summary className="cursor-pointer font-bold text-moss">
              Alike in {alike.length} trait{alike.length === 1 ? '' : 's'}: {alike.map((r) => r.label.toLowerCase()).join(', ')}
            </summary>
            <div className="mt-3">
              <TraitTable rows={alike} records={records} system={prefs.unitSystem} caption="Traits they share" />
            </div>
          </details>
        )}
      </section>

      <section aria-labelledby="notes-h" className="space-y-3">
        <h2 id="notes-h" className="text-2xl text-moss-deep">
          How to tell them apart
        </h2>
        <div className="grid gap-4 md:grid-cols-2">
          {pairsOf(ids).map(([a, b]) => {
            const A = byId.get(a);
            const B = byId.get(b);
            return (
              <PairNote
                key={`${a}-${b}`}
                aId={a}
                bId={b}
                title={A && B ? `${shortName(A)} and ${shortName(B)}` : 'This pair'}
                note={noteFor(data.notes, a, b)}
                canEdit={canEdit}
              />
            );
          })}
        </div>
      </section>

      {records.length < MAX_COMPARE && (
        <details className="rounded-lg border border-rule bg-card p-4">
          <summary className="cursor-pointer font-bold text-moss">Add a third record</summary>
          <div className="mt-3">
            <AddRecordPicker ids={ids} onIds={onIds} />
          </div>
        </details>
      )}
    </div>
  );
}

/** /compare?ids=…: two or three cultivar records side by side, differences first. */
export function ComparePage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { ids, status } = parseCompareIds(params.get('ids'));
  const compare = useCompare(ids);
  const onIds = (next: number[]) => navigate(compareHref(next));

  if (status === 'too_few') {
    return (
      <Page title="Side by side" intro={INTRO} width="medium">
        <Card>
          <h2 className="text-xl">{ids.length === 1 ? 'Pick one more record' : 'Pick two records to compare'}</h2>
          <p className="mt-1 text-ink-soft">
            Side by side needs at least two cultivar records. {ids.length === 1 ? 'One is chosen; add the look-alike you want to set beside it.' : 'Add the first, then its look-alike.'}{' '}
            The <Link to="/finder">tree finder</Link> also offers look-alikes for each tree it suggests.
          </p>
          <div className="mt-4">
            <AddRecordPicker ids={ids} onIds={onIds} />
          </div>
        </Card>
      </Page>
    );
  }
  if (status === 'too_many') {
    return (
      <Page title="Side by side" intro={INTRO} width="medium">
        <Card>
          <h2 className="text-xl">Too many records for one view</h2>
          <p className="mt-1">Side by side shows at most {MAX_COMPARE} records at a time, so the columns stay readable.</p>
          <Link to={compareHref(ids.slice(0, MAX_COMPARE))} className={buttonClasses('primary', 'md', 'mt-4')}>
            Compare the first {MAX_COMPARE}
          </Link>
        </Card>
      </Page>
    );
  }

  let body;
  if (compare.isPending) body = <Loading label="Setting the records side by side…" />;
  else if (compare.isError) {
    const missing = isApiError(compare.error) && compare.error.status === 404;
    body = (
      <>
        <ErrorState title={missing ? 'One of these records is not available' : 'Side by side could not be loaded'} error={compare.error} onRetry={missing ? undefined : () => void compare.refetch()} />
        <Link to="/compare" className={buttonClasses('secondary')}>
          Pick other records
        </Link>
      </>
    );
  } else body = <Comparison data={compare.data} ids={ids} onIds={onIds} />;

  return (
    <Page title="Side by side" intro={INTRO} width="wide">
      {body}
    </Page>
  );
}
