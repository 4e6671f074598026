import { markedSegments, type MarkSpan } from '@/lib/text-marks';

/**
 * Text with its matches in <mark>, which screen readers can announce as highlighted; the text
 * itself is never HTML, so nothing a caption says can run as markup.
 */
export function MarkedText({
  text,
  spans,
  markClassName = 'rounded-sm bg-ochre-wash px-0.5 text-ink',
  bridgeSpaces = true,
}: {
  text: string;
  spans: readonly MarkSpan[];
  markClassName?: string;
  /** Marks the spaces between matched words too, so a matched phrase reads as one. */
  bridgeSpaces?: boolean;
}) {
  return (
    <>
      {markedSegments(text, spans, { bridgeSpaces }).map((seg, i) =>
        seg.marked ? (
          <mark key={i} className={markClassName}>
            {seg.text}
          </mark>
        ) : (
          <span key={i}>{seg.text}</span>
        ),
      )}
    </>
  );
}
