import { Link } from 'react-router';
import { buttonClasses } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { useDocumentTitle } from '@/components/page';
import { Loading } from '@/components/spinner';
import { useMe } from '@/lib/auth';
import { useClub } from '../api/club-api';
import { ClubPanel } from './club-panel';
import { TrailSketch } from './trail-sketch';

const plans = [
  {
    title: 'Walks with tree cards',
    to: '/tours',
    action: 'Watch the tours',
    text:
      'Members film a slow walk through their garden. As each tree comes into view, its card appears beside the video: ' +
      'accepted name, cultivar Group, leaf shape, seasonal colour, size and hardiness.',
  },
  {
    title: 'Find a named tree',
    to: '/search',
    action: 'Search the tours',
    text:
      'Search for a name, even half-remembered or misspelt, or for a feature such as coral bark. You get every moment, ' +
      'in every tour, where that tree appears, and the video starts right there.',
  },
  {
    title: 'Say the names right',
    to: '/glossary',
    action: 'Open the glossary',
    text:
      'An A–Z of accepted names with a guide to saying each one, and look-alike cultivars set side by side with ' +
      'their differences first.',
  },
];

function Welcome() {
  const { data: user } = useMe();
  if (user) {
    return <p className="mt-6 text-lg font-bold text-moss-deep">Welcome back, {user.displayName}.</p>;
  }
  if (user === null) {
    return (
      <div className="mt-8 flex flex-wrap items-center gap-x-5 gap-y-3">
        <Link to="/sign-up" className={buttonClasses('primary')}>
          Create an account
        </Link>
        <p className="text-ink-soft">All it takes is an e-mail address.</p>
      </div>
    );
  }
  return null;
}

function ClubSection() {
  const club = useClub();
  if (club.isPending) return <Loading label="Loading the club…" />;
  if (club.isError) return <ErrorState title="The club could not be loaded" error={club.error} onRetry={() => void club.refetch()} />;
  if (!club.data) {
    return <EmptyState title="No club is set up on this site yet.">Once an admin adds one, its members and gardens appear here.</EmptyState>;
  }
  return <ClubPanel club={club.data} />;
}

/** Props of HomePage; `publishedTours` is how many tours anyone can watch (undefined while unknown). */
export interface HomePageProps {
  publishedTours?: number;
}

/** The front door: what Grovewalk is for, the club the site serves, and the three ways in. */
export function HomePage({ publishedTours }: HomePageProps) {
  const walksOpen = (publishedTours ?? 0) > 0;
  useDocumentTitle('');
  return (
    <div className="mx-auto max-w-6xl px-4 sm:px-6">
      <section className="grid items-center gap-8 py-10 sm:py-16 md:grid-cols-[1.1fr_1fr]">
        <div>
          <p className="font-ui text-sm font-semibold tracking-widest text-bark uppercase">Garden walks · named trees</p>
          <h1 className="mt-3 text-4xl text-moss-deep sm:text-5xl">Learn the trees by walking the garden</h1>
          <p className="mt-5 max-w-prose text-lg">
            Grovewalk is where tree growers share filmed walks through their gardens. Every tree on the way is tied to its cultivar
            record, so you can put a name, a spelling and a way of growing to each one you see.
          </p>
          <Welcome />
        </div>
        <TrailSketch className="w-full max-w-md justify-self-center drop-shadow-sm md:max-w-none" />
      </section>

      <ClubSection />

      <section aria-labelledby="what-heading" className="py-12 sm:py-16">
        <h2 id="what-heading" className="text-2xl text-moss-deep sm:text-3xl">
          What Grovewalk does
        </h2>
        <p className="mt-2 max-w-prose text-ink-soft">Three ways in, whichever you came for.</p>
        <ul className="mt-6 grid gap-5 md:grid-cols-3">
          {plans.map((plan, i) => (
            <li key={plan.title} className="flex flex-col rounded-lg border border-rule bg-card p-5 shadow-leaf">
              <span aria-hidden="true" className="grid size-9 place-items-center rounded-full bg-moss-wash font-bold text-moss-deep">
                {i + 1}
              </span>
              <h3 className="mt-4 text-lg">{plan.title}</h3>
              <p className="mt-2 text-ink-soft">{plan.text}</p>
              <Link to={plan.to} className={buttonClasses('secondary', 'sm', 'mt-auto self-start pt-2')}>
                {plan.action}
                {i === 0 && walksOpen ? ` (${publishedTours})` : ''}
              </Link>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
