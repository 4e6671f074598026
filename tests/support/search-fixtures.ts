// Rows the search, watch and browse integration tests share: tours inserted as plain rows (no
// transcoding: the media fields are plain data), caption tracks with cues, and stops. Every garden,
// tour and cultivar epithet made with these helpers in the tests is invented (fictional).
import type { DataSource } from 'typeorm';
import { CaptionTrack } from '../../server/db/entities/caption-track.entity';
import { CueRow } from '../../server/db/entities/cue.entity';
import { Stop } from '../../server/db/entities/stop.entity';
import { Tour, type ThumbStripRecord } from '../../server/db/entities/tour.entity';

/** A thumbnail strip as the transcode job stores it: 160×90 tiles every `everySec` seconds, 10 × 10 a sheet. */
export function thumbStrip(count: number, everySec = 2): ThumbStripRecord {
  const perSheet = 100;
  const sheets = Array.from({ length: Math.ceil(count / perSheet) }, (_, i) => ({ file: `thumbs-${String(i + 1).padStart(3, '0')}.jpg`, width: 1600, height: 900 }));
  return { everySec, tileWidth: 160, tileHeight: 90, columns: 10, rows: 10, count, sheets };
}

/** A published tour row with media fields set as data (no files behind them). */
export async function publishedTour(ds: DataSource, authorId: number, patch: Partial<Tour> = {}): Promise<Tour> {
  const repo = ds.getRepository(Tour);
  const saved = await repo.save(
    repo.create({
      authorId,
      title: 'Fernhollow walk (fictional)',
      descriptionHtml: '',
      garden: 'Fernhollow (fictional garden)',
      state: 'published',
      publishedAt: new Date('2025-06-01T10:00:00Z'),
      durationMs: 600_000,
      width: 1280,
      height: 720,
      mediaDir: 'renditions/0/j1',
      renditions: [{ height: 720, width: 1280, file: 'rendition-720p.mp4', bytes: 1000, videoBitrate: null, copied: false }],
      posterFile: 'poster.jpg',
      thumbStrip: thumbStrip(300),
      ...patch,
    }),
  );
  return repo.findOneByOrFail({ id: saved.id });
}

/** A caption track with cues given as [startMs, endMs, text]. */
export async function trackWithCues(ds: DataSource, tourId: number, cues: [number, number, string][], lang = 'en', label = 'English'): Promise<CaptionTrack> {
  const track = await ds.getRepository(CaptionTrack).save({ tourId, lang, label, version: 1 });
  if (cues.length) {
    await ds
      .createQueryBuilder()
      .insert()
      .into(CueRow)
      .values(cues.map(([startMs, endMs, text], seq) => ({ trackId: track.id, seq, startMs, endMs, text, settings: '', cueIdent: null })))
      .execute();
  }
  return track;
}

/** A stop row (the API's rules are tested elsewhere; here stops are data). */
export function stopRow(ds: DataSource, tourId: number, startMs: number, endMs: number, cultivarId: number | null, title = ''): Promise<Stop> {
  return ds.getRepository(Stop).save({ tourId, startMs, endMs, cultivarId, title });
}
