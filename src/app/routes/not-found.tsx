import { Link, useLocation } from 'react-router';
import { buttonClasses } from '@/components/button';
import { Page } from '@/components/page';

/** Any address the site does not know. */
export function NotFoundRoute() {
  const { pathname } = useLocation();
  return (
    <Page title="Page not found">
      <p>
        There is no page at <code className="rounded bg-bark-wash px-1.5 py-0.5 font-mono text-sm break-all">{pathname}</code>. The
        link may be mistyped, or the page may have moved.
      </p>
      <Link to="/" className={buttonClasses('primary', 'md', 'mt-6')}>
        Go to the home page
      </Link>
    </Page>
  );
}
