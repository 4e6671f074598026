import type { Segment } from '../lib/change-preview';

/** Caption text with the rewritten words marked (underlined and tinted, and named for screen readers). */
export function Segments({ segments, kind }: { segments: readonly Segment[]; kind: 'before' | 'after' }) {
  return (
    <>
      {segments.map((s, i) =>
        s.changed ? (
          kind === 'before' ? (
            <del key={i} className="rounded-sm bg-maple-wash px-0.5 text-maple-deep decoration-2">
              {s.text}
            </del>
          ) : (
            <ins key={i} className="rounded-sm bg-moss-wash px-0.5 font-bold text-moss-deep no-underline">
              {s.text}
            </ins>
          )
        ) : (
          <span key={i}>{s.text}</span>
        ),
      )}
    </>
  );
}

/** One caption before and after, stacked, with the labels spelt out rather than shown by colour. */
export function BeforeAfter({ before, after, labels = ['Now', 'After'] }: { before: readonly Segment[]; after: readonly Segment[]; labels?: [string, string] }) {
  return (
    <dl className="grid gap-1 sm:grid-cols-[7rem_1fr]">
      <dt className="font-ui text-xs font-bold text-ink-soft uppercase">{labels[0]}</dt>
      <dd>
        <Segments segments={before} kind="before" />
      </dd>
      <dt className="font-ui text-xs font-bold text-ink-soft uppercase">{labels[1]}</dt>
      <dd>
        <Segments segments={after} kind="after" />
      </dd>
    </dl>
  );
}
