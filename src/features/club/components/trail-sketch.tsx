/** A decorative drawing of a garden path with numbered stops, hinting at how a walk is divided up. */
export function TrailSketch({ className = '' }: { className?: string }) {
  const stops = [
    { x: 58, y: 214, n: 1 },
    { x: 150, y: 150, n: 2 },
    { x: 262, y: 176, n: 3 },
    { x: 330, y: 84, n: 4 },
  ];
  const trees = [
    { x: 86, y: 160, r: 26, fill: 'var(--color-moss)' },
    { x: 196, y: 96, r: 32, fill: 'var(--color-maple)' },
    { x: 300, y: 232, r: 22, fill: 'var(--color-moss-deep)' },
    { x: 370, y: 150, r: 18, fill: 'var(--color-bark)' },
    { x: 250, y: 60, r: 16, fill: 'var(--color-moss)' },
  ];
  return (
    <svg viewBox="0 0 420 280" className={className} aria-hidden="true" focusable="false">
      <rect x="0" y="0" width="420" height="280" rx="24" fill="var(--color-moss-wash)" />
      <path
        d="M20 250 C 80 230, 90 170, 150 150 S 230 200, 262 176 S 300 90, 400 60"
        fill="none"
        stroke="var(--color-bark-wash)"
        strokeWidth="26"
        strokeLinecap="round"
      />
      <path
        d="M20 250 C 80 230, 90 170, 150 150 S 230 200, 262 176 S 300 90, 400 60"
        fill="none"
        stroke="var(--color-edge)"
        strokeWidth="2"
        strokeDasharray="2 10"
        strokeLinecap="round"
      />
      {trees.map((t, i) => (
        <g key={i}>
          <rect x={t.x - 2} y={t.y + t.r - 6} width="4" height="16" rx="2" fill="var(--color-bark)" />
          <circle cx={t.x} cy={t.y} r={t.r} fill={t.fill} />
        </g>
      ))}
      {stops.map((s) => (
        <g key={s.n}>
          <circle cx={s.x} cy={s.y} r="15" fill="var(--color-card)" stroke="var(--color-moss-deep)" strokeWidth="3" />
          <text x={s.x} y={s.y + 5} textAnchor="middle" fontSize="15" fontWeight="700" fill="var(--color-moss-deep)" fontFamily="Merriweather, serif">
            {s.n}
          </text>
        </g>
      ))}
    </svg>
  );
}
