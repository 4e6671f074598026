/** Grovewalk's leaf, drawn inline so it takes the colour of the text around it. */
export function LeafMark({ className = 'size-7' }: { className?: string }) {
  return (
    <svg className={className} viewBox="0 0 64 64" aria-hidden="true" focusable="false">
      <path d="M15 49C13 30 25 14 50 12c2 22-11 37-35 37z" fill="currentColor" />
      <path d="M16 48C25 38 33 29 46 17" fill="none" stroke="var(--color-paper)" strokeWidth="3" strokeLinecap="round" />
      <path d="M22 42l-3-9M30 33l-2-9M26 38l9-2M34 29l9-2" fill="none" stroke="var(--color-paper)" strokeWidth="2" strokeLinecap="round" />
      <circle cx="50" cy="49" r="5" fill="var(--color-maple)" />
    </svg>
  );
}
