import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router';
import type { CultivarSummary } from '@shared/schemas/cultivars';
import { Button, buttonClasses } from '@/components/button';
import { ClipVideo } from '@/components/clip-video';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { ErrorState } from '@/components/error-state';
import { FormError } from '@/components/form-error';
import { Page } from '@/components/page';
import { Loading } from '@/components/spinner';
import { errorMessage, isApiError } from '@/lib/api';
import { useMe } from '@/lib/auth';
import { tourMomentHref } from '@/lib/tour-moment';
import { useAnswerLearnQuestion, useLearnQuestion, type LearnAnswer, type LearnQuestion } from '../api/learn-api';
import { learnKeyAction } from '../lib/learn-keyboard';
import { ProgressPanel } from './progress-panel';

function OptionButton({
  index,
  option,
  chosen,
  result,
  disabled,
  onPick,
}: {
  index: number;
  option: CultivarSummary;
  chosen: boolean;
  result: LearnAnswer | undefined;
  disabled: boolean;
  onPick: () => void;
}) {
  const isAnswer = !!result && result.answer?.id === option.id;
  const wrongPick = !!result && chosen && !result.correct;
  const tone = isAnswer ? 'border-moss-deep bg-moss-wash text-moss-deep' : wrongPick ? 'border-maple bg-maple-wash text-maple' : 'border-edge bg-card text-ink hover:bg-bark-wash';
  return (
    <button
      type="button"
      onClick={onPick}
      disabled={disabled}
      aria-describedby={isAnswer || wrongPick ? `learn-mark-${index}` : undefined}
      className={`flex min-h-14 w-full items-center gap-3 rounded-lg border-2 px-3 py-2 text-left font-bold transition-colors disabled:cursor-default ${tone}`}
    >
      <kbd className="grid size-8 shrink-0 place-items-center rounded-md border border-edge bg-paper font-ui text-sm text-ink" aria-hidden="true">
        {index + 1}
      </kbd>
      <span className="flex-1">
        <CultivarName record={option} />
        {isAnswer && (
          <span id={`learn-mark-${index}`} className="mt-0.5 block font-ui text-sm">
            <span aria-hidden="true">✓ </span>Right answer
          </span>
        )}
        {wrongPick && (
          <span id={`learn-mark-${index}`} className="mt-0.5 block font-ui text-sm">
            <span aria-hidden="true">✗ </span>Your pick
          </span>
        )}
      </span>
    </button>
  );
}

