import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { cultivarSummarySchema } from '@shared/schemas/cultivars';
import type { LearnAnswerInput } from '@shared/schemas/learning';
import { api, isApiError } from '@/lib/api';
import { learnKeys } from './learn-keys';

const questionSchema = z.object({
  token: z.string(),
  clip: z.object({ tourId: z.number(), startMs: z.number(), endMs: z.number(), videoUrl: z.string().nullable(), posterUrl: z.string().nullable() }),
  options: z.array(cultivarSummarySchema),
});
/** A self-test question: a clip without its name and four names to choose from. */
export type LearnQuestion = z.infer<typeof questionSchema>;

const answerSchema = z.object({ correct: z.boolean(), answer: cultivarSummarySchema.nullable(), recorded: z.boolean() });
/** Whether the pick was right, the right name, and whether it counted towards progress. */
export type LearnAnswer = z.infer<typeof answerSchema>;

const progressSchema = z.object({
  total: z.number(),
  correct: z.number(),
  days: z.array(z.object({ day: z.string(), total: z.number(), correct: z.number() })),
});
/** A learner's scores overall and per day. */
export type LearnProgress = z.infer<typeof progressSchema>;

/** A fresh question (the server picks the clip at random). */
export function fetchLearnQuestion(signal?: AbortSignal): Promise<LearnQuestion> {
  return api.get('/api/learn/question', { schema: questionSchema, signal });
}

/** Checks a pick; the answer is recorded when someone is signed in. */
export function answerLearnQuestion(input: LearnAnswerInput): Promise<LearnAnswer> {
  return api.post('/api/learn/answer', input, { schema: answerSchema });
}

/** The signed-in learner's progress. */
export function fetchLearnProgress(signal?: AbortSignal): Promise<LearnProgress> {
  return api.get('/api/learn/progress', { schema: progressSchema, signal });
}

/**
 * Query options for the question of one round. A question never goes stale by itself and is not
 * refetched when the window regains focus: a new one would swap the clip under the learner.
 */
export function learnQuestionQueryOptions(round: number) {
  return queryOptions({
    queryKey: learnKeys.question(round),
    queryFn: ({ signal }) => fetchLearnQuestion(signal),
    staleTime: Infinity,
    gcTime: 0,
    refetchOnWindowFocus: false,
    refetchOnReconnect: false,
    // "Not ready" will not change on a quick retry; the page offers a button instead.
    retry: (count, error) => !isApiError(error, 'learn_not_ready') && !(isApiError(error) && error.status < 500) && count < 2,
  });
}

/** Query options for the learner's progress. */
export function learnProgressQueryOptions() {
  return queryOptions({ queryKey: learnKeys.progress(), queryFn: ({ signal }) => fetchLearnProgress(signal) });
}

/** The question of the current round. */
export function useLearnQuestion(round: number) {
  return useQuery(learnQuestionQueryOptions(round));
}

/** Progress, only asked for when someone is signed in. */
export function useLearnProgress(enabled: boolean) {
  return useQuery({ ...learnProgressQueryOptions(), enabled });
}

/** Sends a pick; a recorded answer refreshes the progress. */
export function useAnswerLearnQuestion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: answerLearnQuestion,
    onSuccess: (result) => {
      if (result.recorded) void queryClient.invalidateQueries({ queryKey: learnKeys.progress() });
    },
  });
}
