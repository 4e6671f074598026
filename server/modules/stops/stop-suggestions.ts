import { cuePlainText } from '../../../shared/captions/cue-text';
import { findNames, type NameIndex } from '../../../shared/names/matcher';

/** How long a suggested stop lasts when no other name is heard after it (common practice here, no source). */
export const DEFAULT_STOP_MS = 30_000;
/** The shortest stop the shared stop schema accepts. */
export const MIN_STOP_MS = 1000;

/** A cultivar name heard in one cue. */
export interface HeardName {
  cueStartMs: number;
  cultivarId: number;
  heard: string;
  score: number;
  kind: 'exact' | 'variant' | 'fuzzy';
}

/** A proposed time range for a stop, with the name that proposed it. */
export interface ProposedStop {
  startMs: number;
  endMs: number;
  name: HeardName;
}

/**
 * Runs the name matcher over cues in playing order (plain text: tags removed) and keeps spelling
 * matches only (exact, variant, fuzzy; sound-alikes are left to the spelling-fix queue). The first
 * name in a cue speaks for that cue, and a name heard again in the cues right after it counts once.
 */
export function heardNames(cues: readonly { startMs: number; text: string }[], index: NameIndex): HeardName[] {
  const out: HeardName[] = [];
  for (const cue of cues) {
    const text = cuePlainText(cue.text).replace(/\s+/g, ' ');
    const match = findNames(index, text, { phonetic: false }).find((m) => m.kind !== 'phonetic');
    if (!match || match.kind === 'phonetic') continue;
    const cultivarId = Number(match.recordId);
    if (out.length && out[out.length - 1]!.cultivarId === cultivarId) continue;
    out.push({ cueStartMs: cue.startMs, cultivarId, heard: match.matchedText, score: match.score, kind: match.kind });
  }
  return out;
}

/**
 * Turns heard names into stop ranges: from the cue where a name is heard to the cue where the
 * next name is heard, or {@link DEFAULT_STOP_MS} later (never past the video's end). Time already
 * covered by a stop is skipped: a name heard inside a stop proposes nothing, and a range is cut
 * short where the next stop begins. Ranges shorter than {@link MIN_STOP_MS} are dropped, so every
 * proposal can be saved as it is.
 */
export function proposeStops(
  names: readonly HeardName[],
  opts: { durationMs: number | null; stops: readonly { startMs: number; endMs: number }[] },
): ProposedStop[] {
  const stops = [...opts.stops].sort((a, b) => a.startMs - b.startMs);
  const out: ProposedStop[] = [];
  names.forEach((name, i) => {
    const startMs = name.cueStartMs;
    const next = names[i + 1];
    let endMs = next ? next.cueStartMs : startMs + DEFAULT_STOP_MS;
    if (opts.durationMs != null) endMs = Math.min(endMs, opts.durationMs);
    if (stops.some((s) => s.startMs <= startMs && startMs < s.endMs)) return;
    const following = stops.find((s) => s.startMs > startMs);
    if (following) endMs = Math.min(endMs, following.startMs);
    if (endMs - startMs < MIN_STOP_MS) return;
    out.push({ startMs, endMs, name });
  });
  return out;
}
