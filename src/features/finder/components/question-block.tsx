import { useId, useState, type FormEvent } from 'react';
import type { FinderQuestion } from '@shared/finder/next-question';
import { SEASONS, type LeafForm, type Season } from '@shared/traits';
import { feetToMetres, unitFor, type UnitSystem } from '@shared/units';
import { Button } from '@/components/button';
import { colourOf, SEASON_LABELS } from '@/lib/trait-words';
import { isCurrentAnswer, MAX_TYPED_HEIGHT_M, type FinderState, type QuestionValue } from '../lib/finder-state';
import { optionText, orderedOptions, QUESTION_TEXT, questionName } from '../lib/finder-words';
import { LeafFormIcon } from './leaf-form-icon';

/** What a question block needs from the page. */
export interface QuestionBlockProps {
  trait: FinderQuestion;
  state: FinderState;
  /** The season in use (chosen, or guessed from the date). */
  season: Season | null;
  system: UnitSystem;
  /** Likely answers from the next-question ranking, most likely first. */
  likely?: readonly { value: string | number; probability: number }[];
  /** Show only the likely answers up front and fold the rest away (the suggested question). */
  foldOthers?: boolean;
  onAnswer: <K extends FinderQuestion>(trait: K, value: QuestionValue[K] | undefined) => void;
  onSeason: (season: Season) => void;
  headingLevel?: 2 | 3;
}

/** Answers below this chance among the trees left are listed with the others, not as likely. */
const LIKELY_MIN = 0.05;
const LIKELY_MAX = 6;

function Swatch({ id }: { id: string }) {
  const c = colourOf(id);
  return (
    <span
      aria-hidden="true"
      className="inline-block size-6 shrink-0 rounded-full border border-edge"
      style={{ background: c.accentHex ? `linear-gradient(135deg, ${c.hex} 0 55%, ${c.accentHex} 55% 100%)` : c.hex }}
    />
  );
}

function OptionButton({
  trait,
  value,
  pressed,
  likely,
  system,
  onClick,
}: {
  trait: FinderQuestion;
  value: string | number;
  pressed: boolean;
  likely: boolean;
  system: UnitSystem;
  onClick: () => void;
}) {
  const text = optionText(trait, value, system);
  const compact = trait === 'lobeCount';
  return (
    <button
      type="button"
      aria-pressed={pressed}
      onClick={onClick}
      className={
        'flex min-h-11 items-center gap-2 rounded-md border text-left text-sm font-bold transition-colors ' +
        (compact ? 'min-w-11 justify-center px-2 ' : 'px-3 py-1.5 ') +
        (pressed ? 'border-moss-deep bg-moss text-card hover:bg-moss-deep' : likely ? 'border-moss bg-moss-wash text-moss-deep hover:bg-card' : 'border-edge bg-card text-ink hover:bg-bark-wash')
      }
    >
      {trait === 'leafForm' && <LeafFormIcon form={value as LeafForm} className={`size-8 shrink-0 ${pressed ? '' : 'text-moss'}`} />}
      {trait === 'colour' && <Swatch id={String(value)} />}
      <span>{text}</span>
      {pressed && <span aria-hidden="true">✓</span>}
    </button>
  );
}