function Round({ question, onNext }: { question: LearnQuestion; onNext: () => void }) {
  const answer = useAnswerLearnQuestion();
  const [chosenId, setChosenId] = useState<number | null>(null);
  const result = answer.data;
  const answered = !!result;
  const nextButton = useRef<HTMLButtonElement>(null);

  const pick = (option: CultivarSummary) => {
    if (answered || answer.isPending) return;
    setChosenId(option.id);
    answer.mutate({ token: question.token, chosenId: option.id });
  };

  useEffect(() => {
    if (answered) nextButton.current?.focus();
  }, [answered]);

  // Latest values for the key handler without re-binding it on every render.
  const live = useRef({ answered, busy: answer.isPending, pick, onNext, options: question.options });
  live.current = { answered, busy: answer.isPending, pick, onNext, options: question.options };

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const t = e.target as HTMLElement | null;
      const action = learnKeyAction(
        { key: e.key, ctrlKey: e.ctrlKey, metaKey: e.metaKey, altKey: e.altKey, targetTag: t?.tagName, targetEditable: t?.isContentEditable },
        { answered: live.current.answered, busy: live.current.busy, optionCount: live.current.options.length },
      );
      if (!action) return;
      e.preventDefault();
      if (action.type === 'answer') {
        const option = live.current.options[action.index];
        if (option) live.current.pick(option);
      } else live.current.onNext();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);

  const clip = question.clip;
  return (
    <section aria-labelledby="round-h" className="space-y-4">
      <h2 id="round-h" className="text-2xl text-moss-deep">
        Which tree is this?
      </h2>
      <ClipVideo videoUrl={clip.videoUrl} posterUrl={clip.posterUrl} startMs={clip.startMs} endMs={clip.endMs} label="Clip of the tree to name" autoPlay />
      <fieldset>
        <legend className="font-bold">Pick its name</legend>
        <ul className="mt-2 grid gap-2 sm:grid-cols-2">
          {question.options.map((o, i) => (
            <li key={o.id}>
              <OptionButton index={i} option={o} chosen={chosenId === o.id} result={result} disabled={answered || answer.isPending} onPick={() => pick(o)} />
            </li>
          ))}
        </ul>
      </fieldset>
      <FormError message={answer.isError ? errorMessage(answer.error) : null}>
        {isApiError(answer.error) && answer.error.code.startsWith('learn_token') && (
          <Button variant="secondary" size="sm" onClick={onNext}>
            Take a new clip
          </Button>
        )}
      </FormError>

      <div role="status" aria-live="polite">
        {result && (
          <div className={`rounded-lg border-l-4 p-4 ${result.correct ? 'border-moss bg-moss-wash' : 'border-maple bg-maple-wash'}`}>
            <p className="text-lg font-bold text-ink">
              {result.correct ? (
                <>
                  <span aria-hidden="true">✓ </span>Right.
                </>
              ) : (
                <>
                  <span aria-hidden="true">✗ </span>Not this time.
                </>
              )}{' '}
              {result.answer && (
                <>
                  It is <CultivarName record={result.answer} />.
                </>
              )}
            </p>
            {result.answer && (
              <div className="mt-1">
                <FictionalMark record={result.answer} />
              </div>
            )}
            <p className="mt-2 flex flex-wrap gap-x-5 gap-y-1">
              {result.answer && <Link to={`/cultivars/${result.answer.slug}`}>Open the cultivar record</Link>}
              <Link to={tourMomentHref(clip.tourId, clip.startMs)}>Watch this moment in its tour</Link>
            </p>
            {!result.recorded && <p className="mt-2 text-sm text-ink">Not kept: sign in to keep your scores.</p>}
          </div>
        )}
      </div>

      <div className="flex flex-wrap items-center gap-4">
        <button ref={nextButton} type="button" onClick={onNext} disabled={!answered} className={buttonClasses('primary')}>
          Next clip
        </button>
        <p className="hidden text-sm text-ink-soft sm:block">
          Keys: <kbd className="font-ui font-bold">1</kbd>–<kbd className="font-ui font-bold">4</kbd> to answer, <kbd className="font-ui font-bold">N</kbd> for the
          next clip.
        </p>
      </div>
    </section>
  );
}

/**
 * /learn: a clip from a tour plays without its name and the learner picks the cultivar from four
 * look-alikes; signed-in learners' answers count towards their progress.
 */
export function LearnPage() {
  const [round, setRound] = useState(0);
  const question = useLearnQuestion(round);
  const { data: me } = useMe();

  let body;
  if (question.isPending) body = <Loading label="Picking a clip…" />;
  else if (question.isError) {
    body = isApiError(question.error, 'learn_not_ready') ? (
      <div className="rounded-lg border border-dashed border-edge bg-card p-6">
        <h2 className="text-xl">Learn mode is not ready yet</h2>
        <p className="mt-2">{question.error.message}</p>
        <Button variant="secondary" className="mt-4" onClick={() => void question.refetch()}>
          Try again
        </Button>
      </div>
    ) : (
      <ErrorState title="No clip could be picked" error={question.error} onRetry={() => void question.refetch()} />
    );
  } else body = <Round key={question.data.token} question={question.data} onNext={() => setRound((r) => r + 1)} />;

  return (
    <Page
      title="Learn the trees"
      width="wide"
      intro="A short clip from a garden tour plays without its name. Which of the four look-alike cultivars is it?"
    >
      <div className="grid gap-8 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <div>{body}</div>
        <aside className="space-y-4">
          <ProgressPanel signedIn={!!me} />
        </aside>
      </div>
    </Page>
  );
}
