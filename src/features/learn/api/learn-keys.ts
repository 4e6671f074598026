/** Cache keys of learn mode: one question per round, the signed-in learner's progress. */
export const learnKeys = {
  all: ['learn'] as const,
  question: (round: number) => [...learnKeys.all, 'question', round] as const,
  progress: () => [...learnKeys.all, 'progress'] as const,
};
