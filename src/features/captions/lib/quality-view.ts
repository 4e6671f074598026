// How the shared quality findings (shared/captions/quality.ts) appear in the editor: a short badge
// on the cue, and a sentence naming the limit and where its number comes from.
import { THRESHOLDS, type QualityIssue, type QualityKind, type ThresholdName } from '@shared/captions/quality';

/** The limit a finding was held against, for the "why" text beside a badge; null for timing errors. */
export function thresholdOf(issue: Pick<QualityIssue, 'kind' | 'severity'>): ThresholdName | null {
  switch (issue.kind) {
    case 'reading-speed':
      return issue.severity === 'error' ? 'hardMaxWordsPerMinute' : 'maxWordsPerMinute';
    case 'reading-speed-cps':
      return 'maxCharsPerSecond';
    case 'too-short':
      return 'minMsPerWord';
    case 'too-long':
      return 'maxDurationMs';
    case 'line-length':
      return 'maxCharsPerLine';
    case 'line-count':
      return 'maxLines';
    case 'overlap':
      return 'maxOverlapMs';
    case 'gap':
      return 'minGapMs';
    case 'timing':
      return null;
  }
}

// Whether the limit is a ceiling ("over") or a floor ("under").
const DIRECTION: Record<ThresholdName, 'over' | 'under'> = {
  maxCharsPerLine: 'over',
  maxLines: 'over',
  maxWordsPerMinute: 'over',
  hardMaxWordsPerMinute: 'over',
  maxCharsPerSecond: 'over',
  minMsPerWord: 'under',
  maxDurationMs: 'over',
  maxOverlapMs: 'over',
  minGapMs: 'under',
};

/**
 * "over 37 characters per line — BBC Subtitle Guidelines …": the limit with its unit and its
 * source, exactly as the shared THRESHOLDS table states them.
 */
export function limitText(name: ThresholdName): string {
  const t = THRESHOLDS[name];
  return `${DIRECTION[name]} ${t.value} ${t.unit} — ${t.source}`;
}

const ONE_DECIMAL = (n: number) => (Math.round(n * 10) / 10).toString();
const SECONDS = (ms: number) => `${ONE_DECIMAL(ms / 1000)} s`;

/** Short names of the kinds, for the summary counts and the filter. */
export const KIND_LABELS: Record<QualityKind, string> = {
  timing: 'Ends before it starts',
  'reading-speed': 'Too fast to read (words)',
  'reading-speed-cps': 'Too fast to read (characters)',
  'too-short': 'Too short',
  'too-long': 'Too long',
  'line-length': 'Line too long',
  'line-count': 'Too many lines',
  overlap: 'Overlap',
  gap: 'Tiny gap',
};

/** A badge on a cue: a few words with the measured value, and the full explanation with the source. */
export interface QualityBadge {
  kind: QualityKind;
  severity: QualityIssue['severity'];
  label: string;
  /** The shared check's own sentence (what was measured, what to do). */
  detail: string;
  /** The limit and its source; for timing errors, the rule of the WebVTT standard. */
  limit: string;
}

/** Turns a finding into the badge the cue shows. */
export function badgeFor(issue: QualityIssue): QualityBadge {
  const name = thresholdOf(issue);
  const limit = name ? limitText(name) : 'the end time must be later than the start time — W3C WebVTT, cue timings';
  let label: string;
  switch (issue.kind) {
    case 'timing':
      label = 'ends before it starts';
      break;
    case 'reading-speed':
      label = `${Math.round(issue.value)} words/min`;
      break;
    case 'reading-speed-cps':
      label = `${ONE_DECIMAL(issue.value)} characters/s`;
      break;
    case 'too-short':
      label = `short: ${SECONDS(issue.value)}`;
      break;
    case 'too-long':
      label = `long: ${SECONDS(issue.value)}`;
      break;
    case 'line-length':
      label = `${issue.value} chars in a line`;
      break;
    case 'line-count':
      label = `${issue.value} lines`;
      break;
    case 'overlap':
      label = `overlaps ${SECONDS(issue.value)}`;
      break;
    case 'gap':
      label = `gap ${SECONDS(issue.value)}`;
      break;
  }
  return { kind: issue.kind, severity: issue.severity, label, detail: issue.message, limit };
}

/** Findings grouped by the cue they are about (indexes into the checked list). */
export function issuesByCue(issues: readonly QualityIssue[]): Map<number, QualityIssue[]> {
  const map = new Map<number, QualityIssue[]>();
  for (const issue of issues) {
    const list = map.get(issue.cueIndex);
    if (list) list.push(issue);
    else map.set(issue.cueIndex, [issue]);
  }
  return map;
}

/** The counts at the top of the editor. */
export interface QualitySummary {
  cues: number;
  cuesWithIssues: number;
  errors: number;
  warnings: number;
  byKind: { kind: QualityKind; count: number }[];
}

/** Counts findings for the summary line: cues affected, errors, warnings, and how many of each kind. */
export function summarise(issues: readonly QualityIssue[], cueCount: number): QualitySummary {
  const kinds = new Map<QualityKind, number>();
  let errors = 0;
  for (const issue of issues) {
    if (issue.severity === 'error') errors++;
    kinds.set(issue.kind, (kinds.get(issue.kind) ?? 0) + 1);
  }
  const order = Object.keys(KIND_LABELS) as QualityKind[];
  return {
    cues: cueCount,
    cuesWithIssues: new Set(issues.map((i) => i.cueIndex)).size,
    errors,
    warnings: issues.length - errors,
    byKind: order.filter((k) => kinds.has(k)).map((kind) => ({ kind, count: kinds.get(kind)! })),
  };
}
