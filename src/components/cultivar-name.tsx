import type { CultivarSummary } from '@shared/schemas/cultivars';
import { Badge } from './badge';

/**
 * A cultivar's printed name with the botanical parts in italics (from the server's name segments),
 * so every screen follows the same writing rules.
 */
export function CultivarName({ record }: { record: Pick<CultivarSummary, 'acceptedName' | 'nameSegments'> }) {
  if (!record.nameSegments.length) return <>{record.acceptedName}</>;
  return (
    <>
      {record.nameSegments.map((s, i) => (s.italic ? <i key={i}>{s.text}</i> : <span key={i}>{s.text}</span>))}
    </>
  );
}

/** Marks demo records wherever they are listed, so invented names are never taken for real ones. */
export function FictionalMark({ record }: { record: Pick<CultivarSummary, 'fictional'> }) {
  if (!record.fictional) return null;
  return <Badge tone="ochre">Invented for the demo</Badge>;
}
