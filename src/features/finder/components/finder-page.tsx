import { useMemo, type ReactNode } from 'react';
import { useSearchParams } from 'react-router';
import { answeredTraits, type FinderTrait } from '@shared/finder/score';
import { FINDER_QUESTIONS, type FinderQuestion } from '@shared/finder/next-question';
import type { Season } from '@shared/traits';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { Page } from '@/components/page';
import { Loading, Spinner } from '@/components/spinner';
import { seasonForMonth } from '@/lib/trait-words';
import { GardenSettingsPanel } from '@/features/preferences/components/garden-settings';
import { useReaderPrefs } from '@/features/preferences/hooks/use-reader-prefs';
import { useFinder, type FinderQuestionDto, type FinderRequestBody, type FinderResponse } from '../api/finder-api';
import { answeredCount, readFinderState, withAnswer, withSeason, writeFinderState, type FinderState, type QuestionValue } from '../lib/finder-state';
import { answerText, questionName } from '../lib/finder-words';
import { CandidateCard } from './candidate-card';
import { QuestionBlock } from './question-block';

/** How many candidates the finder lists. */
export const FINDER_LIMIT = 12;

function YourAnswers({
  state,
  season,
  system,
  onClear,
  onStartAgain,
}: {
  state: FinderState;
  season: Season | null;
  system: 'metric' | 'imperial';
  onClear: (trait: FinderTrait) => void;
  onStartAgain: () => void;
}) {
  const traits = answeredTraits(state.answers);
  if (!traits.length) return null;
  return (
    <section aria-labelledby="answers-h" className="rounded-lg border border-rule bg-card p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="answers-h" className="text-lg">
          Your answers ({traits.length})
        </h2>
        <Button variant="secondary" size="sm" onClick={onStartAgain}>
          Start again
        </Button>
      </div>
      <a href="#matches-h" className="mt-2 inline-block text-sm font-bold lg:hidden">
        Jump to the matches
      </a>
      <ul className="mt-2 flex flex-wrap gap-2">
        {traits.map((t) => {
          const name = questionName(t, t === 'colour' ? state.answers.colour?.season ?? season : season);
          return (
            <li key={t} className="inline-flex items-center gap-1 rounded-full border border-moss bg-moss-wash py-0.5 pr-1 pl-3 text-sm text-moss-deep">
              <span>
                <span className="font-bold">{name}:</span> {answerText(t, state.answers, system)}
              </span>
              <button
                type="button"
                onClick={() => onClear(t)}
                aria-label={`Remove answer: ${name}`}
                className="grid size-8 place-items-center rounded-full font-bold hover:bg-card"
              >
                <span aria-hidden="true">×</span>
              </button>
            </li>
          );
        })}
      </ul>
    </section>
  );
}

function Suggested({
  next,
  renderBlock,
}: {
  next: FinderResponse['next'];
  renderBlock: (q: FinderQuestion, likely: FinderQuestionDto['options'], fold: boolean, level: 2 | 3) => ReactNode;
}) {
  const top = next.questions[0];
  if (!top) {
    return (
      <div className="rounded-lg border border-rule bg-card p-4">
        <p className="font-bold">Nothing left to ask that would split these trees further.</p>
        <p className="mt-1 text-ink-soft">Compare the top cards side by side, or watch their tour moments.</p>
      </div>
    );
  }
  return (
    <section aria-labelledby="suggested-h" className="rounded-lg border-2 border-moss bg-card p-4 shadow-leaf">
      <p id="suggested-h" className="font-ui text-sm font-semibold tracking-wide text-moss-deep uppercase">
        Most useful next: {questionName(top.trait, top.season)}
      </p>
      <p className="mt-1 text-sm text-ink-soft">
        {next.mode === 'starter'
          ? 'Start with what you can tell at a glance.'
          : 'Of the questions left, its answer splits the trees still in the running best.'}
      </p>
      <div className="mt-3">{renderBlock(top.trait, top.options, true, 2)}</div>
    </section>
  );
}

/**
 * /finder: the tree finder. The learner answers any questions in any order; the most useful next
 * question stands out, the rest fold away, and the ranked candidates update as they go.
 */
