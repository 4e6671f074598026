import { useEffect, useId, useRef, useState } from 'react';
import { useSearchParams } from 'react-router';
import type { AdminUser, ListUsersQuery } from '@shared/schemas/admin';
import type { PublicUser } from '@shared/schemas/auth';
import { ROLES, type Role } from '@shared/schemas/common';
import { Badge, roleLabel } from '@/components/badge';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { FormError } from '@/components/form-error';
import { Page } from '@/components/page';
import { Pager } from '@/components/pager';
import { Loading, Spinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { useUpdateUser, useUsers } from '../api/users-api';
import { sortAfterClick, usersQueryFromParams, usersQueryToParams, type UserSort } from './users-url';

const columnNames: Record<UserSort, string> = { displayName: 'Name', email: 'E-mail address', role: 'Role', createdAt: 'Joined' };

function describeSort(query: ListUsersQuery): string {
  const words = {
    displayName: ['A to Z', 'Z to A'],
    email: ['A to Z', 'Z to A'],
    role: ['viewer first', 'admin first'],
    createdAt: ['oldest first', 'newest first'],
  }[query.sort];
  return `sorted by ${columnNames[query.sort].toLowerCase()}, ${query.dir === 'asc' ? words[0] : words[1]}`;
}

function SortHeader({ column, query, onSort, className = '' }: { column: UserSort; query: ListUsersQuery; onSort: (c: UserSort) => void; className?: string }) {
  const active = query.sort === column;
  return (
    <th scope="col" aria-sort={active ? (query.dir === 'asc' ? 'ascending' : 'descending') : undefined} className={`px-2 py-2 md:px-3 text-left ${className}`}>
      <button
        type="button"
        onClick={() => onSort(column)}
        className="inline-flex items-center gap-1 rounded px-1 py-1 font-semibold text-ink hover:bg-bark-wash"
      >
        {columnNames[column]}
        <svg viewBox="0 0 12 16" className={`h-4 w-3 ${active ? 'text-moss' : 'text-edge'}`} aria-hidden="true">
          <path d="M6 2L10 7H2z" fill="currentColor" opacity={active && query.dir === 'desc' ? 0.25 : 1} />
          <path d="M6 14L2 9h8z" fill="currentColor" opacity={active && query.dir === 'asc' ? 0.25 : 1} />
        </svg>
      </button>
    </th>
  );
}

const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

function joined(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '—' : dateFormat.format(date);
}

type PendingToggle = { user: AdminUser; disable: boolean } | null;

/**
 * The admin's list of everyone with an account: search, role filter, sortable columns, paging,
 * role changes in place and disabling or enabling an account after a confirmation. The table
 * state lives in the address so a view can be reloaded or shared.
 */
export function AdminUsersPage({ me }: { me: PublicUser }) {
  const [params, setParams] = useSearchParams();
  const query = usersQueryFromParams(params);
  const users = useUsers(query);
  const update = useUpdateUser();
  const [notice, setNotice] = useState('');
  const [toggle, setToggle] = useState<PendingToggle>(null);
  const captionId = useId();

  const [search, setSearch] = useState(query.q);
  const settledSearch = useDebouncedValue(search.trim(), 350);
  const appliedSearch = useRef(settledSearch);
  useEffect(() => {
    // Reacts to typing only, so Back/Forward through earlier searches is not undone.
    if (settledSearch === appliedSearch.current) return;
    appliedSearch.current = settledSearch;
    setParams((prev) => usersQueryToParams({ ...usersQueryFromParams(prev), q: settledSearch, page: 1 }), { replace: true });
  }, [settledSearch, setParams]);

  const go = (next: ListUsersQuery) => setParams(usersQueryToParams(next));

  const changeRole = (user: AdminUser, role: Role) => {
    setNotice('');
    update.mutate(
      { id: user.id, input: { role } },
      { onSuccess: (saved) => setNotice(`${saved.displayName} is now ${roleLabel(saved.role).toLowerCase()}.`) },
    );
  };

  const confirmToggle = () => {
    if (!toggle) return;
    const { user, disable } = toggle;
    setNotice('');
    update.mutate(
      { id: user.id, input: { disabled: disable } },
      {
        onSuccess: (saved) => setNotice(`${saved.displayName}'s account is ${saved.disabled ? 'disabled' : 'enabled'}.`),
        onSettled: () => setToggle(null),
      },
    );
  };

  const pendingId = update.isPending ? update.variables.id : null;
  const data = users.data;

  return (
    <Page title="Users" width="wide" intro="Everyone with an account on this site. Changes apply at once.">
      <div className="flex flex-col gap-4 sm:flex-row sm:items-start">
        <div className="flex-1 space-y-1">
          <label htmlFor="user-search" className="block font-bold">
            Search users
          </label>
          <input
            id="user-search"
            type="search"
            value={search}
            onChange={(event) => setSearch(event.target.value)}
            placeholder="Name or address"
            aria-describedby="user-search-hint"
            className="block w-full rounded-md border border-edge bg-card px-2 py-2 md:px-3 text-base"
          />
        </div>
        <div className="space-y-1 sm:w-52">
          <label htmlFor="role-filter" className="block font-bold">
            Show
          </label>
          <select
            id="role-filter"
            value={query.role ?? ''}
            onChange={(event) => go({ ...query, role: (event.target.value || undefined) as Role | undefined, page: 1 })}
            className="block w-full rounded-md border border-edge bg-card px-2 py-2 md:px-3 text-base"
          >
            <option value="">All roles</option>
            {ROLES.map((role) => (
              <option key={role} value={role}>
                {roleLabel(role)}s only
              </option>
            ))}
          </select>
        </div>
      </div>
      <p id="user-search-hint" className="mt-1 text-sm text-ink-soft">
        Results update as you type.
      </p>

      <p role="status" className="mt-4 min-h-6 font-bold text-moss">
        {notice}
      </p>
      <FormError message={update.isError ? errorMessage(update.error) : null} />

      {users.isPending ? (
        <Loading label="Loading users…" />
      ) : users.isError ? (
        <ErrorState error={users.error} onRetry={() => void users.refetch()} />
      ) : data && data.items.length === 0 ? (
        <EmptyState title={query.q ? `No one matches “${query.q}”.` : 'No users to show.'}>
          {query.q || query.role ? 'Try a shorter search or show all roles.' : null}
        </EmptyState>
      ) : data ? (
        <>
          <div role="region" aria-labelledby={captionId} tabIndex={0} className="mt-4 overflow-x-auto rounded-lg border border-rule bg-card shadow-leaf">
            <table className="w-full border-collapse font-ui text-sm md:min-w-[52rem]">
              <caption id={captionId} className="px-3 pt-3 pb-1 text-left text-ink-soft">
                {data.total} {data.total === 1 ? 'user' : 'users'}, {describeSort(query)}
                {users.isFetching && (
                  <span className="ml-2 inline-flex items-center gap-1 align-middle">
                    <Spinner className="size-3.5" /> updating
                  </span>
                )}
              </caption>
              <thead className="border-b-2 border-rule">
                <tr>
                  <SortHeader column="displayName" query={query} onSort={(c) => go(sortAfterClick(query, c))} />
                  <SortHeader column="email" className="hidden md:table-cell" query={query} onSort={(c) => go(sortAfterClick(query, c))} />
                  <SortHeader column="role" className="w-px whitespace-nowrap" query={query} onSort={(c) => go(sortAfterClick(query, c))} />
                  <th scope="col" className="hidden px-2 py-2 md:px-3 text-left font-semibold md:table-cell">
                    Status
                  </th>
                  <SortHeader column="createdAt" className="hidden md:table-cell" query={query} onSort={(c) => go(sortAfterClick(query, c))} />
                  <th scope="col" className="w-px px-2 py-2 md:px-3 text-left font-semibold whitespace-nowrap">
                    Access
                  </th>
                </tr>
              </thead>
              <tbody>
                {data.items.map((user) => {
                  const isMe = user.id === me.id;
                  const busy = pendingId === user.id;
                  const shownRole = busy && update.variables?.input.role ? update.variables.input.role : user.role;
                  return (
                    <tr key={user.id} className={`border-b border-rule last:border-b-0 ${user.disabled ? 'bg-paper text-ink-soft' : ''}`}>
                      <th scope="row" className="px-2 py-2 md:px-3 text-left font-semibold text-ink">
                        {user.displayName}
                        {isMe && (
                          <span className="ml-1.5 inline-block align-middle">
                            <Badge tone="moss">you</Badge>
                          </span>
                        )}
                        {/* On narrow screens the address and status sit under the name instead of in their own columns. */}
                        <span className="mt-0.5 block text-xs font-normal [overflow-wrap:anywhere] text-ink-soft md:hidden">{user.email}</span>
                        <span className="mt-1 flex flex-wrap gap-1 font-normal md:hidden">
                          {user.disabled && <Badge tone="maple">Disabled</Badge>}
                          {!user.emailVerified && <Badge tone="ochre">Not confirmed</Badge>}
                        </span>
                      </th>
                      <td className="hidden px-2 py-2 md:px-3 break-words text-ink md:table-cell">{user.email}</td>
                      <td className="w-px px-2 py-2 md:px-3 whitespace-nowrap">
                        <select
                          aria-label={`Role for ${user.displayName}`}
                          value={shownRole}
                          disabled={busy}
                          onChange={(event) => changeRole(user, event.target.value as Role)}
                          className="rounded-md border border-edge bg-card px-2 py-1.5 text-ink"
                        >
                          {ROLES.map((role) => (
                            <option key={role} value={role}>
                              {roleLabel(role)}
                            </option>
                          ))}
                        </select>
                      </td>
                      <td className="hidden px-2 py-2 md:px-3 md:table-cell">
                        <span className="flex flex-wrap gap-1">
                          {user.disabled ? <Badge tone="maple">Disabled</Badge> : <Badge tone="moss">Active</Badge>}
                          {!user.emailVerified && <Badge tone="ochre">Not confirmed</Badge>}
                        </span>
                      </td>
                      <td className="hidden px-2 py-2 md:px-3 whitespace-nowrap text-ink md:table-cell">
                        <time dateTime={user.createdAt}>{joined(user.createdAt)}</time>
                      </td>
                      <td className="w-px px-2 py-2 md:px-3 whitespace-nowrap">
                        {isMe ? (
                          <span className="text-ink-soft">
                            <span aria-hidden="true">—</span>
                            <span className="sr-only">Your own account</span>
                          </span>
                        ) : (
                          <Button
                            size="sm"
                            variant={user.disabled ? 'secondary' : 'quiet'}
                            disabled={busy}
                            onClick={() => setToggle({ user, disable: !user.disabled })}
                          >
                            {user.disabled ? 'Enable' : 'Disable'}
                            <span className="sr-only"> {user.displayName}</span>
                          </Button>
                        )}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
          <Pager label="Pages of users" page={data.page} pageSize={data.pageSize} total={data.total} onPageChange={(page) => go({ ...query, page })} />
        </>
      ) : null}

      <ConfirmDialog
        open={toggle !== null}
        title={toggle ? `${toggle.disable ? 'Disable' : 'Enable'} ${toggle.user.displayName}?` : ''}
        confirmLabel={toggle?.disable ? 'Disable account' : 'Enable account'}
        tone={toggle?.disable ? 'danger' : 'primary'}
        busy={update.isPending}
        onConfirm={confirmToggle}
        onCancel={() => setToggle(null)}
      >
        {toggle?.disable ? (
          <p>
            {toggle.user.displayName} ({toggle.user.email}) will not be able to sign in until an admin enables the account again.
          </p>
        ) : (
          <p>{toggle?.user.displayName} will be able to sign in again.</p>
        )}
      </ConfirmDialog>
    </Page>
  );
}