function TypedHeight({ system, onHeight }: { system: UnitSystem; onHeight: (metres: number) => void }) {
  const id = useId();
  const unit = unitFor(system, 'tree');
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const n = Number(text.trim().replace(',', '.'));
    const metres = unit === 'ft' ? feetToMetres(Number.isFinite(n) ? n : 0) : n;
    if (!text.trim() || !Number.isFinite(n) || n <= 0 || metres > MAX_TYPED_HEIGHT_M) {
      setError(`Type a height above 0 and up to ${unit === 'ft' ? '328 ft' : '100 m'}.`);
      return;
    }
    setError(null);
    onHeight(Math.round(metres * 100) / 100);
    setText('');
  };
  return (
    <form onSubmit={submit} noValidate className="mt-3">
      <label htmlFor={id} className="block text-sm font-bold">
        Or type about how tall, in {unit === 'ft' ? 'feet' : 'metres'}
      </label>
      <div className="mt-1 flex flex-wrap items-center gap-2">
        <input
          id={id}
          inputMode="decimal"
          value={text}
          onChange={(e) => setText(e.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-e` : undefined}
          className="w-24 rounded-md border border-edge bg-card px-3 py-2"
        />
        <Button type="submit" variant="secondary" size="sm" className="min-h-11">
          Use this height
        </Button>
      </div>
      {error && (
        <p id={`${id}-e`} role="alert" className="mt-1 text-sm font-bold text-maple">
          {error}
        </p>
      )}
    </form>
  );
}

/** One question of the key with its answers as buttons; pressing the current answer again clears it. */
export function QuestionBlock({ trait, state, season, system, likely = [], foldOthers = false, onAnswer, onSeason, headingLevel = 3 }: QuestionBlockProps) {
  const id = useId();
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  // "Likely" means a real share of the trees left, not every value some record happens to give.
  const options = orderedOptions(trait, likely.filter((o) => o.probability >= LIKELY_MIN).slice(0, LIKELY_MAX));
  const answered = trait === 'colour' ? state.answers.colour !== undefined : state.answers[trait] !== undefined;
  const needsSeason = trait === 'colour' && !season;
  const toggle = (value: string | number) => {
    if (isCurrentAnswer(state, trait, value)) onAnswer(trait, undefined);
    else onAnswer(trait, value as QuestionValue[typeof trait]);
  };
  const render = (list: typeof options) => (
    <ul className="flex flex-wrap gap-2">
      {list.map((o) => (
        <li key={String(o.value)}>
          <OptionButton
            trait={trait}
            value={o.value}
            likely={o.likely}
            pressed={isCurrentAnswer(state, trait, o.value)}
            system={system}
            onClick={() => toggle(o.value)}
          />
        </li>
      ))}
    </ul>
  );
  const likelyOnes = options.filter((o) => o.likely);
  const fold = foldOthers && likelyOnes.length > 0 && likelyOnes.length < options.length;

  return (
    <section aria-labelledby={`${id}-h`} className="space-y-3">
      <div>
        <Heading id={`${id}-h`} className="text-lg">
          {questionName(trait, season)}
        </Heading>
        <p className="text-ink-soft">{QUESTION_TEXT[trait]}</p>
      </div>

      {trait === 'colour' && (
        <fieldset>
          <legend className="text-sm font-bold">Season you are looking in</legend>
          <div className="mt-1 flex flex-wrap gap-2">
            {SEASONS.map((s) => (
              <label key={s} className="flex min-h-11 cursor-pointer items-center gap-2 rounded-md border border-rule bg-paper px-3 text-sm">
                <input type="radio" name={`${id}-season`} checked={season === s} onChange={() => onSeason(s)} className="size-4 accent-moss" />
                <span className="capitalize">{SEASON_LABELS[s]}</span>
              </label>
            ))}
          </div>
          {!state.season && season && <p className="mt-1 text-sm text-ink-soft">Guessed from today’s date for the northern hemisphere; change it if yours differs.</p>}
        </fieldset>
      )}

      {needsSeason ? (
        <p className="text-sm text-ink-soft">Pick the season first: leaf colours change through the year.</p>
      ) : fold ? (
        <>
          <p className="text-sm font-bold text-moss-deep">Likely answers among the trees left</p>
          {render(likelyOnes)}
          <details>
            <summary className="cursor-pointer text-sm font-bold text-moss">Other answers</summary>
            <div className="mt-2">{render(options.filter((o) => !o.likely))}</div>
          </details>
        </>
      ) : (
        render(options)
      )}

      {trait === 'height' && <TypedHeight system={system} onHeight={(m) => onAnswer('height', { min: m, max: m })} />}

      {answered && (
        <Button variant="quiet" size="sm" onClick={() => onAnswer(trait, undefined)}>
          Clear this answer
        </Button>
      )}
    </section>
  );
}
