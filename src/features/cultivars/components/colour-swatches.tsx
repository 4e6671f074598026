import { colourOf } from '@/lib/trait-words';

/**
 * Colours as named swatches: the name is always written beside the swatch, so the colour never
 * carries the meaning alone. Two-tone leaves show both colours split on the diagonal.
 */
export function ColourSwatches({ ids }: { ids: readonly string[] }) {
  return (
    <ul className="flex flex-wrap items-center gap-x-3 gap-y-1">
      {ids.map((id) => {
        const c = colourOf(id);
        return (
          <li key={id} className="inline-flex items-center gap-1.5">
            <span
              aria-hidden="true"
              className="inline-block size-5 shrink-0 rounded-full border border-edge print:border-ink"
              style={{ background: c.accentHex ? `linear-gradient(135deg, ${c.hex} 0 55%, ${c.accentHex} 55% 100%)` : c.hex }}
            />
            {c.label}
          </li>
        );
      })}
    </ul>
  );
}
