import type { QualityIssue } from '@shared/captions/quality';
import { badgeFor } from '../lib/quality-view';

/**
 * The findings on one cue as small badges; each carries its full reason as a tooltip, and
 * `detailed` also prints the reasons with their limits and sources under the badges (for the
 * selected cue), so keyboard and screen-reader users get them too.
 */
export function QualityBadges({ issues, detailed, id }: { issues: readonly QualityIssue[]; detailed: boolean; id: string }) {
  if (issues.length === 0) return null;
  const badges = issues.map(badgeFor);
  return (
    <div className="mt-1.5">
      <ul aria-label="Quality checks" className="flex flex-wrap gap-1.5">
        {badges.map((b, i) => (
          <li
            key={i}
            title={`${b.detail}\nLimit: ${b.limit}`}
            aria-describedby={detailed ? `${id}-q${i}` : undefined}
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
      {detailed && (
        <ul className="mt-2 space-y-1.5 border-l-2 border-rule pl-3 text-sm">
          {badges.map((b, i) => (
            <li key={i} id={`${id}-q${i}`}>
              <p>{b.detail}</p>
              <p className="font-ui text-xs text-ink-soft">Limit: {b.limit}</p>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
