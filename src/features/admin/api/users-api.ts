import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { adminUserPage, adminUserSchema, type AdminUser, type ListUsersQuery, type UpdateUserInput } from '@shared/schemas/admin';
import { api } from '@/lib/api';
import { meQueryOptions } from '@/lib/auth';
import { adminKeys } from './admin-keys';

const userResponse = z.object({ user: adminUserSchema });

/** One page of users for the admin table, searched, filtered and sorted by the server. */
export function fetchUsers(query: ListUsersQuery, signal?: AbortSignal) {
  return api.get('/api/admin/users', { query: { ...query }, schema: adminUserPage, signal });
}

/** Changes one user's role or disabled flag; the server refuses to leave the site without an admin. */
export function updateUser(id: number, input: UpdateUserInput): Promise<AdminUser> {
  return api.patch(`/api/admin/users/${id}`, input, { schema: userResponse }).then((r) => r.user);
}

/** Query options for a users page; the previous page stays on screen while the next one loads. */
export function usersQueryOptions(query: ListUsersQuery) {
  return queryOptions({
    queryKey: adminKeys.userList(query),
    queryFn: ({ signal }) => fetchUsers(query, signal),
    placeholderData: keepPreviousData,
  });
}

/** The admin users table's data. */
export function useUsers(query: ListUsersQuery) {
  return useQuery(usersQueryOptions(query));
}

/**
 * Role and enable/disable changes. Every users list is refreshed afterwards; so is "me", because
 * an admin may have just changed their own role.
 */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: number; input: UpdateUserInput }) => updateUser(id, input),
    onSettled: () => {
      void queryClient.invalidateQueries({ queryKey: adminKeys.users() });
      void queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey });
    },
  });
}
