import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { TreeCard as TreeCardData, WatchStop } from '@shared/schemas/watch';
import { Button } from '@/components/button';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { HearItButton } from '@/components/hear-it-button';
import { ZoneFitNote } from '@/components/zone-fit-badge';
import { useReaderPrefs } from '@/features/preferences/hooks/use-reader-prefs';
import { clockText } from '@/lib/tour-moment';
import { cardZoneFit, hardinessText, SEASON_WORDS, sizeLines } from '../lib/tree-card-view';
import { stopName } from '../lib/watch-links';

/** Props of TreeCardPanel: every stop, which one is playing (−1 between stops) and how to go to one. */
export interface TreeCardPanelProps {
  stops: readonly WatchStop[];
  currentIndex: number;
  /** Where the playhead is, for the "between stops" state. */
  nextIndex: number | null;
  onGo: (index: number) => void;
}

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="border-t border-rule py-2 first:border-t-0">
      <dt className="font-ui text-xs font-bold tracking-wide text-bark uppercase">{label}</dt>
      <dd className="mt-0.5">{children}</dd>
    </div>
  );
}

/** A named colour swatch: the colour shows, the name says it, so colour is never the only cue. */
function Swatch({ label, hex, accentHex }: { label: string; hex: string; accentHex: string | null }) {
  return (
    <li className="inline-flex items-center gap-1.5 rounded-full border border-rule bg-card py-0.5 pr-2.5 pl-1 text-sm">
      <span
        aria-hidden="true"
        className="inline-block size-4 rounded-full border border-edge"
        style={{ background: accentHex ? `linear-gradient(135deg, ${hex} 0 55%, ${accentHex} 55% 100%)` : hex }}
      />
      {label}
    </li>
  );
}

function RecordCard({ card }: { card: TreeCardData }) {
  const { prefs, setUnitSystem } = useReaderPrefs();
  const sizes = sizeLines(card.size, prefs.unitSystem);
  const fit = cardZoneFit(card.hardiness, prefs.zone, prefs.container);
  return (
    <>
      <h3 className="text-xl leading-snug text-moss-deep">
        <CultivarName record={card} />
      </h3>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <FictionalMark record={card} />
        {card.groupName && <span className="font-ui text-sm text-ink-soft">{card.groupName}</span>}
      </div>

      {card.pronunciation && (
        <div className="mt-3 rounded-md bg-moss-wash/70 px-3 py-2">
          <p className="text-sm">
            <span className="font-ui text-xs font-bold tracking-wide text-bark uppercase">Say it</span>{' '}
            <span className="font-bold">{card.pronunciation.text}</span>
          </p>
          {card.pronunciation.source === 'hepburn' && <p className="font-ui text-xs text-ink-soft">Spelt out from the Hepburn syllables of the name.</p>}
          <div className="mt-2">
            <HearItButton
              epithet={card.epithet}
              hepburn={card.pronunciation.source === 'hepburn'}
              respelling={card.pronunciation.text}
              label={`Hear it: ‘${card.epithet}’`}
              size="sm"
            />
          </div>
        </div>
      )}
      {card.meaning && <p className="mt-3 text-sm text-ink-soft">{card.meaning}</p>}

      <dl className="mt-3">
        {card.keyTraits.map((t) => (
          <Row key={t.trait} label={t.label}>
            {t.values.map((v) => v.label).join(', ')}
          </Row>
        ))}
        {card.colours.length > 0 && (
          <Row label="Leaf colour">
            <ul className="space-y-1.5">
              {card.colours.map((c) => (
                <li key={c.season} className="flex flex-wrap items-center gap-1.5">
                  <span className="w-16 font-ui text-sm text-ink-soft">{SEASON_WORDS[c.season]}</span>
                  <ul className="flex flex-wrap gap-1.5" aria-label={`${SEASON_WORDS[c.season]} colours`}>
                    {c.swatches.map((s) => (
                      <Swatch key={s.id} label={s.label} hex={s.hex} accentHex={s.accentHex} />
                    ))}
                  </ul>
                </li>
              ))}
            </ul>
          </Row>
        )}
        {sizes.length > 0 && (
          <Row label="Size when grown">
            {sizes.map((s) => (
              <span key={s.label} className="mr-3 inline-block">
                {s.label} <span className="font-ui tabular-nums">{s.value}</span>
              </span>
            ))}
            {card.size.heightM || card.size.spreadM ? (
              <button
                type="button"
                onClick={() => setUnitSystem(prefs.unitSystem === 'metric' ? 'imperial' : 'metric')}
                className="font-ui text-sm font-bold text-moss underline underline-offset-2 hover:text-moss-deep"
              >
                {prefs.unitSystem === 'metric' ? 'Show in feet' : 'Show in metres'}
              </button>
            ) : null}
          </Row>
        )}
        {card.hardiness && (
          <Row label="Hardiness (USDA zones)">
            <p>{hardinessText(card.hardiness)}</p>
            {fit ? (
              <ZoneFitNote fit={fit} zone={prefs.zone} className="mt-1 text-sm" />
            ) : (
              <p className="mt-1 text-sm text-ink-soft">
                Set your zone under <Link to="/finder">“My garden” in the tree finder</Link> to see whether it suits your garden.
              </p>
            )}
          </Row>
        )}
        {card.container && (
          <Row label="In a container">
            <p>{card.container.label}</p>
            <p className="mt-1 text-sm text-ink-soft">
              <span className="font-bold text-ochre">Take care: </span>
              {card.container.caution}
            </p>
          </Row>
        )}
      </dl>

      <p className="mt-3">
        <Link to={card.link} className="font-bold">
          The full record of ‘{card.epithet}’
        </Link>
      </p>
    </>
  );
}

