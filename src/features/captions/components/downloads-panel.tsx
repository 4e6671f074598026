import { Link } from 'react-router';
import type { TrackDto } from '@shared/schemas/captions';
import { buttonClasses } from '@/components/button';
import { stopTrackUrl, trackExportUrl, transcriptHref } from '../api/captions-api';

/**
 * Files to take away: the open track as WebVTT or SRT, the stops as a WebVTT chapters track and
 * as a metadata track naming each stop's record, and the transcript page.
 */
export function DownloadsPanel({ tourId, track, unsaved }: { tourId: number; track: TrackDto | null; unsaved: boolean }) {
  const link = buttonClasses('secondary', 'sm');
  return (
    <div className="space-y-5">
      <section aria-labelledby="dl-captions">
        <h3 id="dl-captions" className="text-lg">
          Captions{track ? ` — ${track.label}` : ''}
        </h3>
        {track ? (
          <>
            <p className="text-sm text-ink-soft">The cues as last saved, ready for other players and editors.</p>
            {unsaved && (
              <p role="status" className="mt-1 text-sm font-bold text-maple">
                Your latest changes are not saved yet; the files hold the version before them.
              </p>
            )}
            <div className="mt-2 flex flex-wrap gap-2">
              <a className={link} href={trackExportUrl(track.id, 'vtt')} download>
                WebVTT (.vtt)
              </a>
              <a className={link} href={trackExportUrl(track.id, 'srt')} download>
                SubRip (.srt)
              </a>
            </div>
          </>
        ) : (
          <p className="text-sm">Open or create a caption track to download it.</p>
        )}
      </section>
      <section aria-labelledby="dl-stops">
        <h3 id="dl-stops" className="text-lg">
          Stops
        </h3>
        <p className="text-sm text-ink-soft">
          Two WebVTT files for other video players: the stops by name and time, and which cultivar record each stop shows.
        </p>
        <div className="mt-2 flex flex-wrap gap-2">
          <a className={link} href={stopTrackUrl(tourId, 'chapters')} download={`tour-${tourId}-chapters.vtt`}>
            Stop list (.vtt)
          </a>
          <a className={link} href={stopTrackUrl(tourId, 'metadata')} download={`tour-${tourId}-metadata.vtt`}>
            Records shown at each stop (.vtt)
          </a>
        </div>
      </section>
      <section aria-labelledby="dl-transcript">
        <h3 id="dl-transcript" className="text-lg">
          Transcript
        </h3>
        <p className="text-sm text-ink-soft">The captions as readable paragraphs, each linking to its moment in the tour; prints cleanly.</p>
        <Link className={`${link} mt-2`} to={transcriptHref(tourId, track?.lang)}>
          Open the transcript page
        </Link>
      </section>
    </div>
  );
}
