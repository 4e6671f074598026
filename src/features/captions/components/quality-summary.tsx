import type { QualitySummary as Summary } from '../lib/quality-view';
import { KIND_LABELS } from '../lib/quality-view';

/**
 * The counts above the cue list and the switch that narrows the list to cues with findings.
 * Counts are announced politely, so a screen reader hears when an edit fixes or makes a problem.
 */
export function QualitySummary({ summary, onlyIssues, onOnlyIssues }: { summary: Summary; onlyIssues: boolean; onOnlyIssues: (on: boolean) => void }) {
  const clean = summary.cuesWithIssues === 0;
  return (
    <div className="rounded-md border border-rule bg-card px-3 py-2">
      <p role="status" className="text-sm">
        <strong>{summary.cues}</strong> cue{summary.cues === 1 ? '' : 's'} ·{' '}
        {clean ? (
          <span className="text-moss-deep">no quality issues</span>
        ) : (
          <>
            <strong>{summary.cuesWithIssues}</strong> with issues ({summary.errors} error{summary.errors === 1 ? '' : 's'}, {summary.warnings} warning
            {summary.warnings === 1 ? '' : 's'})
          </>
        )}
      </p>
      {!clean && (
        <ul aria-label="Issues by kind" className="mt-1 flex flex-wrap gap-1.5">
          {summary.byKind.map(({ kind, count }) => (
            <li key={kind} className="rounded-full border border-rule bg-paper px-2 py-0.5 font-ui text-xs">
              {KIND_LABELS[kind]}: {count}
            </li>
          ))}
        </ul>
      )}
      <label className="mt-2 flex items-center gap-2 font-ui text-sm">
        <input type="checkbox" checked={onlyIssues} onChange={(e) => onOnlyIssues(e.target.checked)} className="size-4 accent-moss" />
        Only cues with issues
      </label>
    </div>
  );
}
