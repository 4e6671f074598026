import type { ReactNode } from 'react';
import { Link, Navigate, useLocation } from 'react-router';
import type { PublicUser } from '@shared/schemas/auth';
import { hasRole, type Role } from '@shared/schemas/common';
import { buttonClasses } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { Page } from '@/components/page';
import { Loading } from '@/components/spinner';
import { useMe } from '@/lib/auth';

function Waiting() {
  return (
    <div className="mx-auto max-w-6xl px-4 sm:px-6">
      <Loading label="Checking who is signed in…" />
    </div>
  );
}

/**
 * Shows its content only to a signed-in person (with at least `role`, if given); others are sent
 * to sign in and brought back afterwards. This only shapes the screen: the server enforces access.
 */
export function RequireUser({ role, children }: { role?: Role; children: (user: PublicUser) => ReactNode }) {
  const me = useMe();
  const location = useLocation();

  if (me.isPending) return <Waiting />;
  if (me.isError) {
    return (
      <div className="mx-auto max-w-3xl px-4 sm:px-6">
        <ErrorState title="We could not check who is signed in" error={me.error} onRetry={() => void me.refetch()} />
      </div>
    );
  }
  if (!me.data) {
    const next = encodeURIComponent(location.pathname + location.search);
    return <Navigate to={`/sign-in?next=${next}`} replace />;
  }
  if (role && !hasRole(me.data.role, role)) {
    return (
      <Page title="Not available to your account">
        <p>This page is for the site&apos;s {role}s. If you think you should have access, ask an admin of your club.</p>
        <Link to="/" className={buttonClasses('secondary', 'md', 'mt-6')}>
          Go to the home page
        </Link>
      </Page>
    );
  }
  return <>{children(me.data)}</>;
}

/** Sign-in and sign-up make no sense while signed in, so they say so instead of showing a form. */
export function SignedOutOnly({ children }: { children: ReactNode }) {
  const me = useMe();
  if (me.isPending) return <Waiting />;
  if (me.data) {
    return (
      <Page title="You are already signed in">
        <p>
          You are signed in as <strong>{me.data.displayName}</strong>.
        </p>
        <div className="mt-6 flex flex-wrap gap-3">
          <Link to="/" className={buttonClasses('primary')}>
            Go to the home page
          </Link>
          <Link to="/account" className={buttonClasses('secondary')}>
            Account settings
          </Link>
        </div>
      </Page>
    );
  }
  return <>{children}</>;
}
