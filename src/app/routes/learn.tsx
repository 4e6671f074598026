import { LearnPage } from '@/features/learn/components/learn-page';

/** /learn, learn mode; anyone can play, signed-in learners keep their scores. */
export function LearnRoute() {
  return <LearnPage />;
}
