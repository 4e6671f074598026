import type { WatchStop } from '@shared/schemas/watch';
import { CultivarName } from '@/components/cultivar-name';
import { MomentThumb } from '@/components/moment-thumb';
import { clockText } from '@/lib/tour-moment';
import { durationInWords } from '../lib/media-format';
import { stopName } from '../lib/watch-links';

/**
 * "Jump to a tree": the stops as a plain list, each a button that plays from that stop; the one
 * playing now is marked (aria-current), so the trail's order can be read as text too.
 */
export function StopsList({ stops, currentIndex, onGo }: { stops: readonly WatchStop[]; currentIndex: number; onGo: (index: number) => void }) {
  if (stops.length === 0) return <p className="mt-2 text-ink-soft">No stops yet.</p>;
  return (
    <ol className="mt-2 space-y-1.5">
      {stops.map((stop, i) => {
        const current = i === currentIndex;
        const seconds = stop.startMs / 1000;
        return (
          <li key={stop.id}>
            <button
              type="button"
              onClick={() => onGo(i)}
              aria-current={current ? 'true' : undefined}
              className={`flex w-full items-center gap-3 rounded-md border p-1.5 text-left hover:border-edge hover:bg-bark-wash ${current ? 'border-moss bg-moss-wash' : 'border-rule bg-card'}`}
            >
              <span className="w-20 shrink-0 overflow-hidden rounded">
                <MomentThumb thumbnail={stop.thumbnail} />
              </span>
              <span className="min-w-0 flex-1 text-sm">
                <span className="block font-bold">
                  <span className="font-ui">{i + 1}.</span> {stop.cultivar ? <CultivarName record={stop.cultivar} /> : stopName({ number: i + 1, name: null, title: stop.title })}
                </span>
                <span className="block font-ui text-xs text-ink-soft tabular-nums">
                  <span aria-hidden="true">{clockText(stop.startMs)}</span>
                  <span className="sr-only">at {durationInWords(seconds)}</span>
                  {current && <span className="ml-2 font-bold text-moss-deep">Playing now</span>}
                </span>
              </span>
            </button>
          </li>
        );
      })}
    </ol>
  );
}
