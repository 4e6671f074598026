import type { LeafForm } from '@shared/traits';

/*
 * Small leaf drawings for the leaf-form answers, drawn here from a few numbers: lobes fan out from
 * the leaf stalk, and the size of the uncut centre shows how deeply the leaf is cut.
 */

interface Palmate {
  lobes: number;
  /** Radius of the uncut centre: large for shallow lobes, tiny for leaves cut to the base. */
  centre: number;
  length: number;
  width: number;
  /** Spread of the fan in degrees. */
  spread: number;
}

const PALMATE: Partial<Record<LeafForm, Palmate>> = {
  'shallow-lobed': { lobes: 9, centre: 10, length: 15, width: 5, spread: 230 },
  amoenum: { lobes: 7, centre: 6.5, length: 15.5, width: 5.2, spread: 220 },
  palmatum: { lobes: 7, centre: 4.2, length: 16, width: 4.4, spread: 220 },
  matsumurae: { lobes: 7, centre: 2.4, length: 16.5, width: 3.4, spread: 220 },
  linearilobum: { lobes: 5, centre: 1.6, length: 16, width: 1.3, spread: 190 },
};

function lobePath(length: number, width: number): string {
  // A pointed lens along +x: base at the origin, tip at (length, 0).
  return `M0 0 Q${(length * 0.45).toFixed(2)} ${(-width).toFixed(2)} ${length} 0 Q${(length * 0.45).toFixed(2)} ${width.toFixed(2)} 0 0Z`;
}

function angles(n: number, spread: number): number[] {
  if (n === 1) return [-90];
  const start = -90 - spread / 2;
  return Array.from({ length: n }, (_, i) => start + (spread * i) / (n - 1));
}

const CX = 20;
const CY = 22;

function Stalk() {
  return <path d={`M${CX} ${CY} L${CX + 1} 38`} stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" fill="none" />;
}

function PalmateLeaf({ p }: { p: Palmate }) {
  return (
    <g>
      <Stalk />
      <circle cx={CX} cy={CY} r={p.centre} fill="currentColor" />
      {angles(p.lobes, p.spread).map((a, i) => {
        // Side lobes are a little shorter than the middle one, as on most palmate leaves.
        const f = 1 - (Math.abs(a + 90) / (p.spread / 2)) * 0.35;
        return <path key={i} d={lobePath(p.length * f, p.width)} transform={`translate(${CX} ${CY}) rotate(${a.toFixed(1)})`} fill="currentColor" />;
      })}
    </g>
  );
}

function LaceLeaf() {
  // Thin lobes with side cuts, drawn as strokes: cut to the base and cut again.
  return (
    <g stroke="currentColor" strokeLinecap="round" fill="none">
      <Stalk />
      {angles(7, 220).map((a, i) => {
        const len = 16 * (1 - (Math.abs(a + 90) / 110) * 0.35);
        return (
          <g key={i} transform={`translate(${CX} ${CY}) rotate(${a.toFixed(1)})`} strokeWidth="1.1">
            <path d={`M0 0 L${len.toFixed(1)} 0`} />
            {[0.35, 0.55, 0.75].map((t) => (
              <path key={t} d={`M${(len * t).toFixed(1)} 0 l2.2 -1.8 M${(len * t).toFixed(1)} 0 l2.2 1.8`} />
            ))}
          </g>
        );
      })}
    </g>
  );
}

function WholeLeaf() {
  return (
    <g>
      <Stalk />
      <path d={`M${CX} ${CY + 2} C${CX - 11} ${CY - 4} ${CX - 6} ${CY - 16} ${CX} ${CY - 18} C${CX + 6} ${CY - 16} ${CX + 11} ${CY - 4} ${CX} ${CY + 2}Z`} fill="currentColor" />
    </g>
  );
}

function CompoundLeaf() {
  const leaflet = (a: number) => (
    <path key={a} d={lobePath(11, 3.6)} transform={`translate(${CX} ${CY - 4}) rotate(${a})`} fill="currentColor" />
  );
  return (
    <g>
      <path d={`M${CX} ${CY - 4} L${CX + 1} 38`} stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" fill="none" />
      {[-150, -90, -30].map(leaflet)}
    </g>
  );
}

/** A drawn leaf for one leaf-form answer; decorative, since the button beside it says the same in words. */
export function LeafFormIcon({ form, className = 'size-10' }: { form: LeafForm; className?: string }) {
  const p = PALMATE[form];
  return (
    <svg viewBox="0 0 40 40" className={className} aria-hidden="true" focusable="false">
      {p ? <PalmateLeaf p={p} /> : form === 'dissectum' ? <LaceLeaf /> : form === 'compound' ? <CompoundLeaf /> : <WholeLeaf />}
    </svg>
  );
}
