import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { TourDto } from '@shared/schemas/tours';
import { MyToursPage } from '@/features/tours/components/my-tours-page';
import { TranscodePanel } from '@/features/tours/components/transcode-panel';
import { CSRF_HEADER, forgetCsrfToken } from '@/lib/api';

// Contract: the tours brief (GET /api/tours?mine=1 with job { progress 0–100, etaSeconds,
// attempts, maxAttempts } and failureReason; POST /api/tours/:id/transcode → 202 { job }).
// Progress bars per WAI-ARIA 1.2 (role progressbar, aria-valuenow, aria-valuetext).

/** Invented tours of the fictional Fernhollow Maple Circle. */
function tourDto(over: Partial<TourDto>): TourDto {
  return {
    id: 1,
    title: 'Untitled',
    descriptionHtml: '',
    garden: '',
    filmedOn: null,
    state: 'ready',
    publishedAt: null,
    author: { id: 3, displayName: 'Ada Pellworth' },
    durationMs: 32_000,
    width: 1280,
    height: 720,
    sourceName: 'walk.mp4',
    sourceCodecs: 'h264 + aac',
    posterUrl: null,
    thumbStrip: null,
    renditions: [],
    failureReason: null,
    job: null,
    canEdit: true,
    createdAt: '2026-04-18T10:00:00.000Z',
    updatedAt: '2026-04-18T10:00:00.000Z',
    ...over,
  };
}

const busy = tourDto({
  id: 11,
  title: 'Spring walk (fictional)',
  state: 'processing',
  job: { id: 5, state: 'running', progress: 42.4, etaSeconds: 33, attempts: 1, maxAttempts: 3, error: null },
});
const failed = tourDto({
  id: 12,
  title: 'Frosty morning (fictional)',
  state: 'failed',
  failureReason: 'The video stream ends early: the file looks cut off.',
  job: { id: 6, state: 'failed', progress: 10, etaSeconds: null, attempts: 3, maxAttempts: 3, error: 'ffmpeg exited with code 1' },
});
const published = tourDto({
  id: 13,
  title: 'Autumn terrace (fictional)',
  state: 'published',
  renditions: [{ height: 720, width: 1280, url: '/media/tours/13/720.mp4?v=1', bytes: 4_200_000, label: '720p' }],
});

const calls: { url: string; method: string; headers: Record<string, string> }[] = [];
function json(body: unknown, status = 200) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

beforeEach(() => {
  forgetCsrfToken();
  calls.length = 0;
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = String(input);
      calls.push({ url, method: init?.method ?? 'GET', headers: Object.fromEntries(new Headers(init?.headers).entries()) });
      if (url === '/api/auth/csrf') return json({ token: 'token-1' });
      if (url.startsWith('/api/tours?')) return json({ items: [busy, failed, published], total: 3, page: 1, pageSize: 20 });
      if (url.endsWith('/transcode')) return json({ job: { id: 7, state: 'queued', progress: 0, etaSeconds: null, attempts: 0, maxAttempts: 3, error: null } }, 202);
      return json({ error: { code: 'not_found', message: 'No such thing.' } }, 404);
    }),
  );
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function wrap(children: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>{children}</MemoryRouter>
    </QueryClientProvider>,
  );
}

describe('My tours', () => {
  it('shows each state: progress with time left, the failure reason with Try again, published with Watch', async () => {
    wrap(<MyToursPage />);
    const bar = await screen.findByRole('progressbar', { name: 'Preparing “Spring walk (fictional)”' });
    expect(bar.getAttribute('aria-valuenow')).toBe('42');
    expect(bar.getAttribute('aria-valuetext')).toBe('42 % · about 35 seconds left');
    expect(screen.getByText('The video stream ends early: the file looks cut off.')).toBeTruthy();
    expect(screen.getByText('Video could not be prepared')).toBeTruthy();
    expect(screen.getByText('Published')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Watch “Autumn terrace (fictional)”' }).getAttribute('href')).toBe('/tours/13');
    expect(calls.find((c) => c.url.startsWith('/api/tours?'))?.url).toContain('mine=1');
  });

  it('queues the transcode again from "Try again", with the CSRF header', async () => {
    wrap(<MyToursPage />);
    fireEvent.click(await screen.findByRole('button', { name: 'Try again' }));
    await waitFor(() => expect(calls.some((c) => c.url === '/api/tours/12/transcode')).toBe(true));
    const post = calls.find((c) => c.url === '/api/tours/12/transcode')!;
    expect(post.method).toBe('POST');
    expect(post.headers[CSRF_HEADER]).toBe('token-1');
  });
});

describe('the video status panel on the edit page', () => {
  it('says how far preparation is, with the attempt', () => {
    wrap(<TranscodePanel tour={busy} />);
    expect(screen.getByRole('heading', { name: 'Preparing the video' })).toBeTruthy();
    expect(screen.getByText('Attempt 1 of 3')).toBeTruthy();
    expect(screen.getByRole('progressbar', { name: 'Video preparation' }).getAttribute('aria-valuenow')).toBe('42');
  });

  it('gives the reason in plain words after a failure', () => {
    wrap(<TranscodePanel tour={failed} />);
    expect(screen.getByRole('heading', { name: 'The video could not be prepared' })).toBeTruthy();
    expect(screen.getByText('The video stream ends early: the file looks cut off.')).toBeTruthy();
    expect(screen.getByText('Tried 3 of 3 times.')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });

  it('lists the versions once ready', () => {
    wrap(<TranscodePanel tour={published} />);
    expect(screen.getByRole('heading', { name: 'Video ready' })).toBeTruthy();
    expect(screen.getByText('720p · 1280×720 · 4.2 MB')).toBeTruthy();
  });
});
