import { describe, expect, it } from 'vitest';
import { listUsersQuery } from '@shared/schemas/admin';
import { sortAfterClick, usersQueryFromParams, usersQueryToParams } from '@/features/admin/components/users-url';

// The reference for defaults and allowed values is the shared server schema itself (listUsersQuery).
const serverDefaults = listUsersQuery.parse({});

describe('users table state in the address bar', () => {
  it('an empty address gives the same defaults the server applies', () => {
    expect(usersQueryFromParams(new URLSearchParams())).toEqual(serverDefaults);
  });

  it('reads every field the server accepts', () => {
    const q = usersQueryFromParams(new URLSearchParams('q=ann&role=moderator&sort=email&dir=asc&page=3&pageSize=50'));
    expect(q).toEqual(listUsersQuery.parse({ q: 'ann', role: 'moderator', sort: 'email', dir: 'asc', page: '3', pageSize: '50' }));
  });

  it('a bad value falls back alone, keeping the good ones', () => {
    const q = usersQueryFromParams(new URLSearchParams('q=ann&sort=password&dir=sideways&page=-4&role=owner'));
    expect(q).toEqual({ ...serverDefaults, q: 'ann' });
    // The fallback must itself be something the server accepts.
    expect(listUsersQuery.safeParse(q).success).toBe(true);
  });

  it('round-trips, and leaves defaults out of the address', () => {
    const q = { ...serverDefaults, q: 'bo', sort: 'role' as const, dir: 'asc' as const, page: 2 };
    const params = usersQueryToParams(q);
    expect(params.toString()).toBe('q=bo&sort=role&dir=asc&page=2');
    expect(usersQueryFromParams(params)).toEqual(q);
    expect(usersQueryToParams(serverDefaults).toString()).toBe('');
  });
});

describe('sortAfterClick (column headers)', () => {
  it('flips direction on the sorted column and returns to page 1', () => {
    const start = { ...serverDefaults, sort: 'displayName' as const, dir: 'asc' as const, page: 4 };
    expect(sortAfterClick(start, 'displayName')).toMatchObject({ sort: 'displayName', dir: 'desc', page: 1 });
    expect(sortAfterClick(sortAfterClick(start, 'displayName'), 'displayName')).toMatchObject({ dir: 'asc' });
  });

  it('a new column starts A to Z, except dates which start newest first', () => {
    expect(sortAfterClick(serverDefaults, 'email')).toMatchObject({ sort: 'email', dir: 'asc', page: 1 });
    const byName = { ...serverDefaults, sort: 'displayName' as const, dir: 'asc' as const };
    expect(sortAfterClick(byName, 'createdAt')).toMatchObject({ sort: 'createdAt', dir: 'desc' });
  });
});
