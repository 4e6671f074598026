import { Button } from './button';

/** Props of Pager; `page` counts from 1 like the API. */
export interface PagerProps {
  page: number;
  pageSize: number;
  total: number;
  onPageChange: (page: number) => void;
  /** Names the navigation landmark, e.g. "Pages of users". */
  label: string;
}

/** Number of pages for a total; an empty list still has one (empty) page. */
export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / Math.max(1, pageSize)));
}

/** Previous/next paging with "x–y of z", for every server-paged list. */
export function Pager({ page, pageSize, total, onPageChange, label }: PagerProps) {
  const pages = pageCount(total, pageSize);
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label={label} className="mt-4 flex flex-wrap items-center justify-between gap-3 font-ui text-sm">
      <p className="text-ink-soft">
        {total === 0 ? 'Nothing to show' : `${first}–${last} of ${total}`} · page {Math.min(page, pages)} of {pages}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" size="sm" disabled={page <= 1} onClick={() => onPageChange(page - 1)}>
          Previous page
        </Button>
        <Button variant="secondary" size="sm" disabled={page >= pages} onClick={() => onPageChange(page + 1)}>
          Next page
        </Button>
      </div>
    </nav>
  );
}
