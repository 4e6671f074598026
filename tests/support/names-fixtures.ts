// Caption rows the names tests (records, glossary, spelling fixes) share. Every tour, caption line
// and cultivar epithet written with these helpers is invented for the fictional Fernhollow Garden
// Club.
import type { DataSource } from 'typeorm';
import { CaptionTrack } from '../../server/db/entities/caption-track.entity';
import { CueRow } from '../../server/db/entities/cue.entity';
import { CultivarVariant } from '../../server/db/entities/cultivar-variant.entity';
import { normalizeName } from '../../shared/names/normalize';

/** A caption line: text, or text with its timing (default: 4 s per line, one after another). */
export type LineSpec = string | { startMs: number; endMs: number; text: string };

/** A caption track of a tour with the given lines, written straight to the database (version 1). */
export async function makeTrackRow(ds: DataSource, tourId: number, lines: LineSpec[], lang = 'en'): Promise<CaptionTrack> {
  const track = await ds.getRepository(CaptionTrack).save(ds.getRepository(CaptionTrack).create({ tourId, lang, label: `Captions ${lang}`, version: 1 }));
  const rows = lines.map((l, i) => {
    const spec = typeof l === 'string' ? { startMs: i * 4000, endMs: i * 4000 + 3500, text: l } : l;
    return { trackId: track.id, seq: i, startMs: spec.startMs, endMs: spec.endMs, text: spec.text, settings: '', cueIdent: null };
  });
  if (rows.length) await ds.createQueryBuilder().insert().into(CueRow).values(rows).execute();
  return ds.getRepository(CaptionTrack).findOneByOrFail({ id: track.id });
}

/** The texts of a track's cues in playing order. */
export async function cueTexts(ds: DataSource, trackId: number): Promise<string[]> {
  const rows = await ds.getRepository(CueRow).find({ where: { trackId }, order: { seq: 'ASC', id: 'ASC' } });
  return rows.map((r) => r.text);
}

/** The stored cue rows of a track in playing order. */
export function cueRows(ds: DataSource, trackId: number): Promise<CueRow[]> {
  return ds.getRepository(CueRow).find({ where: { trackId }, order: { seq: 'ASC', id: 'ASC' } });
}

export async function trackVersion(ds: DataSource, trackId: number): Promise<number> {
  return (await ds.getRepository(CaptionTrack).findOneByOrFail({ id: trackId })).version;
}

/** A recorded name variant, normalised the way the server normalises them. */
export async function addVariantRow(ds: DataSource, cultivarId: number, text: string): Promise<CultivarVariant> {
  const repo = ds.getRepository(CultivarVariant);
  return repo.save(repo.create({ cultivarId, text, normalized: normalizeName(text) }));
}

/** The variant texts of a record, sorted. */
export async function variantTexts(ds: DataSource, cultivarId: number): Promise<string[]> {
  const rows = await ds.getRepository(CultivarVariant).find({ where: { cultivarId } });
  return rows.map((r) => r.text).sort();
}
