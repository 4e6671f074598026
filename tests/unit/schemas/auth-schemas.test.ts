import { describe, expect, it } from 'vitest';
import { changePasswordInput, PASSWORD_MIN, signInInput, signUpInput, updateAccountInput } from '../../../shared/schemas/auth';
import { listUsersQuery, updateUserInput } from '../../../shared/schemas/admin';
import { hasRole } from '../../../shared/schemas/common';

describe('sign-up schema', () => {
  it('normalises the e-mail and trims the display name', () => {
    const v = signUpInput.parse({ displayName: '  Ada Pellworth ', email: ' Ada@Example.ORG ', password: 'x'.repeat(PASSWORD_MIN) });
    expect(v).toEqual({ displayName: 'Ada Pellworth', email: 'ada@example.org', password: 'x'.repeat(PASSWORD_MIN) });
  });

  // NIST SP 800-63B §3.1.1.2: memorised secrets of at least 8 characters; we ask for 10.
  it('asks for at least 10 characters, and at least the NIST minimum of 8', () => {
    expect(PASSWORD_MIN).toBeGreaterThanOrEqual(8);
    const r = signUpInput.safeParse({ displayName: 'Ada', email: 'a@b.example', password: 'x'.repeat(PASSWORD_MIN - 1) });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path).toEqual(['password']);
  });

  // bcrypt uses the first 72 bytes only (the bcrypt algorithm's key length, common practice).
  it('refuses passwords bcrypt would truncate (over 72 bytes, counted in UTF-8)', () => {
    const ok = signUpInput.safeParse({ displayName: 'Ada', email: 'a@b.example', password: 'a'.repeat(72) });
    expect(ok.success).toBe(true);
    const multi = signUpInput.safeParse({ displayName: 'Ada', email: 'a@b.example', password: 'é'.repeat(37) }); // 74 bytes
    expect(multi.success).toBe(false);
  });

  it('gives a message for each bad field', () => {
    const r = signUpInput.safeParse({ displayName: '<b>', email: 'nope', password: '' });
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path[0]);
    expect(new Set(paths)).toEqual(new Set(['displayName', 'email', 'password']));
  });

  it('rejects e-mail addresses longer than 254 characters (RFC 5321 §4.5.3.1.3 path limit)', () => {
    expect(signInInput.safeParse({ email: `${'a'.repeat(64)}@${'b'.repeat(186)}.org`, password: 'x' }).success).toBe(false);
  });
});

describe('other account schemas', () => {
  it('refuses a new password equal to the current one', () => {
    const r = changePasswordInput.safeParse({ currentPassword: 'same-password-1', newPassword: 'same-password-1' });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path).toEqual(['newPassword']);
  });
  it('accepts only known unit systems', () => {
    expect(updateAccountInput.safeParse({ unitSystem: 'imperial' }).success).toBe(true);
    expect(updateAccountInput.safeParse({ unitSystem: 'cubits' }).success).toBe(false);
  });
});

describe('admin schemas', () => {
  it('coerces paging and applies defaults', () => {
    expect(listUsersQuery.parse({ page: '3' })).toMatchObject({ page: 3, pageSize: 20, sort: 'createdAt', dir: 'desc', q: '' });
    expect(listUsersQuery.safeParse({ pageSize: '1000' }).success).toBe(false);
    expect(listUsersQuery.safeParse({ sort: 'password' }).success).toBe(false);
  });
  it('needs something to change', () => {
    expect(updateUserInput.safeParse({}).success).toBe(false);
    expect(updateUserInput.safeParse({ disabled: true }).success).toBe(true);
  });
});

describe('role order', () => {
  it('ranks viewer < author < moderator < admin', () => {
    expect(hasRole('admin', 'moderator')).toBe(true);
    expect(hasRole('author', 'moderator')).toBe(false);
    expect(hasRole('viewer', 'viewer')).toBe(true);
    expect(hasRole(null, 'viewer')).toBe(false);
  });
});