/**
 * The tree card: the record of the stop playing now (name, how to say it, traits with named colour
 * swatches, size in the reader's unit, hardiness and zone fit, container suitability and its
 * caution), or "unidentified tree", or the way to the next stop between stops. The page changes
 * `currentIndex` on the metadata track's cue changes.
 */
export function TreeCardPanel({ stops, currentIndex, nextIndex, onGo }: TreeCardPanelProps) {
  if (stops.length === 0) {
    return <p className="mt-2 text-ink-soft">The author has not marked any trees in this tour yet, so there is no tree card to show.</p>;
  }
  const stop = currentIndex >= 0 ? stops[currentIndex] : undefined;
  if (!stop) {
    const next = nextIndex != null ? stops[nextIndex] : undefined;
    return (
      <div className="mt-2" data-card-state="between">
        <h3 className="text-xl text-bark">Between stops</h3>
        {next ? (
          <>
            <p className="mt-2">
              Next on the trail: stop {nextIndex! + 1},{' '}
              <strong>{next.cultivar ? <CultivarName record={next.cultivar} /> : stopName({ number: nextIndex! + 1, name: null, title: next.title })}</strong> at{' '}
              <span className="font-ui tabular-nums">{clockText(next.startMs)}</span>.
            </p>
            <Button variant="secondary" size="sm" className="mt-3" onClick={() => onGo(nextIndex!)}>
              Go to stop {nextIndex! + 1}
            </Button>
          </>
        ) : (
          <p className="mt-2 text-ink-soft">That was the last stop of this tour. Pick a stop on the trail to see one again.</p>
        )}
      </div>
    );
  }
  return (
    <div className="mt-2" data-card-state={stop.cultivar ? 'record' : 'unidentified'} data-stop-id={stop.id}>
      <p className="font-ui text-sm text-ink-soft">
        Stop {currentIndex + 1} of {stops.length} ·{' '}
        <span className="tabular-nums">
          {clockText(stop.startMs)}–{clockText(stop.endMs)}
        </span>
      </p>
      {stop.cultivar ? (
        <div className="mt-1">
          <RecordCard card={stop.cultivar} />
        </div>
      ) : (
        <div className="mt-1">
          <h3 className="text-xl text-bark">Unidentified tree</h3>
          {stop.title.trim() && <p className="mt-1 font-bold">{stop.title}</p>}
          <p className="mt-2 text-ink-soft">Nobody has linked this tree to a cultivar record yet. If you know it, the tree finder can help you check.</p>
          <p className="mt-2">
            <Link to="/finder">Open the tree finder</Link>
          </p>
        </div>
      )}
    </div>
  );
}
