import type { LoaderFunctionArgs } from 'react-router';
import { hasRole } from '@shared/schemas/common';
import { usersQueryOptions } from '@/features/admin/api/users-api';
import { AdminUsersPage } from '@/features/admin/components/admin-users-page';
import { usersQueryFromParams } from '@/features/admin/components/users-url';
import { meQueryOptions } from '@/lib/auth';
import { queryClient } from '@/lib/query-client';
import { RequireUser } from '../guards';

/** Prefetches the page of users the address asks for, when the cached session is an admin's. */
export function adminUsersLoader({ request }: LoaderFunctionArgs) {
  const me = queryClient.getQueryData(meQueryOptions().queryKey);
  if (hasRole(me?.role, 'admin')) {
    void queryClient.prefetchQuery(usersQueryOptions(usersQueryFromParams(new URL(request.url).searchParams)));
  }
  return null;
}

/** /admin/users, admins only. */
export function AdminUsersRoute() {
  return <RequireUser role="admin">{(user) => <AdminUsersPage me={user} />}</RequireUser>;
}