export function FinderPage() {
  const [params, setParams] = useSearchParams();
  const state = useMemo(() => readFinderState(params), [params]);
  const { prefs } = useReaderPrefs();
  const season = state.season ?? seasonForMonth(new Date().getMonth() + 1);
  const body: FinderRequestBody = {
    answers: state.answers,
    ...(season ? { season } : {}),
    container: prefs.container,
    ...(prefs.zone ? { zone: prefs.zone } : {}),
    limit: FINDER_LIMIT,
  };
  const finder = useFinder(body);
  const count = answeredCount(state);

  const go = (next: FinderState) => setParams(writeFinderState(next), { preventScrollReset: true });
  const onAnswer = <K extends FinderQuestion>(trait: K, value: QuestionValue[K] | undefined) => {
    // A colour answered under a guessed season fixes that season in the address.
    const base = trait === 'colour' && !state.season && season ? { ...state, season } : state;
    go(withAnswer(base, trait, value));
  };
  const onSeason = (s: Season) => go(withSeason(state.season ? state : { ...state, season }, s));

  const renderBlock = (q: FinderQuestion, likely: FinderQuestionDto['options'], fold: boolean, level: 2 | 3) => (
    <QuestionBlock
      trait={q}
      state={state}
      season={season}
      system={prefs.unitSystem}
      likely={likely}
      foldOthers={fold}
      onAnswer={onAnswer}
      onSeason={onSeason}
      headingLevel={level}
    />
  );

  let questions: ReactNode = null;
  let results: ReactNode;
  if (finder.isPending) {
    results = <Loading label="Ranking the trees…" />;
  } else if (finder.isError) {
    results = <ErrorState title="The finder could not rank the trees" error={finder.error} onRetry={() => void finder.refetch()} />;
  } else {
    const data = finder.data;
    const top = data.next.questions[0]?.trait;
    const ranked = data.next.questions.slice(1).map((q) => q.trait);
    const rest = FINDER_QUESTIONS.filter((q) => q !== top && !ranked.includes(q));
    const more = [...ranked, ...rest];
    const likelyFor = (q: FinderQuestion) => data.next.questions.find((x) => x.trait === q)?.options ?? [];
    questions = (
      <>
        <Suggested next={data.next} renderBlock={renderBlock} />
        <details className="rounded-lg border border-rule bg-card p-4">
          <summary className="cursor-pointer font-bold text-moss">More questions ({more.length}), answer in any order</summary>
          <div className="mt-4 space-y-6">
            {more.map((q) => (
              <div key={q} className="border-t border-rule pt-4 first:border-0 first:pt-0">
                {renderBlock(q, likelyFor(q), false, 3)}
              </div>
            ))}
          </div>
        </details>
      </>
    );
    if (data.total === 0) {
      results = <EmptyState title="No cultivar records with traits yet">Once moderators add leaf forms, colours and habits to records, the finder can rank them.</EmptyState>;
    } else if (count === 0) {
      results = (
        <EmptyState title="Answer a question to rank the trees">
          {data.total} cultivar record{data.total === 1 ? '' : 's'} to choose from. Start with the leaf form, the colour now or the shape of the tree: each answer moves the
          closest records to the top.
        </EmptyState>
      );
    } else {
      // Records where every checked answer conflicts are folded away, unless nothing else is left.
      const ruledOut = (c: (typeof data.candidates)[number]) => c.matched.length === 0 && c.partial.length === 0 && c.conflicted.length > 0;
      const inRunning = data.candidates.filter((c) => !ruledOut(c));
      const shown = inRunning.length ? inRunning : data.candidates;
      const folded = inRunning.length ? data.candidates.filter(ruledOut) : [];
      const card = (c: (typeof data.candidates)[number], rank: number) => (
        <li key={c.cultivar.id}>
          <CandidateCard candidate={c} rank={rank} answers={state.answers} system={prefs.unitSystem} zone={data.zone} />
        </li>
      );
      results = (
        <>
          <p className="text-ink-soft">
            {inRunning.length
              ? `${inRunning.length} of ${data.total} records still in the running, closest first.`
              : `No record matches any of your answers; here are the ${data.candidates.length} closest. Try clearing an answer you are unsure of.`}
            {!prefs.zone && ' Set your zone under “My garden” to see whether each one suits your garden.'}
          </p>
          <ol className="mt-4 space-y-4" aria-label="Closest matches">
            {shown.map((c, i) => card(c, i + 1))}
          </ol>
          {folded.length > 0 && (
            <details className="mt-4 rounded-lg border border-rule bg-paper p-4">
              <summary className="cursor-pointer font-bold text-moss">
                {folded.length} record{folded.length === 1 ? '' : 's'} ruled out by your answers
              </summary>
              <ol className="mt-4 space-y-4" aria-label="Ruled out" start={shown.length + 1}>
                {folded.map((c, i) => card(c, shown.length + i + 1))}
              </ol>
            </details>
          )}
        </>
      );
    }
  }

  return (
    <Page
      title="Tree finder"
      width="wide"
      intro="Say what you can see on the tree, in any order, and skip what you cannot tell. The cultivar records that match best come first, with the tour moments that show them."
    >
      <div className="grid gap-8 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
        <div className="space-y-5">
          <GardenSettingsPanel />
          <YourAnswers
            state={state}
            season={season}
            system={prefs.unitSystem}
            onClear={(t) => go(withAnswer(state, t as FinderQuestion, undefined))}
            onStartAgain={() => go({ answers: {}, season: null })}
          />
          {questions}
        </div>
        <section aria-labelledby="matches-h">
          <div className="flex items-center gap-3">
            <h2 id="matches-h" className="text-2xl text-moss-deep">
              Closest matches
            </h2>
            {finder.isFetching && !finder.isPending && (
              <span role="status" className="flex items-center gap-2 text-sm text-ink-soft">
                <Spinner className="size-4" /> Updating…
              </span>
            )}
          </div>
          <div className="mt-3">{results}</div>
        </section>
      </div>
    </Page>
  );
}
