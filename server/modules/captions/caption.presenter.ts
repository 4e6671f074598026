import type { StoredCue, TrackDto } from '../../../shared/schemas/captions';
import type { CaptionTrack } from '../../db/entities/caption-track.entity';
import type { CueRow } from '../../db/entities/cue.entity';

/** What a track looks like to the client; `cueCount` is counted by the service. */
export function presentTrack(track: CaptionTrack, cueCount: number): TrackDto {
  return {
    id: track.id,
    tourId: track.tourId,
    lang: track.lang,
    label: track.label,
    version: track.version,
    cueCount,
    updatedAt: track.updatedAt.toISOString(),
  };
}

/** A stored cue in the shared shape (the database's own row id stays on the server). */
export function presentCue(row: CueRow): StoredCue {
  return { id: row.cueIdent, startMs: row.startMs, endMs: row.endMs, text: row.text, settings: row.settings };
}
