import { useState, type FormEvent, type ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import { hasRole } from '@shared/schemas/common';
import type { CultivarIndexRow } from '@shared/schemas/cultivars';
import { CONTAINER_SUITABILITIES, HABITS, LEAF_FORMS } from '@shared/traits';
import { Button, buttonClasses } from '@/components/button';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { Page } from '@/components/page';
import { Pager } from '@/components/pager';
import { Loading, Spinner } from '@/components/spinner';
import { useMe } from '@/lib/auth';
import { CONTAINER_LABELS, HABIT_LABELS, joinList, LEAF_FORM_SHORT } from '@/lib/trait-words';
import { useCultivarIndex } from '../api/cultivars-api';
import {
  apiQueryFromFilters,
  COMMON_GROUPS,
  filtersFromParams,
  INDEX_ORDERS,
  INDEX_STATUSES,
  isFiltered,
  paramsFromFilters,
  type IndexFilters,
  type IndexOrder,
} from '../lib/index-params';
import { StatusBadge } from './record-badges';

const STATUS_LABELS: Record<(typeof INDEX_STATUSES)[number], string> = {
  approved: 'Approved',
  proposed: 'Waiting for approval',
  retired: 'Retired',
  any: 'Any status',
};

const selectClass = 'mt-1 block w-full rounded-md border border-edge bg-card px-3 py-2 text-base';

function Select({ label, name, value, onChange, children }: { label: string; name: string; value: string; onChange: (v: string) => void; children: ReactNode }) {
  return (
    <label className="block font-ui text-sm font-bold">
      {label}
      <select name={name} value={value} onChange={(e) => onChange(e.target.value)} className={`${selectClass} font-normal`}>
        {children}
      </select>
    </label>
  );
}

function dayText(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? '' : d.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}

function Row({ row }: { row: CultivarIndexRow }) {
  const t = row.traits;
  const cell = 'px-3 py-2 align-top max-md:flex max-md:gap-2 max-md:px-0 max-md:py-0.5 max-md:before:w-28 max-md:before:shrink-0 max-md:before:font-ui max-md:before:text-xs max-md:before:font-bold max-md:before:text-ink-soft max-md:before:content-[attr(data-label)]';
  const dash = <span className="text-ink-soft">—</span>;
  return (
    <tr className="border-t border-rule max-md:block max-md:py-3">
      <th scope="row" className="px-3 py-2 text-left align-top font-normal max-md:block max-md:px-0">
        <Link to={`/cultivars/${row.slug}`} className="font-bold">
          <CultivarName record={row} />
        </Link>
        <span className="mt-1 flex flex-wrap gap-1">
          <FictionalMark record={row} />
          <StatusBadge status={row.status} />
        </span>
      </th>
      <td data-label="Group" className={cell}>
        {row.groupName ?? dash}
      </td>
      <td data-label="Leaf form" className={cell}>
        {t?.leafForm ? LEAF_FORM_SHORT[t.leafForm] : dash}
      </td>
      <td data-label="Habit" className={cell}>
        {t?.habit?.length ? joinList(t.habit.map((h) => HABIT_LABELS[h])) : dash}
      </td>
      <td data-label="Container" className={cell}>
        {t?.containerSuitability ? CONTAINER_LABELS[t.containerSuitability] : dash}
      </td>
      <td data-label="Zones" className={`${cell} whitespace-nowrap tabular-nums`}>
        {t?.hardiness ? `${t.hardiness.min}–${t.hardiness.max}` : dash}
      </td>
      <td data-label="Updated" className={`${cell} whitespace-nowrap tabular-nums`}>
        {dayText(row.updatedAt)}
      </td>
    </tr>
  );
}

/** /cultivars: every record in a table that can be searched, narrowed by traits, ordered and paged. */
export function CultivarIndexPage() {
  const [params, setParams] = useSearchParams();
  const { data: me } = useMe();
  const moderator = hasRole(me?.role, 'moderator');
  const filters = filtersFromParams(params, moderator);
  const list = useCultivarIndex(apiQueryFromFilters(filters));
  const [text, setText] = useState(filters.q);

  const update = (patch: Partial<IndexFilters>) => setParams(paramsFromFilters({ ...filters, page: 1, ...patch }));
  const onSearch = (e: FormEvent) => {
    e.preventDefault();
    update({ q: text.trim() });
  };

  let body;
  if (list.isPending) body = <Loading label="Loading cultivar records…" />;
  else if (list.isError) body = <ErrorState title="The records could not be loaded" error={list.error} onRetry={() => void list.refetch()} />;
  else if (list.data.items.length === 0) {
    body =
      list.data.total > 0 ? (
        <EmptyState title="This page is past the end of the list.">
          <button type="button" className="font-bold text-moss underline" onClick={() => update({})}>
            Go to the first page
          </button>
        </EmptyState>
      ) : isFiltered(filters) ? (
        <EmptyState title="No record matches these filters.">
          <p>Try fewer filters, or another spelling. Misspellings on record are found too.</p>
        </EmptyState>
      ) : (
        <EmptyState title="No cultivar records yet.">
          <p>Records appear here once a moderator approves them.</p>
        </EmptyState>
      );
  } else {
    body = (
      <>
        <div className="overflow-x-auto rounded-lg border border-rule bg-card shadow-leaf max-md:border-0 max-md:bg-transparent max-md:shadow-none">
          <table className="w-full border-collapse text-left max-md:block">
            <caption className="sr-only">
              Cultivar records, {INDEX_ORDERS[filters.order].label.toLowerCase()}
            </caption>
            <thead className="bg-bark-wash font-ui text-sm max-md:sr-only">
              <tr>
                <th scope="col" className="px-3 py-2">
                  Name
                </th>
                <th scope="col" className="px-3 py-2">
                  Group
                </th>
                <th scope="col" className="px-3 py-2">
                  Leaf form
                </th>
                <th scope="col" className="px-3 py-2">
                  Habit
                </th>
                <th scope="col" className="px-3 py-2">
                  Container
                </th>
                <th scope="col" className="px-3 py-2">
                  <abbr title="USDA hardiness zones" className="no-underline">
                    Zones
                  </abbr>
                </th>
                <th scope="col" className="px-3 py-2">
                  Updated
                </th>
              </tr>
            </thead>
            <tbody className="max-md:block max-md:divide-y max-md:divide-rule max-md:rounded-lg max-md:border max-md:border-rule max-md:bg-card max-md:px-4">
              {list.data.items.map((row) => (
                <Row key={row.id} row={row} />
              ))}
            </tbody>
          </table>
        </div>
        <Pager page={filters.page} pageSize={list.data.pageSize} total={list.data.total} label="Pages of cultivar records" onPageChange={(page) => setParams(paramsFromFilters({ ...filters, page }))} />
      </>
    );
  }

  return (
    <Page
      title="Cultivar records"
      width="wide"
      intro="Every named tree the tours show, with how to say its name, how it grows and where to see it. Search by name — misspellings on record are found too — or narrow the list by what you see."
    >
      {hasRole(me?.role, 'author') && (
        <p className="-mt-4 mb-6">
          <Link to="/cultivars/new" className={buttonClasses('secondary')}>
            Propose a cultivar record
          </Link>
        </p>
      )}
      <form role="search" aria-label="Filter cultivar records" onSubmit={onSearch} className="mb-6 rounded-lg border border-rule bg-card p-4 shadow-leaf">
        <div className="flex flex-wrap items-end gap-3">
          <label className="block min-w-[14rem] flex-1 font-ui text-sm font-bold">
            Name or part of it
            <input type="search" name="q" value={text} onChange={(e) => setText(e.target.value)} className={`${selectClass} font-normal`} autoComplete="off" />
          </label>
          <Button type="submit">Search</Button>
        </div>
        <div className="mt-3 grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
          <Select label="Group" name="group" value={filters.group} onChange={(group) => update({ group })}>
            <option value="">Any Group</option>
            {COMMON_GROUPS.map((g) => (
              <option key={g} value={g}>
                {g} Group
              </option>
            ))}
          </Select>
          <Select label="Leaf form" name="leafForm" value={filters.leafForm} onChange={(v) => update({ leafForm: v as IndexFilters['leafForm'] })}>
            <option value="">Any leaf form</option>
            {LEAF_FORMS.map((f) => (
              <option key={f} value={f}>
                {LEAF_FORM_SHORT[f]}
              </option>
            ))}
          </Select>
          <Select label="Habit" name="habit" value={filters.habit} onChange={(v) => update({ habit: v as IndexFilters['habit'] })}>
            <option value="">Any habit</option>
            {HABITS.map((h) => (
              <option key={h} value={h}>
                {HABIT_LABELS[h]}
              </option>
            ))}
          </Select>
          <Select label="In a container" name="container" value={filters.container} onChange={(v) => update({ container: v as IndexFilters['container'] })}>
            <option value="">Any</option>
            {CONTAINER_SUITABILITIES.map((c) => (
              <option key={c} value={c}>
                {CONTAINER_LABELS[c]}
              </option>
            ))}
          </Select>
          <Select label="Order" name="order" value={filters.order} onChange={(v) => update({ order: v as IndexOrder })}>
            {Object.entries(INDEX_ORDERS).map(([key, o]) => (
              <option key={key} value={key}>
                {o.label}
              </option>
            ))}
          </Select>
          {moderator && (
            <Select label="Status (moderators)" name="status" value={filters.status} onChange={(v) => update({ status: v as IndexFilters['status'] })}>
              {INDEX_STATUSES.map((s) => (
                <option key={s} value={s}>
                  {STATUS_LABELS[s]}
                </option>
              ))}
            </Select>
          )}
        </div>
        <div className="mt-3 flex min-h-6 flex-wrap items-center gap-3 font-ui text-sm text-ink-soft">
          <span role="status" className="flex items-center gap-2">
            {list.isFetching && <Spinner className="size-4" />}
            {list.data ? `${list.data.total} record${list.data.total === 1 ? '' : 's'}` : ''}
          </span>
          {isFiltered(filters) && (
            <button
              type="button"
              className="font-bold text-moss underline"
              onClick={() => {
                setText('');
                setParams(new URLSearchParams());
              }}
            >
              Clear the filters
            </button>
          )}
        </div>
      </form>
      {body}
    </Page>
  );
}
