import { QueryFailedError, type DataSource, type EntityManager } from 'typeorm';
import { cleanCueSettings } from '../../../shared/captions/cue-settings';
import { sortCues } from '../../../shared/captions/cue-order';
import { detectFormat, parseCaptions } from '../../../shared/captions/detect-format';
import { checkCues, type QualityIssue } from '../../../shared/captions/quality';
import { serializeSrt } from '../../../shared/captions/srt';
import { serializeVtt } from '../../../shared/captions/webvtt';
import type { CreateTrackInput, CueInput, ImportPreview, ImportTrackInput, SaveCuesInput, StoredCue, UpdateTrackInput } from '../../../shared/schemas/captions';
import { CaptionTrack } from '../../db/entities/caption-track.entity';
import { CueRow } from '../../db/entities/cue.entity';
import { Tour } from '../../db/entities/tour.entity';
import { User } from '../../db/entities/user.entity';
import { Conflict, HttpError, NotFound } from '../../errors/http-error';
import type { TourService } from '../tours/tour.service';
import { decodeCaptionBytes } from './caption-decode';
import { presentCue } from './caption.presenter';
import { canonicalLanguageTag } from './lang-tag';
import { buildTranscript, type TranscriptParagraph } from './transcript';

/** Rows per INSERT when a whole cue list is written (keeps each statement well under max_allowed_packet). */
const INSERT_CHUNK = 500;

/** A caption file that cannot be read at all: 422 with the reason. */
export class CaptionFileRefused extends HttpError {
  constructor(code: string, message: string) {
    super(422, code, message);
  }
}

/** A track with the number of cues it holds, ready for the presenter. */
export interface TrackWithCount {
  track: CaptionTrack;
  cueCount: number;
}

/** A file for download: name, type and body. */
export interface ExportFile {
  filename: string;
  contentType: string;
  body: string;
}

function isDuplicateKey(err: unknown): boolean {
  return err instanceof QueryFailedError && (err as QueryFailedError & { code?: string }).code === 'ER_DUP_ENTRY';
}

function trackExists(lang: string): Conflict {
  return new Conflict('track_exists', `This tour already has a caption track in "${lang}". Replace its cues or choose another language.`, {
    lang: 'A track in this language exists.',
  });
}

