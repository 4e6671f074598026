import { useId, useState } from 'react';
import { Link } from 'react-router';
import type { FinderAnswers } from '@shared/finder/score';
import type { UnitSystem } from '@shared/units';
import { Button } from '@/components/button';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { Loading } from '@/components/spinner';
import { ZoneFitNote } from '@/components/zone-fit-badge';
import { errorMessage } from '@/lib/api';
import { clockText, tourMomentHref } from '@/lib/tour-moment';
import { useLookalikes, type FinderCandidate } from '../api/finder-api';
import { EVIDENCE_MARK, evidenceChips, questionName, scorePercent, type EvidenceKind } from '../lib/finder-words';

const chipTone: Record<EvidenceKind, string> = {
  matched: 'border-moss bg-moss-wash text-moss-deep',
  partial: 'border-ochre bg-ochre-wash text-ochre',
  conflicted: 'border-maple bg-maple-wash text-maple',
};
const chipWord: Record<EvidenceKind, string> = { matched: 'Matches', partial: 'Close', conflicted: 'Does not match' };

/** Side by side links to the record's nearest look-alikes, loaded when the list is opened. */
function CompareWith({ id, name, describedBy }: { id: number; name: string; describedBy: string }) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const near = useLookalikes(id, open);
  return (
    <div>
      <Button variant="secondary" size="sm" aria-expanded={open} aria-controls={panelId} aria-describedby={describedBy} onClick={() => setOpen(!open)}>
        Compare with…
      </Button>
      {open && (
        <div id={panelId} className="mt-2 rounded-md border border-rule bg-paper p-3">
          {near.isPending ? (
            <Loading label="Finding look-alikes…" />
          ) : near.isError ? (
            <p role="alert" className="text-sm font-bold text-maple">
              {errorMessage(near.error)}
            </p>
          ) : near.data.items.length === 0 ? (
            <p className="text-sm">No look-alikes on record for {name} yet.</p>
          ) : (
            <>
              <p className="text-sm font-bold">Side by side with a look-alike:</p>
              <ul className="mt-1 space-y-1">
                {near.data.items.slice(0, 3).map((item, i) => (
                  <li key={item.cultivar.id}>
                    <Link to={`/compare?ids=${id},${item.cultivar.id}`} className="font-bold">
                      <CultivarName record={item.cultivar} />
                    </Link>
                    {i === 0 && <span className="ml-2 text-sm text-ink-soft">closest look-alike</span>}
                  </li>
                ))}
              </ul>
            </>
          )}
        </div>
      )}
    </div>
  );
}

/** Props of CandidateCard. */
export interface CandidateCardProps {
  candidate: FinderCandidate;
  rank: number;
  answers: FinderAnswers;
  system: UnitSystem;
  zone: string | null;
}

/** One ranked cultivar: how well it matches, why, whether it suits the reader's zone, and where to see it. */
export function CandidateCard({ candidate: c, rank, answers, system, zone }: CandidateCardProps) {
  const id = useId();
  const pct = scorePercent(c.score);
  const chips = evidenceChips(c, answers, system);
  const unknown = c.unknown.map((t) => questionName(t, answers.colour?.season).toLowerCase());
  return (
    <article aria-labelledby={`${id}-name`} className={`rounded-lg border bg-card p-4 shadow-leaf sm:p-5 ${rank === 1 ? 'border-2 border-moss' : 'border-rule'}`}>
      <div className="flex flex-wrap items-start justify-between gap-x-4 gap-y-2">
        <h3 id={`${id}-name`} className="text-lg leading-snug">
          <span className="mr-2 font-ui text-sm font-semibold text-ink-soft">{rank}.</span>
          <CultivarName record={c.cultivar} />
        </h3>
        <FictionalMark record={c.cultivar} />
      </div>

      <div className="mt-3 flex items-center gap-3">
        <div className="h-2.5 flex-1 overflow-hidden rounded-full bg-bark-wash" aria-hidden="true">
          <div className="h-full rounded-full bg-moss" style={{ width: `${pct}%` }} />
        </div>
        <span className="shrink-0 font-ui text-sm font-bold text-moss-deep tabular-nums">Fits your answers: {pct}%</span>
      </div>

      {chips.length > 0 && (
        <ul className="mt-3 flex flex-wrap gap-1.5" aria-label="How your answers compare">
          {chips.map((chip) => (
            <li key={chip.trait} title={chip.description} className={`inline-flex items-center gap-1 rounded-full border px-2.5 py-0.5 font-ui text-xs font-semibold ${chipTone[chip.kind]}`}>
              <span aria-hidden="true">{EVIDENCE_MARK[chip.kind]}</span>
              <span className="sr-only">{chipWord[chip.kind]}: </span>
              <span aria-hidden="true">{chip.text}</span>
              <span className="sr-only">{chip.description}</span>
            </li>
          ))}
        </ul>
      )}
      {unknown.length > 0 && <p className="mt-2 text-sm text-ink-soft">Not on record, so not counted: {unknown.join(', ')}.</p>}

      {c.fit && (
        <ZoneFitNote fit={c.fit} zone={zone} className="mt-3 text-sm" />
      )}

      {c.moments.length > 0 ? (
        <div className="mt-3">
          <p className="text-sm font-bold">Seen in the tours</p>
          <ul className="mt-1 space-y-1 text-sm">
            {c.moments.map((m) => (
              <li key={m.stopId}>
                <Link to={tourMomentHref(m.tourId, m.startMs)}>
                  <span aria-hidden="true">▶ </span>
                  {m.tourTitle} <span className="tabular-nums">at {clockText(m.startMs)}</span>
                </Link>
              </li>
            ))}
          </ul>
        </div>
      ) : (
        <p className="mt-3 text-sm text-ink-soft">Not in a published tour yet.</p>
      )}

      <div className="mt-4 flex flex-wrap items-start gap-3">
        <CompareWith id={c.cultivar.id} name={c.cultivar.acceptedName} describedBy={`${id}-name`} />
        <Link to={`/cultivars/${c.cultivar.slug}`} className="inline-flex min-h-9 items-center font-bold">
          Cultivar record<span className="sr-only">: {c.cultivar.acceptedName}</span>
        </Link>
      </div>
    </article>
  );
}
