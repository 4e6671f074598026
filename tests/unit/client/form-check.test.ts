import { describe, expect, it } from 'vitest';
import { PASSWORD_MIN, changePasswordInput, signUpInput, updateAccountInput } from '@shared/schemas/auth';
import { changedProfile } from '@/features/accounts/api/account-api';
import { checkForm, fieldErrorsOf } from '@/lib/form';

describe('checkForm with the shared schemas', () => {
  it('reports one message per field, in the schema’s words, for an empty sign-up form', () => {
    const result = checkForm(signUpInput, { displayName: '', email: '', password: '' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(Object.keys(result.errors).sort()).toEqual(['displayName', 'email', 'password']);
    expect(result.errors.password).toBe(`Use at least ${PASSWORD_MIN} characters.`);
  });

  // NIST SP 800-63B §3.1.1.2 sets 8 characters as the floor for user-chosen passwords; ours is higher.
  it('the shown minimum is at least the NIST SP 800-63B floor of 8 characters', () => {
    expect(PASSWORD_MIN).toBeGreaterThanOrEqual(8);
    const short = 'x'.repeat(PASSWORD_MIN - 1);
    const ok = 'x'.repeat(PASSWORD_MIN);
    expect(checkForm(signUpInput, { displayName: 'Invented Ivy', email: 'ivy@invented.example', password: short }).ok).toBe(false);
    expect(checkForm(signUpInput, { displayName: 'Invented Ivy', email: 'ivy@invented.example', password: ok }).ok).toBe(true);
  });

  it('returns the normalised data the server would see', () => {
    const result = checkForm(signUpInput, { displayName: '  Invented Ivy ', email: ' IVY@Invented.Example ', password: 'long enough pass' });
    expect(result).toEqual({ ok: true, data: { displayName: 'Invented Ivy', email: 'ivy@invented.example', password: 'long enough pass' } });
  });

  it('places cross-field messages on the field the schema names', () => {
    const result = checkForm(changePasswordInput, { currentPassword: 'same old password', newPassword: 'same old password' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors)).toEqual(['newPassword']);
  });

  it('keeps only the first message when a field breaks several rules', () => {
    const parsed = signUpInput.safeParse({ displayName: '<', email: 'x', password: '' });
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    const errors = fieldErrorsOf(parsed.error);
    const firstForName = parsed.error.issues.find((i) => i.path[0] === 'displayName')?.message;
    expect(errors.displayName).toBe(firstForName);
  });
});

describe('changedProfile (account page sends only what changed)', () => {
  // INVENTED user of the fictional demo club.
  const user = {
    id: 7,
    displayName: 'Invented Ivy',
    email: 'ivy@invented.example',
    role: 'viewer' as const,
    emailVerified: true,
    unitSystem: 'metric' as const,
    hardinessZone: null,
    createdAt: '2024-04-01T10:00:00.000Z',
  };

  it('is empty when nothing changed', () => {
    const data = updateAccountInput.parse({ displayName: ' Invented Ivy ', unitSystem: 'metric' });
    expect(changedProfile(user, data)).toEqual({});
  });

  it('holds just the changed fields', () => {
    expect(changedProfile(user, { displayName: 'Ivy of the Glen', unitSystem: 'metric' })).toEqual({ displayName: 'Ivy of the Glen' });
    expect(changedProfile(user, { displayName: 'Invented Ivy', unitSystem: 'imperial' })).toEqual({ unitSystem: 'imperial' });
  });
});
