import type { ZoneFit, ZoneFitVerdict } from '@shared/hardiness';
import { Badge, type BadgeTone } from './badge';

const tones: Record<ZoneFitVerdict, BadgeTone> = { yes: 'moss', marginal: 'ochre', no: 'maple', unknown: 'plain' };
const marks: Record<ZoneFitVerdict, string> = { yes: '✓', marginal: '≈', no: '✗', unknown: '?' };

/** Badge words for a zone verdict; the mark and the words carry the meaning, the colour only repeats it. */
export function zoneFitWords(fits: ZoneFitVerdict, zone: string | null): string {
  const where = zone ? `zone ${zone}` : 'your zone';
  switch (fits) {
    case 'yes':
      return `Suits ${where}`;
    case 'marginal':
      return `Borderline in ${where}`;
    case 'no':
      return `Not for ${where}`;
    case 'unknown':
      return 'Zone fit unknown';
  }
}

/** Whether a tree suits the reader's zone, as a short badge; the reason is shown beside it by the caller. */
export function ZoneFitBadge({ fits, zone }: { fits: ZoneFitVerdict; zone: string | null }) {
  return (
    <Badge tone={tones[fits]}>
      <span aria-hidden="true" className="mr-1">
        {marks[fits]}
      </span>
      {zoneFitWords(fits, zone)}
    </Badge>
  );
}

/**
 * The verdict with its reason and, when the reason suggests burying or sheltering a container, the
 * safety caution that goes with that advice. Every page that shows a zone fit uses this, so the
 * caution can never be left out.
 */
export function ZoneFitNote({ fit, zone, className = 'text-sm' }: { fit: Pick<ZoneFit, 'fits' | 'reason' | 'caution'>; zone: string | null; className?: string }) {
  return (
    <div className={className}>
      <ZoneFitBadge fits={fit.fits} zone={zone} />
      {fit.reason && <p className="mt-1 text-ink-soft">{fit.reason}</p>}
      {fit.caution && (
        <p className="mt-1 rounded-md border-l-4 border-ochre bg-ochre-wash px-3 py-1.5 text-ink">
          <strong>Take care: </strong>
          {fit.caution}
        </p>
      )}
    </div>
  );
}
