import { useState } from 'react';
import type { QualityIssue } from '@shared/captions/quality';
import { badgeFor } from '../lib/quality-view';

/**
 * The findings on one cue as small badges, each with its full reason as a tooltip, and a "Why?"
 * button that prints the reasons with their limits and sources under them (for keyboard and
 * screen-reader users too). Opening is the author's choice, never a side effect of selecting the
 * cue, so rows do not change height under the pointer.
 */
export function QualityBadges({ issues, id, cueNumber }: { issues: readonly QualityIssue[]; id: string; cueNumber: number }) {
  const [open, setOpen] = useState(false);
  if (issues.length === 0) return null;
  const badges = issues.map(badgeFor);
  return (
    <div className="mt-1.5">
      <div className="flex flex-wrap items-center gap-1.5">
        <ul aria-label={`Quality checks on cue ${cueNumber}`} className="flex flex-wrap gap-1.5">
          {badges.map((b, i) => (
            <li
              key={i}
              title={`${b.detail}\nLimit: ${b.limit}`}
              className={`inline-flex items-center gap-1 rounded-full px-2 py-0.5 font-ui text-xs font-semibold ${
                b.severity === 'error' ? 'bg-maple text-card' : 'bg-ochre-wash text-ochre'
              }`}
            >
              <span aria-hidden="true">{b.severity === 'error' ? '✕' : '!'}</span>
              <span className="sr-only">{b.severity === 'error' ? 'Error: ' : 'Check: '}</span>
              {b.label}
            </li>
          ))}
        </ul>
        <button
          type="button"
          aria-expanded={open}
          aria-controls={`${id}-why`}
          aria-label={`Why? The limits behind the checks on cue ${cueNumber}`}
          onClick={() => setOpen((o) => !o)}
          className="rounded px-1.5 font-ui text-xs font-bold text-moss underline underline-offset-2 hover:text-moss-deep"
        >
          Why?
        </button>
      </div>
      <ul id={`${id}-why`} hidden={!open} className="mt-2 space-y-1.5 border-l-2 border-rule pl-3 text-sm">
        {badges.map((b, i) => (
          <li key={i}>
            <p>{b.detail}</p>
            <p className="font-ui text-xs text-ink-soft">Limit: {b.limit}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
