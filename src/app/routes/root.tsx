import { isRouteErrorResponse, Link, Outlet, ScrollRestoration, useRouteError } from 'react-router';
import { buttonClasses } from '@/components/button';
import { Layout } from '@/components/layout';
import { Page } from '@/components/page';
import { Loading } from '@/components/spinner';
import { queryClient } from '@/lib/query-client';
import { meQueryOptions } from '@/lib/auth';

/** Starts reading the session as soon as any page is asked for. */
export function rootLoader() {
  void queryClient.prefetchQuery(meQueryOptions());
  return null;
}

/** Every page sits inside the shared layout. */
export function RootRoute() {
  return (
    <Layout>
      <Outlet />
      <ScrollRestoration />
    </Layout>
  );
}

/** Shown for the split second before the first page's code has arrived. */
export function RootFallback() {
  return (
    <div className="mx-auto max-w-6xl px-4 py-10">
      <Loading label="Opening Grovewalk…" />
    </div>
  );
}

/** Last line of defence: an error thrown while rendering any page still gets the layout and a way out. */
export function RootErrorBoundary() {
  const error = useRouteError();
  const notFound = isRouteErrorResponse(error) && error.status === 404;
  return (
    <Layout>
      <Page title={notFound ? 'Page not found' : 'Something went wrong'}>
        <p>
          {notFound
            ? 'There is no page at this address.'
            : 'This page ran into a problem and could not be shown. Reloading often helps; if it does not, try again later.'}
        </p>
        <div className="mt-6 flex flex-wrap gap-3">
          <Link to="/" className={buttonClasses('primary')}>
            Go to the home page
          </Link>
          {!notFound && (
            <button type="button" className={buttonClasses('secondary')} onClick={() => window.location.reload()}>
              Reload the page
            </button>
          )}
        </div>
      </Page>
    </Layout>
  );
}
