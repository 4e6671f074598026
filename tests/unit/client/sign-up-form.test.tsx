import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { PASSWORD_MIN } from '@shared/schemas/auth';
import { SignInForm } from '@/features/accounts/components/sign-in-page';
import { SignUpForm } from '@/features/accounts/components/sign-up-page';
import { READER_PREFS_STORAGE_KEY, serializePrefs } from '@/features/preferences/lib/reader-prefs';
import { forgetCsrfToken } from '@/lib/api';

// Accessibility expectations checked here follow WAI-ARIA 1.2 (aria-invalid, aria-describedby,
// role="alert") and WCAG 2.2 SC 3.3.1 "Error Identification": the error is described in text and
// tied to the field it is about.

function wrap(children: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>{children}</MemoryRouter>
    </QueryClientProvider>,
  );
}

function describedText(input: HTMLElement): string {
  const ids = (input.getAttribute('aria-describedby') ?? '').split(/\s+/).filter(Boolean);
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').join(' | ');
}

const fetchMock = vi.fn<typeof fetch>();

beforeEach(() => {
  window.localStorage.clear();
  forgetCsrfToken();
  fetchMock.mockReset();
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('sign-up form validation display', () => {
  it('shows the schema message under each empty field, marks it invalid and sends nothing', async () => {
    wrap(<SignUpForm onDone={() => {}} />);
    fireEvent.click(screen.getByRole('button', { name: 'Create account' }));

    const name = await screen.findByLabelText('Display name');
    expect(name.getAttribute('aria-invalid')).toBe('true');
    expect(describedText(name)).toContain('Use at least 2 characters.');
    expect(screen.getByLabelText('E-mail').getAttribute('aria-invalid')).toBe('true');
    expect(describedText(screen.getByLabelText('Password'))).toContain(`Use at least ${PASSWORD_MIN} characters.`);
    expect(document.activeElement).toBe(name);
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('shows the minimum password length before anything is typed', () => {
    wrap(<SignUpForm onDone={() => {}} />);
    const password = screen.getByLabelText('Password');
    expect(password.getAttribute('aria-invalid')).toBeNull();
    expect(describedText(password)).toContain(`At least ${PASSWORD_MIN} characters`);
  });

  it('announces the server refusal (409 email_taken) as an alert and offers sign-in', async () => {
    fetchMock.mockImplementation(async (input) =>
      String(input) === '/api/auth/csrf'
        ? Response.json({ token: 'test-token' })
        : Response.json({ error: { code: 'email_taken', message: 'An account already uses that e-mail address.' } }, { status: 409 }),
    );
    const onDone = vi.fn();
    wrap(<SignUpForm onDone={onDone} />);
    // INVENTED person of the fictional demo club.
    fireEvent.change(screen.getByLabelText('Display name'), { target: { value: 'Invented Ivy' } });
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: 'ivy@invented.example' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'a long invented passphrase' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create account' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('An account already uses that e-mail address.');
    expect(screen.getByRole('link', { name: 'Sign in' }).getAttribute('href')).toBe('/sign-in');
    expect(onDone).not.toHaveBeenCalled();
    const post = fetchMock.mock.calls.find(([url]) => String(url) === '/api/auth/sign-up');
    expect(JSON.parse(String(post?.[1]?.body))).toEqual({ displayName: 'Invented Ivy', email: 'ivy@invented.example', password: 'a long invented passphrase' });
  });

  it('reports success with the normalised address', async () => {
    fetchMock.mockImplementation(async (input) =>
      String(input) === '/api/auth/csrf' ? Response.json({ token: 'test-token' }) : Response.json({ ok: true }, { status: 201 }),
    );
    const onDone = vi.fn();
    wrap(<SignUpForm onDone={onDone} />);
    fireEvent.change(screen.getByLabelText('Display name'), { target: { value: 'Invented Ivy' } });
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: ' Ivy@Invented.Example ' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'a long invented passphrase' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create account' }));
    await waitFor(() => expect(onDone).toHaveBeenCalledWith('ivy@invented.example'));
  });
});

describe('sign-up carries the visitor’s choices', () => {
  it('sends the units and zone chosen on this browser, and says so above the button', async () => {
    window.localStorage.setItem(READER_PREFS_STORAGE_KEY, serializePrefs({ unitSystem: 'imperial', zone: '6b', container: true }));
    fetchMock.mockImplementation(async (input) =>
      String(input) === '/api/auth/csrf' ? Response.json({ token: 'test-token' }) : Response.json({ ok: true }, { status: 201 }),
    );
    const onDone = vi.fn();
    wrap(<SignUpForm onDone={onDone} />);
    expect(screen.getByText(/Your new account starts with the settings chosen on this browser: feet and inches, zone 6b./)).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Display name'), { target: { value: 'Invented Ivy' } });
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: 'ivy@invented.example' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'a long invented passphrase' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create account' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    const post = fetchMock.mock.calls.find(([url]) => String(url) === '/api/auth/sign-up');
    // The container choice stays in the browser: the account has no place for it.
    expect(JSON.parse(String(post?.[1]?.body))).toEqual({
      displayName: 'Invented Ivy',
      email: 'ivy@invented.example',
      password: 'a long invented passphrase',
      unitSystem: 'imperial',
      hardinessZone: '6b',
    });
  });
});

describe('sign-in form refusals', () => {
  function answerSignIn(status: number, code: string, message: string) {
    fetchMock.mockImplementation(async (input) => {
      const url = String(input);
      if (url === '/api/auth/csrf') return Response.json({ token: 'test-token' });
      if (url === '/api/auth/sign-in') return Response.json({ error: { code, message } }, { status });
      return Response.json({ ok: true }, { status: 202 });
    });
  }

  function submit() {
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: 'ivy@invented.example' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'whatever it is' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
  }

  it('for an unconfirmed account, shows the server message and a button that resends the link', async () => {
    answerSignIn(403, 'email_unverified', 'Confirm your e-mail address first.');
    wrap(<SignInForm onSignedIn={() => {}} />);
    submit();
    expect((await screen.findByRole('alert')).textContent).toContain('Confirm your e-mail address first.');
    fireEvent.click(screen.getByRole('button', { name: 'Send a new confirmation link' }));
    await waitFor(() => {
      const resend = fetchMock.mock.calls.find(([url]) => String(url) === '/api/auth/resend-verification');
      expect(JSON.parse(String(resend?.[1]?.body))).toEqual({ email: 'ivy@invented.example' });
    });
  });

  it('for too many tries (429), shows the server message', async () => {
    answerSignIn(429, 'rate_limited', 'Too many sign-in attempts. Wait a while.');
    wrap(<SignInForm onSignedIn={() => {}} />);
    submit();
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Too many sign-in attempts. Wait a while.');
    expect(screen.queryByRole('button', { name: 'Send a new confirmation link' })).toBeNull();
  });
});
