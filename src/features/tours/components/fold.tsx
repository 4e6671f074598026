import { useState, type ReactNode } from 'react';
import { useMediaQuery, WIDE_LAYOUT } from '../hooks/use-media-query';

/** Props of Fold: the section's heading, a short line shown beside it while folded, and the content. */
export interface FoldProps {
  headingId: string;
  title: string;
  /** What the folded section holds right now, e.g. the tree on screen. */
  summary?: ReactNode;
  children: ReactNode;
  headingClassName?: string;
}

/**
 * A section of the tour page that stands open beside the video on wide screens and folds into a
 * disclosure under the video on phones, so the video and the trail stay in view. The open/closed
 * choice survives rotating the phone.
 */
export function Fold({ headingId, title, summary, children, headingClassName = 'text-lg text-moss-deep' }: FoldProps) {
  const wide = useMediaQuery(WIDE_LAYOUT);
  const [open, setOpen] = useState(false);
  if (wide) {
    return (
      <>
        <h2 id={headingId} className={headingClassName}>
          {title}
        </h2>
        {children}
      </>
    );
  }
  return (
    <details open={open} onToggle={(e) => setOpen(e.currentTarget.open)} className="group">
      <summary className="flex min-h-11 cursor-pointer list-none items-center gap-2 [&::-webkit-details-marker]:hidden">
        <svg viewBox="0 0 20 20" className="size-5 shrink-0 text-moss transition-transform group-open:rotate-90" aria-hidden="true">
          <path d="M7 4l6 6-6 6" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
        <h2 id={headingId} className={`shrink-0 whitespace-nowrap ${headingClassName}`}>
          {title}
        </h2>
        {summary && <span className="line-clamp-2 min-w-0 text-sm text-ink-soft">{summary}</span>}
      </summary>
      <div className="mt-3">{children}</div>
    </details>
  );
}
