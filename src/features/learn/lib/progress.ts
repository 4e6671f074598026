/** Totals with the share right, for the progress panel. */
export interface ProgressSummary {
  total: number;
  correct: number;
  /** Whole percent right, or null before the first answer. */
  percent: number | null;
}

/** Totals and percent right; a learner with no answers has no percent rather than 0 %. */
export function progressSummary(p: { total: number; correct: number }): ProgressSummary {
  const total = Math.max(0, Math.floor(p.total));
  const correct = Math.min(total, Math.max(0, Math.floor(p.correct)));
  return { total, correct, percent: total === 0 ? null : Math.round((correct / total) * 100) };
}

/** One day's bar: the whole bar is the answers given, the inner part the right ones. */
export interface DayBar {
  day: string;
  x: number;
  width: number;
  /** Height and top of the whole bar. */
  totalHeight: number;
  totalY: number;
  /** Height and top of the right answers. */
  correctHeight: number;
  correctY: number;
  total: number;
  correct: number;
}

/** Drawing area of the chart. */
export interface ChartBox {
  width: number;
  height: number;
  gap: number;
}

/**
 * Bars for the per-day chart, scaled so the busiest day fills the height; days keep their order.
 * Bars share the width equally with `gap` between them; no days gives no bars.
 */
export function dayBars(days: readonly { day: string; total: number; correct: number }[], box: ChartBox): DayBar[] {
  if (days.length === 0) return [];
  const max = Math.max(1, ...days.map((d) => d.total));
  const width = Math.max(1, (box.width - box.gap * (days.length - 1)) / days.length);
  return days.map((d, i) => {
    const total = Math.max(0, d.total);
    const correct = Math.min(total, Math.max(0, d.correct));
    const totalHeight = (total / max) * box.height;
    const correctHeight = (correct / max) * box.height;
    return {
      day: d.day,
      x: i * (width + box.gap),
      width,
      totalHeight,
      totalY: box.height - totalHeight,
      correctHeight,
      correctY: box.height - correctHeight,
      total,
      correct,
    };
  });
}

/** How many days the per-day chart spans. */
export const CHART_DAYS = 14;

function dayIndex(day: string): number | null {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  return m ? Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])) / 86_400_000 : null;
}

function dayText(index: number): string {
  return new Date(index * 86_400_000).toISOString().slice(0, 10);
}

/**
 * The last `count` calendar days up to `today` (or up to the latest day with answers, if that is
 * later, as the server's clock may be ahead), with days without answers as zeros, so the chart
 * shows gaps as gaps. Days outside the window and unreadable days are left out.
 */
export function recentDays(
  days: readonly { day: string; total: number; correct: number }[],
  count: number,
  today: string,
): { day: string; total: number; correct: number }[] {
  const known = new Map<number, { total: number; correct: number }>();
  for (const d of days) {
    const i = dayIndex(d.day);
    if (i !== null) known.set(i, { total: d.total, correct: d.correct });
  }
  const end = Math.max(dayIndex(today) ?? -Infinity, ...known.keys());
  if (!Number.isFinite(end) || count < 1) return [];
  const out: { day: string; total: number; correct: number }[] = [];
  for (let i = end - count + 1; i <= end; i++) out.push({ day: dayText(i), ...(known.get(i) ?? { total: 0, correct: 0 }) });
  return out;
}

/** The reader's calendar day as YYYY-MM-DD. */
export function localDay(date: Date): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${p(date.getMonth() + 1)}-${p(date.getDate())}`;
}

/** "18 Apr" for a YYYY-MM-DD day, read as a calendar date (no time zone shift). */
export function shortDay(day: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!m) return day;
  const months = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
  const month = months[Number(m[2]) - 1];
  return month ? `${Number(m[3])} ${month}` : day;
}
