import { Link } from 'react-router';
import { buttonClasses } from '@/components/button';
import { Page } from '@/components/page';

/** For an address that names no tour the viewer may see (unknown, deleted, or someone else's draft). */
export function TourNotFound() {
  return (
    <Page title="Tour not found" width="medium">
      <p>
        There is no tour at this address. It may have been deleted, or it is not published yet. If someone sent you the link, ask
        them to check it.
      </p>
      <Link to="/tours" className={buttonClasses('primary', 'md', 'mt-6')}>
        See all tours
      </Link>
    </Page>
  );
}
