/** Props of ProgressBar; `value` is a whole percent, `valueText` what a screen reader says instead of the bare number. */
export interface ProgressBarProps {
  label: string;
  value: number;
  valueText: string;
  tone?: 'moss' | 'ochre';
}

/** A determinate progress bar (WAI-ARIA progressbar) drawn in the site's palette. */
export function ProgressBar({ label, value, valueText, tone = 'moss' }: ProgressBarProps) {
  const clamped = Math.max(0, Math.min(100, Math.round(value)));
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={clamped}
      aria-valuetext={valueText}
      className="h-3 w-full overflow-hidden rounded-full border border-rule bg-bark-wash"
    >
      <div className={`h-full rounded-full transition-[width] duration-300 ${tone === 'moss' ? 'bg-moss' : 'bg-ochre'}`} style={{ width: `${clamped}%` }} />
    </div>
  );
}
