import { useParams } from 'react-router';
import { SpellingQueuePage } from '@/features/spelling/components/spelling-queue-page';
import { TourNamesPage } from '@/features/spelling/components/tour-names-page';
import { positiveIntParam } from '@/lib/route-params';
import { RequireUser } from '../guards';

/** /moderation/spelling, moderators and admins (the server enforces it). */
export function SpellingQueueRoute() {
  return <RequireUser role="moderator">{() => <SpellingQueuePage />}</RequireUser>;
}

/** /tours/:tourId/names — the captions of a tour with "Flag a misspelt name" on each; open to everyone (flagging asks to sign in). */
export function TourNamesRoute() {
  const id = positiveIntParam(useParams().tourId);
  if (!id) return <SpellingQueueMissingTour />;
  return <TourNamesPage key={id} tourId={id} />;
}

function SpellingQueueMissingTour() {
  return (
    <div className="mx-auto max-w-lg px-4 py-12">
      <h1 className="text-3xl text-moss-deep">No such tour</h1>
      <p className="mt-4">This address does not name a tour.</p>
    </div>
  );
}
