import { useEffect, useId, useRef, useState } from 'react';
import { Link, useSearchParams } from 'react-router';
import { declineFixInput, SPELLING_FIX_STATUSES, type SpellingFixDetail, type SpellingFixRow, type SpellingFixStatusName } from '@shared/schemas/spelling-fixes';
import { Badge } from '@/components/badge';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { FormError, FormSuccess } from '@/components/form-error';
import { Page } from '@/components/page';
import { Pager } from '@/components/pager';
import { Loading, Spinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { pageFromParams, positiveIntParam } from '@/lib/route-params';
import { clockText, tourMomentHref } from '@/lib/tour-moment';
import { useAcceptFix, useDeclineFix, useFix, useFixes, useOpenFixPreview, useRunDetection, useUndoFix } from '../api/spelling-api';
import { buildPreview } from '../lib/change-preview';
import { acceptSummary, ageText, undoConflictLines } from '../lib/fix-words';
import { BeforeAfter } from './change-view';

const TAB_LABELS: Record<SpellingFixStatusName, string> = { open: 'To review', accepted: 'Accepted', declined: 'Declined', undone: 'Undone' };

function statusOf(raw: string | null): SpellingFixStatusName {
  return (SPELLING_FIX_STATUSES as readonly string[]).includes(raw ?? '') ? (raw as SpellingFixStatusName) : 'open';
}

function dayText(iso: string | null): string {
  if (!iso) return '';
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? '' : d.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}

function Tabs({ status, onChange }: { status: SpellingFixStatusName; onChange: (s: SpellingFixStatusName) => void }) {
  return (
    <nav aria-label="Spelling fixes by status" className="border-b border-rule">
      <ul className="-mb-px flex flex-wrap gap-1 font-ui">
        {SPELLING_FIX_STATUSES.map((s) => (
          <li key={s}>
            <button
              type="button"
              aria-current={s === status ? 'page' : undefined}
              onClick={() => onChange(s)}
              className={`min-h-11 rounded-t-md border px-4 font-bold ${s === status ? 'border-rule border-b-card bg-card text-moss-deep' : 'border-transparent text-ink-soft hover:text-ink'}`}
            >
              {TAB_LABELS[s]}
            </button>
          </li>
        ))}
      </ul>
    </nav>
  );
}

function DetectionPanel() {
  const detect = useRunDetection();
  return (
    <div className="flex flex-wrap items-start gap-3">
      <Button variant="secondary" busy={detect.isPending} onClick={() => detect.mutate()}>
        Scan captions for misspelt names
      </Button>
      <div className="min-w-0 flex-1">
        {detect.data && (
          <FormSuccess>
            Read {detect.data.cues} caption{detect.data.cues === 1 ? '' : 's'} in {detect.data.tracks} track{detect.data.tracks === 1 ? '' : 's'}: {detect.data.misspellings} misspelt name
            {detect.data.misspellings === 1 ? '' : 's'} heard, {detect.data.proposed} new fix{detect.data.proposed === 1 ? '' : 'es'} added to the queue, {detect.data.known} already known.
          </FormSuccess>
        )}
        {detect.error != null && <FormError message={errorMessage(detect.error)} />}
        {!detect.data && !detect.error && <p className="text-sm text-ink-soft">Detection reads every caption for names written otherwise than on record, and adds what it finds here as automatic fixes.</p>}
      </div>
    </div>
  );
}

function QueueTable({ rows, status, selected, onSelect }: { rows: SpellingFixRow[]; status: SpellingFixStatusName; selected: number | null; onSelect: (id: number) => void }) {
  const cell = 'px-3 py-2 align-top max-md:flex max-md:gap-2 max-md:px-0 max-md:py-0.5 max-md:before:w-32 max-md:before:shrink-0 max-md:before:font-ui max-md:before:text-xs max-md:before:font-bold max-md:before:text-ink-soft max-md:before:content-[attr(data-label)]';
  const open = status === 'open';
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-card shadow-leaf max-md:border-0 max-md:bg-transparent max-md:shadow-none">
      <table className="w-full border-collapse text-left max-md:block">
        <caption className="sr-only">Spelling fixes: {TAB_LABELS[status].toLowerCase()}</caption>
        <thead className="bg-bark-wash font-ui text-sm max-md:sr-only">
          <tr>
            <th scope="col" className="px-3 py-2">Words in the captions</th>
            <th scope="col" className="px-3 py-2">Suggested name</th>
            <th scope="col" className="px-3 py-2">{open ? 'Times in captions' : 'Captions changed'}</th>
            <th scope="col" className="px-3 py-2">Tours affected</th>
            <th scope="col" className="px-3 py-2">Proposed by</th>
            <th scope="col" className="px-3 py-2">{open ? 'Waiting' : 'Decided'}</th>
            <th scope="col" className="px-3 py-2"><span className="sr-only">Action</span></th>
          </tr>
        </thead>
        <tbody className="max-md:block max-md:space-y-3">
          {rows.map((r) => (
            <tr key={r.id} className={`border-t border-rule max-md:block max-md:rounded-lg max-md:border max-md:bg-card max-md:p-4 ${selected === r.id ? 'bg-moss-wash' : ''}`}>
              <th scope="row" className="px-3 py-2 text-left align-top max-md:block max-md:px-0">
                “{r.proposedText}”
              </th>
              <td data-label="Suggested name" className={cell}>
                <span>‘{r.suggestion.epithet}’</span>
              </td>
              <td data-label={open ? 'Times in captions' : 'Captions changed'} className={`${cell} tabular-nums`}>
                {open ? r.occurrences : r.changedCues}
              </td>
              <td data-label="Tours affected" className={cell}>
                <span>
                  {r.toursAffected.count}
                  {r.toursAffected.titles.length > 0 && <span className="block text-sm text-ink-soft">{r.toursAffected.titles.join('; ')}</span>}
                </span>
              </td>
              <td data-label="Proposed by" className={cell}>
                {r.source === 'detection' ? <Badge tone="bark">Automatic</Badge> : r.proposer}
              </td>
              <td data-label={open ? 'Waiting' : 'Decided'} className={`${cell} tabular-nums`}>
                {open ? ageText(r.createdAt) : dayText(r.decidedAt)}
              </td>
              <td className="px-3 py-2 text-right align-top max-md:mt-2 max-md:block max-md:px-0 max-md:text-left">
                <Button variant={selected === r.id ? 'primary' : 'secondary'} size="sm" aria-expanded={selected === r.id} aria-controls="fix-detail" onClick={() => onSelect(r.id)}>
                  Review<span className="sr-only"> “{r.proposedText}”</span>
                </Button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function OpenPreview({ fix }: { fix: SpellingFixDetail }) {
  const preview = useOpenFixPreview(fix);
  if (preview.isPending) return <Loading label="Reading the captions that would change…" />;
  if (preview.isError) return <ErrorState title="The preview could not be built" error={preview.error} onRetry={() => void preview.refetch()} />;
  const shown = preview.data.length;
  return (
    <div>
      <h3 className="text-lg">Captions that will change</h3>
      {shown < fix.occurrences && (
        <p className="mt-1 text-sm text-ink-soft">
          Showing {shown} of {fix.occurrences}: the others are in tours that are not published yet, or beyond the first five tours listed. Accepting changes all {fix.occurrences}.
        </p>
      )}
      {shown === 0 ? (
        <p className="mt-2 text-ink-soft">No published caption holds these words now.</p>
      ) : (
        <ul className="mt-2 space-y-3">
          {preview.data.map((p) => (
            <li key={`${p.trackId}-${p.startMs}`} className="rounded-md border border-rule bg-paper p-3">
              <p className="mb-1 font-ui text-sm">
                <Link to={tourMomentHref(p.tourId, p.startMs)} className="font-bold">
                  {p.tourTitle} at {clockText(p.startMs)}
                </Link>{' '}
                <span className="text-ink-soft">· {p.trackLabel}</span>
              </p>
              <BeforeAfter before={p.before} after={p.after} labels={['Now', 'After accepting']} />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

function AuditList({ fix, restored }: { fix: SpellingFixDetail; restored: boolean }) {
  if (fix.changes.length === 0) return null;
  return (
    <div>
      <h3 className="text-lg">{restored ? 'Captions this fix changed (now restored)' : 'Captions this fix changed'}</h3>
      <ul className="mt-2 space-y-3">
        {fix.changes.map((c) => {
          const p = buildPreview(c.before, fix.proposedText, fix.suggestion.epithet);
          const marked = p && p.afterText === c.after ? p : { before: [{ text: c.before, changed: false }], after: [{ text: c.after, changed: false }] };
          return (
            <li key={c.id} className="rounded-md border border-rule bg-paper p-3">
              <p className="mb-1 font-ui text-sm">
                {c.tourId !== null ? (
                  <Link to={tourMomentHref(c.tourId, c.startMs)} className="font-bold">
                    {c.tourTitle} at {clockText(c.startMs)}
                  </Link>
                ) : (
                  <span>A deleted tour at {clockText(c.startMs)}</span>
                )}
              </p>
              <BeforeAfter before={marked.before} after={marked.after} labels={['Before', 'After the fix']} />
            </li>
          );
        })}
      </ul>
    </div>
  );
}

function DeclineDialog({ fix, open, onClose }: { fix: SpellingFixDetail; open: boolean; onClose: () => void }) {
  const decline = useDeclineFix();
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  return (
    <ConfirmDialog
      open={open}
      title={`Decline “${fix.proposedText}”?`}
      confirmLabel="Decline the fix"
      tone="danger"
      busy={decline.isPending}
      onCancel={() => {
        decline.reset();
        onClose();
      }}
      onConfirm={() => {
        const checked = declineFixInput.safeParse({ reason });
        if (!checked.success) {
          setError(checked.error.issues[0]?.message ?? 'Give a reason.');
          document.getElementById(id)?.focus();
          return;
        }
        setError(null);
        decline.mutate({ id: fix.id, reason: checked.data.reason }, { onSuccess: onClose });
      }}
    >
      <p>The captions stay as they are. {fix.source === 'viewer' ? `${fix.proposer} receives your reason by e-mail.` : 'Detection will not propose these words again.'}</p>
      <label htmlFor={id} className="mt-3 block font-bold">
        Reason (required)
      </label>
      <textarea
        id={id}
        value={reason}
        onChange={(e) => setReason(e.target.value)}
        rows={3}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-e` : undefined}
        className={`mt-1 block w-full rounded-md border bg-card px-3 py-2 ${error ? 'border-2 border-maple' : 'border-edge'}`}
      />
      {error && (
        <p id={`${id}-e`} className="mt-1 text-sm font-bold text-maple">
          {error}
        </p>
      )}
      {decline.error != null && <p className="mt-2 font-bold text-maple">{errorMessage(decline.error)}</p>}
    </ConfirmDialog>
  );
}

function FixDetailPanel({ id, onResult }: { id: number; onResult: (message: string) => void }) {
  const fix = useFix(id);
  const accept = useAcceptFix();
  const undo = useUndoFix();
  const [dialog, setDialog] = useState<'accept' | 'decline' | 'undo' | null>(null);
  const heading = useRef<HTMLHeadingElement>(null);

  useEffect(() => {
    heading.current?.focus();
  }, [id, fix.data?.status]);

  if (fix.isPending) return <Loading label="Loading the fix…" />;
  if (fix.isError) return <ErrorState title="The fix could not be loaded" error={fix.error} onRetry={() => void fix.refetch()} />;
  const f = fix.data;
  const conflicts = undoConflictLines(undo.error);

  return (
    <section id="fix-detail" aria-labelledby="fix-detail-title" className="mt-8 rounded-lg border-2 border-moss bg-card p-5 shadow-leaf sm:p-6">
      <h2 id="fix-detail-title" ref={heading} tabIndex={-1} className="text-2xl outline-none">
        “{f.proposedText}” <span aria-hidden="true">→</span>
        <span className="sr-only"> to </span> ‘{f.suggestion.epithet}’
      </h2>
      <p className="mt-1 text-sm">
        Record: <Link to={`/cultivars/${f.suggestion.cultivar.slug}`}>{f.suggestion.acceptedName}</Link>
      </p>
      <dl className="mt-3 grid gap-x-6 gap-y-1 font-ui text-sm sm:grid-cols-[10rem_1fr]">
        <dt className="font-bold text-ink-soft">Status</dt>
        <dd>{TAB_LABELS[f.status]}</dd>
        <dt className="font-bold text-ink-soft">Proposed by</dt>
        <dd>
          {f.source === 'detection' ? 'Automatic detection' : f.proposer}, {dayText(f.createdAt)}
        </dd>
        {f.decidedBy && (
          <>
            <dt className="font-bold text-ink-soft">Decided by</dt>
            <dd>
              {f.decidedBy}, {dayText(f.decidedAt)}
            </dd>
          </>
        )}
        {f.declineReason && (
          <>
            <dt className="font-bold text-ink-soft">Reason</dt>
            <dd>{f.declineReason}</dd>
          </>
        )}
        {f.undoneBy && (
          <>
            <dt className="font-bold text-ink-soft">Undone by</dt>
            <dd>
              {f.undoneBy}, {dayText(f.undoneAt)}
            </dd>
          </>
        )}
      </dl>

      <div className="mt-5 space-y-4">
        {f.status === 'open' && <OpenPreview fix={f} />}
        {(f.status === 'accepted' || f.status === 'undone') && <AuditList fix={f} restored={f.status === 'undone'} />}
      </div>

      {accept.error != null && <div className="mt-4"><FormError message={errorMessage(accept.error)} /></div>}
      {undo.error != null && (
        <div className="mt-4">
          <FormError message={conflicts.length ? 'Nothing was undone: these captions were edited after the fix was accepted, and undoing would overwrite those edits.' : errorMessage(undo.error)}>
            {conflicts.length > 0 && (
              <>
                <ul className="list-disc space-y-1 pl-5">
                  {conflicts.map((line) => (
                    <li key={line}>{line}</li>
                  ))}
                </ul>
                <p className="mt-2 text-sm">Correct them by hand in the caption editor instead.</p>
              </>
            )}
          </FormError>
        </div>
      )}

      <div className="mt-5 flex flex-wrap gap-3">
        {f.status === 'open' && (
          <>
            <Button onClick={() => setDialog('accept')} disabled={f.occurrences === 0}>
              Accept…
            </Button>
            <Button variant="secondary" onClick={() => setDialog('decline')}>
              Decline…
            </Button>
          </>
        )}
        {f.status === 'accepted' && (
          <Button variant="secondary" onClick={() => setDialog('undo')}>
            Undo…
          </Button>
        )}
      </div>

      <ConfirmDialog
        open={dialog === 'accept'}
        title="Accept this spelling fix?"
        confirmLabel="Accept and rewrite the captions"
        busy={accept.isPending}
        onCancel={() => setDialog(null)}
        onConfirm={() =>
          accept.mutate(f.id, {
            onSuccess: (r) => onResult(`Accepted “${f.proposedText}” → ‘${r.fix.suggestion.epithet}’: ${acceptSummary(r.changedCues, r.tracks)}`),
            onSettled: () => setDialog(null),
          })
        }
      >
        <p>
          Every caption where “{f.proposedText}” stands as whole words — {f.occurrences} now, in {f.toursAffected.count} tour{f.toursAffected.count === 1 ? '' : 's'} — will read ‘{f.suggestion.epithet}’. The rest of each caption stays as it is.
        </p>
        <p className="mt-2">“{f.proposedText}” is recorded as a variant of the name. {f.source === 'viewer' ? `${f.proposer} is told by e-mail.` : ''} You can undo it later, as long as nobody edits those captions meanwhile.</p>
      </ConfirmDialog>
      <DeclineDialog fix={f} open={dialog === 'decline'} onClose={() => setDialog(null)} />
      <ConfirmDialog
        open={dialog === 'undo'}
        title="Undo this spelling fix?"
        confirmLabel="Undo the fix"
        tone="danger"
        busy={undo.isPending}
        onCancel={() => setDialog(null)}
        onConfirm={() =>
          undo.mutate(f.id, {
            onSuccess: (r) => onResult(`Undone: ${r.restoredCues} caption${r.restoredCues === 1 ? '' : 's'} read “${f.proposedText}” again, and the variant was removed.`),
            onSettled: () => setDialog(null),
          })
        }
      >
        <p>
          The {f.changedCues} caption{f.changedCues === 1 ? '' : 's'} this fix changed get their earlier text back. If any of them was edited since, nothing is changed and you see which.
        </p>
      </ConfirmDialog>
    </section>
  );
}

/** /moderation/spelling — the moderators' queue of spelling fixes, with detection, preview, accept, decline and undo. */
export function SpellingQueuePage() {
  const [params, setParams] = useSearchParams();
  const status = statusOf(params.get('status'));
  const page = pageFromParams(params);
  const selected = positiveIntParam(params.get('fix'));
  const fixes = useFixes(status, page);
  const [result, setResult] = useState<string | null>(null);

  const go = (next: { status?: SpellingFixStatusName; page?: number; fix?: number | null }) => {
    const p = new URLSearchParams();
    const s = next.status ?? status;
    if (s !== 'open') p.set('status', s);
    const pg = next.page ?? (next.status ? 1 : page);
    if (pg > 1) p.set('page', String(pg));
    const f = next.fix === undefined ? selected : next.fix;
    if (f) p.set('fix', String(f));
    setParams(p);
  };

  let body;
  if (fixes.isPending) body = <Loading label="Loading the queue…" />;
  else if (fixes.isError) body = <ErrorState title="The queue could not be loaded" error={fixes.error} onRetry={() => void fixes.refetch()} />;
  else if (fixes.data.items.length === 0) {
    body = (
      <EmptyState title={status === 'open' ? 'Nothing waits for review.' : `No ${TAB_LABELS[status].toLowerCase()} fixes.`}>
        {status === 'open' && <p>Flags from viewers and fixes found by detection appear here, oldest first.</p>}
      </EmptyState>
    );
  } else {
    body = (
      <>
        <QueueTable rows={fixes.data.items} status={status} selected={selected} onSelect={(id) => go({ fix: id === selected ? null : id })} />
        <Pager page={page} pageSize={fixes.data.pageSize} total={fixes.data.total} label="Pages of spelling fixes" onPageChange={(p) => go({ page: p })} />
      </>
    );
  }

  return (
    <Page
      title="Spelling fixes"
      width="wide"
      intro="Names misspelt in captions, flagged by viewers or found by detection. Accepting a fix rewrites the name in every caption at once and keeps a record of each change, so it can be undone."
    >
      <div className="mb-6">
        <DetectionPanel />
      </div>
      {result && (
        <div className="mb-4">
          <FormSuccess>{result}</FormSuccess>
        </div>
      )}
      <Tabs
        status={status}
        onChange={(s) => {
          setResult(null);
          go({ status: s, fix: null });
        }}
      />
      <div className="mt-4">
        <p className="mb-2 flex min-h-5 items-center gap-2 font-ui text-sm text-ink-soft" role="status">
          {fixes.isFetching && <Spinner className="size-4" />}
          {fixes.data ? `${fixes.data.total} fix${fixes.data.total === 1 ? '' : 'es'} ${status === 'open' ? 'to review' : TAB_LABELS[status].toLowerCase()}` : ''}
        </p>
        {body}
      </div>
      {selected !== null && <FixDetailPanel key={selected} id={selected} onResult={setResult} />}
    </Page>
  );
}
