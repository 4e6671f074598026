import { Link } from 'react-router';
import type { CultivarFull } from '@shared/schemas/cultivars';
import { HearItButton } from '@/components/hear-it-button';
import { clockText, tourMomentHref } from '@/lib/tour-moment';

/** The cue text with the words heard as the name marked (first occurrence, ignoring case). */
function MarkedCue({ text, heard }: { text: string; heard: string }) {
  const at = heard ? text.toLowerCase().indexOf(heard.toLowerCase()) : -1;
  if (at < 0) return <>{text}</>;
  return (
    <>
      {text.slice(0, at)}
      <mark className="rounded-sm bg-ochre-wash px-0.5 text-ink">{text.slice(at, at + heard.length)}</mark>
      {text.slice(at + heard.length)}
    </>
  );
}

/**
 * How to say the name: the moderators' guide when one is written, otherwise the generated
 * respelling with its Hepburn syllables; "Hear it"; and the tour moments where someone says it.
 */
export function PronunciationBlock({ record }: { record: CultivarFull }) {
  const syllables = record.hepburnSyllables;
  return (
    <section aria-labelledby="say-it" className="rounded-lg border border-rule bg-card p-5 shadow-leaf">
      <h2 id="say-it" className="text-xl text-moss-deep">
        How to say it
      </h2>
      {record.pronunciation ? (
        <>
          <p className="mt-2 text-2xl font-bold tracking-wide" lang="en">
            {record.pronunciation}
          </p>
          <p className="text-sm text-ink-soft">Guide written by a moderator.</p>
        </>
      ) : record.respelling ? (
        <>
          <p className="mt-2 text-2xl font-bold tracking-wide" lang="en">
            {record.respelling}
          </p>
          <p className="max-w-prose text-sm text-ink-soft">
            Say each syllable evenly: Japanese marks words with pitch, not stress. Vowels keep one sound each — a as in father, e as in bed, i as in machine, o as in more,
            u as in rule.
          </p>
        </>
      ) : (
        <p className="mt-2 text-ink-soft">No pronunciation guide yet; the name is read as written in English.</p>
      )}
      {syllables && (
        <div className="mt-3">
          <p className="font-ui text-sm font-bold">Syllables (Hepburn romanisation)</p>
          <ol className="mt-1 flex flex-wrap gap-x-4 gap-y-1" aria-label="Syllables, word by word">
            {syllables.map((word, i) => (
              <li key={i} className="flex flex-wrap gap-1">
                {word.map((s, j) => (
                  <span key={j} className="rounded border border-rule bg-paper px-2 py-0.5 font-ui text-sm">
                    {s}
                  </span>
                ))}
              </li>
            ))}
          </ol>
        </div>
      )}
      <div className="mt-4">
        <HearItButton epithet={record.epithet} hepburn={syllables !== null} respelling={record.respelling} label={`Hear it: ‘${record.epithet}’`} />
      </div>
      {record.spokenAt.length > 0 && (
        <div className="mt-5 border-t border-rule pt-4">
          <h3 className="font-ui text-sm font-bold">Said in a tour</h3>
          <ul className="mt-2 space-y-2">
            {record.spokenAt.map((m) => (
              <li key={`${m.tourId}-${m.trackId}-${m.startMs}`}>
                <Link to={tourMomentHref(m.tourId, m.startMs)} className="font-bold">
                  {m.tourTitle} <span className="tabular-nums">at {clockText(m.startMs)}</span>
                </Link>
                <span className="block text-sm text-ink-soft">
                  “<MarkedCue text={m.text} heard={m.heard} />”
                </span>
              </li>
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}