function utcMoment(d: Date): string {
  return `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

/** A file-name-safe form of a tour title: ASCII letters and digits joined by hyphens. */
export function fileStem(title: string): string {
  const stem = title
    .normalize('NFKD')
    .replace(/\p{M}+/gu, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/, '');
  return stem || 'tour';
}

/** Cues as stored: sorted in playing order, settings reduced to the ones that take effect. */
function normaliseCues(cues: readonly CueInput[]): StoredCue[] {
  return sortCues(
    cues.map((c) => ({
      id: c.id === undefined || c.id === null || c.id === '' ? null : c.id,
      startMs: c.startMs,
      endMs: c.endMs,
      text: c.text.replace(/\r\n?/g, '\n'),
      settings: cleanCueSettings(c.settings).settings,
    })),
  );
}

/**
 * Caption tracks of a tour: create, preview and import files, whole-list autosave with a version
 * check, export, and the transcript. Visibility and edit rights are the tour's.
 */
export class CaptionService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly tours: TourService,
  ) {}

  private async counts(trackIds: number[], m: EntityManager = this.dataSource.manager): Promise<Map<number, number>> {
    const map = new Map<number, number>();
    if (!trackIds.length) return map;
    const rows: { trackId: number; n: string | number }[] = await m
      .getRepository(CueRow)
      .createQueryBuilder('c')
      .select('c.trackId', 'trackId')
      .addSelect('COUNT(*)', 'n')
      .where('c.trackId IN (:...ids)', { ids: trackIds })
      .groupBy('c.trackId')
      .getRawMany();
    for (const r of rows) map.set(Number(r.trackId), Number(r.n));
    return map;
  }

  private async withCount(track: CaptionTrack, m?: EntityManager): Promise<TrackWithCount> {
    return { track, cueCount: (await this.counts([track.id], m)).get(track.id) ?? 0 };
  }

  /** Every track of a tour the viewer may see, in the order they were added. */
  async list(tourId: number, viewer: User | undefined): Promise<TrackWithCount[]> {
    await this.tours.getVisible(tourId, viewer);
    const tracks = await this.dataSource.getRepository(CaptionTrack).find({ where: { tourId }, order: { id: 'ASC' } });
    const counts = await this.counts(tracks.map((t) => t.id));
    return tracks.map((track) => ({ track, cueCount: counts.get(track.id) ?? 0 }));
  }

  /** An empty track to write captions into. */
  async create(tourId: number, user: User, input: CreateTrackInput): Promise<TrackWithCount> {
    await this.tours.getEditable(tourId, user);
    const { tag } = canonicalLanguageTag(input.lang);
    const repo = this.dataSource.getRepository(CaptionTrack);
    if (await repo.existsBy({ tourId, lang: tag })) throw trackExists(tag);
    try {
      const track = await repo.save(repo.create({ tourId, lang: tag, label: input.label, version: 1, updatedById: user.id }));
      return { track: await repo.findOneByOrFail({ id: track.id }), cueCount: 0 };
    } catch (err) {
      if (isDuplicateKey(err)) throw trackExists(tag);
      throw err;
    }
  }

  /**
   * Reads an uploaded caption file without storing anything: decodes the bytes, detects WebVTT or
   * SRT, parses, and lists problems by line (line 0: about the whole file, e.g. a converted
   * encoding) and the cues that run past the end of the video.
   */
  async preview(tourId: number, user: User, bytes: Buffer): Promise<ImportPreview> {
    const tour = await this.tours.getEditable(tourId, user);
    const decoded = decodeCaptionBytes(bytes);
    if (decoded.encoding === null) {
      const message = decoded.problems.map((p) => p.message).join(' ') || 'The file could not be read as text.';
      throw new CaptionFileRefused('caption_unreadable', message);
    }
    const format = detectFormat(decoded.text);
    if (format === 'unknown') {
      throw new CaptionFileRefused(
        'caption_format_unknown',
        'This file is neither WebVTT (its first line would be "WEBVTT") nor SRT (numbered blocks with times like 00:01:02,500 --> 00:01:04,000).',
      );
    }
    const parsed = parseCaptions(decoded.text, format);
    const cues: StoredCue[] = parsed.cues.map((c) => ({ id: c.id ?? null, startMs: c.startMs, endMs: c.endMs, text: c.text, settings: c.settings ?? '' }));
    const duration = tour.durationMs;
    const pastEnd = duration == null ? [] : cues.flatMap((c, i) => (c.startMs > duration || c.endMs > duration ? [i] : []));
    const problems = [
      ...decoded.problems.map((p) => ({ line: 0, message: p.message, severity: p.severity })),
      ...parsed.problems,
    ];
    if (pastEnd.length && duration != null) {
      problems.push({
        line: 0,
        message: `${pastEnd.length} cue${pastEnd.length === 1 ? '' : 's'} run past the end of the video (${(duration / 1000).toFixed(3)} s).`,
        severity: 'warning',
      });
    }
    return { format, encoding: decoded.encoding, cues, problems, pastEnd };
  }

  private async replaceCues(m: EntityManager, trackId: number, cues: readonly StoredCue[]): Promise<void> {
    await m.getRepository(CueRow).delete({ trackId });
    for (let i = 0; i < cues.length; i += INSERT_CHUNK) {
      const rows = cues.slice(i, i + INSERT_CHUNK).map((c, k) => ({
        trackId,
        seq: i + k,
        startMs: c.startMs,
        endMs: c.endMs,
        text: c.text,
        settings: c.settings,
        cueIdent: c.id,
      }));
      await m.createQueryBuilder().insert().into(CueRow).values(rows).execute();
    }
  }

  /**
   * Stores the cues an author kept from a preview as a new track, or as the new cues of the
   * existing track in that language when `replace` is set (its version moves on, so an editor
   * open elsewhere cannot overwrite the import). One transaction: all or nothing.
   */
  async importTrack(tourId: number, user: User, input: ImportTrackInput): Promise<TrackWithCount> {
    await this.tours.getEditable(tourId, user);
    const { tag } = canonicalLanguageTag(input.lang);
    const cues = normaliseCues(input.cues);
    try {
      return await this.dataSource.transaction(async (m) => {
        const repo = m.getRepository(CaptionTrack);
        let track = await repo.findOne({ where: { tourId, lang: tag }, lock: { mode: 'pessimistic_write' } });
        if (track && !input.replace) throw trackExists(tag);
        if (track) {
          await repo.update({ id: track.id }, { label: input.label, version: track.version + 1, updatedById: user.id });
        } else {
          track = await repo.save(repo.create({ tourId, lang: tag, label: input.label, version: 1, updatedById: user.id }));
        }
        await this.replaceCues(m, track.id, cues);
        return { track: await repo.findOneByOrFail({ id: track.id }), cueCount: cues.length };
      });
    } catch (err) {
      if (isDuplicateKey(err)) throw trackExists(tag);
      throw err;
    }
  }

  private async trackOf(trackId: number): Promise<CaptionTrack> {
    const track = await this.dataSource.getRepository(CaptionTrack).findOneBy({ id: trackId });
    if (!track) throw new NotFound('No such caption track.');
    return track;
  }

  /** A track the viewer may see (the tour's visibility), or 404. */
  async getVisibleTrack(trackId: number, viewer: User | undefined): Promise<{ track: CaptionTrack; tour: Tour }> {
    const track = await this.trackOf(trackId);
    try {
      return { track, tour: await this.tours.getVisible(track.tourId, viewer) };
    } catch (err) {
      if (err instanceof NotFound) throw new NotFound('No such caption track.');
      throw err;
    }
  }

  private async getEditableTrack(trackId: number, user: User): Promise<{ track: CaptionTrack; tour: Tour }> {
    const { track } = await this.getVisibleTrack(trackId, user);
    return { track, tour: await this.tours.getEditable(track.tourId, user) };
  }

  private async cuesOf(trackId: number, m: EntityManager = this.dataSource.manager): Promise<StoredCue[]> {
    const rows = await m.getRepository(CueRow).find({ where: { trackId }, order: { seq: 'ASC', id: 'ASC' } });
    return rows.map(presentCue);
  }

  /** The track, its cues in playing order and the shared quality checks' findings on them. */
  async detail(trackId: number, viewer: User | undefined): Promise<{ track: TrackWithCount; cues: StoredCue[]; quality: QualityIssue[] }> {
    const { track } = await this.getVisibleTrack(trackId, viewer);
    const cues = await this.cuesOf(track.id);
    return { track: { track, cueCount: cues.length }, cues, quality: checkCues(cues) };
  }

  /**
   * Autosave of the whole cue list. The save is refused with 409 when someone saved since the
   * client loaded `version`; the row lock makes two simultaneous saves of one version take turns,
   * so exactly one of them wins.
   */
  async saveCues(trackId: number, user: User, input: SaveCuesInput): Promise<TrackWithCount> {
    await this.getEditableTrack(trackId, user);
    const cues = normaliseCues(input.cues);
    return this.dataSource.transaction(async (m) => {
      const repo = m.getRepository(CaptionTrack);
      const track = await repo.findOne({ where: { id: trackId }, lock: { mode: 'pessimistic_write' } });
      if (!track) throw new NotFound('No such caption track.');
      if (track.version !== input.version) throw await this.versionConflict(m, track, user);
      await this.replaceCues(m, track.id, cues);
      await repo.update({ id: track.id }, { version: track.version + 1, updatedById: user.id });
      return { track: await repo.findOneByOrFail({ id: track.id }), cueCount: cues.length };
    });
  }

  private async versionConflict(m: EntityManager, track: CaptionTrack, user: User): Promise<Conflict> {
    const by = track.updatedById ? await m.getRepository(User).findOneBy({ id: track.updatedById }) : null;
    const who = !by ? 'Someone else' : by.id === user.id ? 'You (in another window or tab)' : by.displayName;
    return new Conflict(
      'version_conflict',
      `${who} saved this track at ${utcMoment(track.updatedAt)}, while you were editing it. ` +
        'Your changes are not saved yet: look at theirs first, then keep yours or take theirs.',
    );
  }

  /** Renames a track (the cues and their version are untouched). */
  async update(trackId: number, user: User, input: UpdateTrackInput): Promise<TrackWithCount> {
    const { track } = await this.getEditableTrack(trackId, user);
    if (input.label !== undefined) await this.dataSource.getRepository(CaptionTrack).update({ id: track.id }, { label: input.label });
    return this.withCount(await this.trackOf(track.id));
  }

  /** Deletes the track and its cues (the foreign key cascades). */
  async remove(trackId: number, user: User): Promise<void> {
    const { track } = await this.getEditableTrack(trackId, user);
    await this.dataSource.getRepository(CaptionTrack).delete({ id: track.id });
  }

  /** The track as a .vtt or .srt download named after the tour and the language. */
  async exportTrack(trackId: number, viewer: User | undefined, format: 'vtt' | 'srt'): Promise<ExportFile> {
    const { track, tour } = await this.getVisibleTrack(trackId, viewer);
    const cues = await this.cuesOf(track.id);
    const filename = `${fileStem(tour.title)}.${track.lang}.${format}`;
    if (format === 'vtt') return { filename, contentType: 'text/vtt; charset=utf-8', body: serializeVtt(cues) };
    // CRLF: the line ending the Matroska description of SRT calls common, and what older players expect.
    return { filename, contentType: 'application/x-subrip; charset=utf-8', body: serializeSrt(cues, { crlf: true }) };
  }

  /** The track in `lang` (canonicalised), or the tour's first track; 404 when there is none. */
  async trackForLang(tourId: number, lang: string | undefined): Promise<CaptionTrack> {
    const repo = this.dataSource.getRepository(CaptionTrack);
    const track = lang
      ? await repo.findOneBy({ tourId, lang: canonicalLanguageTag(lang).tag })
      : await repo.findOne({ where: { tourId }, order: { id: 'ASC' } });
    if (!track) throw new NotFound(lang ? `This tour has no captions in "${lang}".` : 'This tour has no captions yet.', 'no_captions');
    return track;
  }

  /** The transcript of a tour in one language, built from its cues. */
  async transcript(tourId: number, viewer: User | undefined, lang: string | undefined): Promise<{ lang: string; paragraphs: TranscriptParagraph[] }> {
    await this.tours.getVisible(tourId, viewer);
    const track = await this.trackForLang(tourId, lang);
    return { lang: track.lang, paragraphs: buildTranscript(await this.cuesOf(track.id)) };
  }

  /** Cues of a track in playing order (for stop suggestions). */
  cues(trackId: number): Promise<StoredCue[]> {
    return this.cuesOf(trackId);
  }
}
