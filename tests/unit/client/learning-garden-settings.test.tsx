import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { PublicUser } from '@shared/schemas/auth';
import { GardenSettings } from '@/features/preferences/components/garden-settings';
import { READER_PREFS_STORAGE_KEY } from '@/features/preferences/lib/reader-prefs';
import { CSRF_HEADER, forgetCsrfToken } from '@/lib/api';

// The account API contract is the learning brief's: PATCH /api/account { hardinessZone } → { user },
// sent with the CSRF header from GET /api/auth/csrf. Zone bands are the USDA map's (domain.md).

/** An invented member of the fictional demo club. */
const MEMBER: PublicUser = {
  id: 12,
  displayName: 'Juno Mistral',
  email: 'juno@test.example',
  role: 'viewer',
  emailVerified: true,
  unitSystem: 'metric',
  hardinessZone: null,
  createdAt: '2026-04-01T10:00:00.000Z',
};

const fetchMock = vi.fn<typeof fetch>();

function wrap() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>
        <GardenSettings />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

beforeEach(() => {
  forgetCsrfToken();
  fetchMock.mockReset();
  vi.stubGlobal('fetch', fetchMock);
  window.localStorage.clear();
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('My garden for a visitor', () => {
  beforeEach(() => {
    fetchMock.mockImplementation(async (input) => (String(input) === '/api/auth/me' ? Response.json({ user: null }) : Response.json({}, { status: 500 })));
  });

  it('keeps the zone, units and container choice in this browser and shows the zone band', async () => {
    wrap();
    await screen.findByText(/Kept in this browser only/);
    fireEvent.change(screen.getByLabelText('Hardiness zone'), { target: { value: '7b' } });
    await screen.findByText('Zone 7b: average coldest winter night 5 to 10 °F (−15.0 to −12.2 °C).');
    fireEvent.click(screen.getByLabelText('Feet and inches'));
    fireEvent.click(screen.getByLabelText('The tree would grow in a container above ground'));
    expect(JSON.parse(window.localStorage.getItem(READER_PREFS_STORAGE_KEY) ?? 'null')).toEqual({ unitSystem: 'imperial', zone: '7b', container: true });
    // Nothing went to the server but the session check.
    expect(fetchMock.mock.calls.map((c) => String(c[0]))).toEqual(['/api/auth/me']);
  });

  it('works the zone out from a temperature, and explains a typo', async () => {
    wrap();
    await screen.findByText(/Kept in this browser only/);
    fireEvent.change(screen.getByLabelText('Average coldest winter night'), { target: { value: '-5' } });
    fireEvent.click(screen.getByLabelText('°F'));
    fireEvent.click(screen.getByRole('button', { name: 'Work out my zone' }));
    // −5 °F is the bottom edge of 6b (−5…0 °F): edges belong to the warmer band (USDA map).
    await screen.findByText(/That is zone 6b/);
    expect((screen.getByLabelText('Hardiness zone') as HTMLSelectElement).value).toBe('6b');

    fireEvent.change(screen.getByLabelText('Average coldest winter night'), { target: { value: '5 degrees' } });
    fireEvent.click(screen.getByRole('button', { name: 'Work out my zone' }));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('is not a number of degrees');
    expect(screen.getByLabelText('Average coldest winter night').getAttribute('aria-invalid')).toBe('true');
  });

  it('always shows the container caution next to the container advice', async () => {
    wrap();
    await screen.findByText(/Kept in this browser only/);
    expect(screen.getByText(/Large containers are heavy/).textContent).toMatch(/licensed arborist/);
  });
});

describe('My garden for a signed-in reader', () => {
  it('saves the zone in the account with the CSRF header', async () => {
    let saved: unknown = null;
    fetchMock.mockImplementation(async (input, init) => {
      const url = String(input);
      if (url === '/api/auth/me') return Response.json({ user: MEMBER });
      if (url === '/api/auth/csrf') return Response.json({ token: 'csrf-1' });
      if (url === '/api/account' && init?.method === 'PATCH') {
        expect(new Headers(init.headers).get(CSRF_HEADER)).toBe('csrf-1');
        saved = JSON.parse(String(init.body));
        return Response.json({ user: { ...MEMBER, hardinessZone: '6a' } });
      }
      return Response.json({}, { status: 404 });
    });
    wrap();
    await screen.findByText('Zone and units are saved in your account.');
    fireEvent.change(screen.getByLabelText('Hardiness zone'), { target: { value: '6a' } });
    await waitFor(() => expect(saved).toEqual({ hardinessZone: '6a' }));
    await screen.findByText(/^Zone 6a: average coldest winter night −10 to −5 °F/);
    expect(window.localStorage.getItem(READER_PREFS_STORAGE_KEY)).toBeNull();
  });

  it('puts the old zone back when the server refuses', async () => {
    fetchMock.mockImplementation(async (input, init) => {
      const url = String(input);
      if (url === '/api/auth/me') return Response.json({ user: { ...MEMBER, hardinessZone: '8a' } });
      if (url === '/api/auth/csrf') return Response.json({ token: 'csrf-1' });
      if (init?.method === 'PATCH') return Response.json({ error: { code: 'server_error', message: 'Try again later.' } }, { status: 500 });
      return Response.json({}, { status: 404 });
    });
    wrap();
    await screen.findByText('Zone and units are saved in your account.');
    fireEvent.change(screen.getByLabelText('Hardiness zone'), { target: { value: '5a' } });
    await screen.findByText(/could not be saved: Try again later/);
    expect((screen.getByLabelText('Hardiness zone') as HTMLSelectElement).value).toBe('8a');
  });
});
