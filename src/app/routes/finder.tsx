import { FinderPage } from '@/features/finder/components/finder-page';

/** /finder, the tree finder, open to everyone. */
export function FinderRoute() {
  return <FinderPage />;
}
