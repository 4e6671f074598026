import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { MemoryRouter, Route, Routes } from 'react-router';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { TourDto } from '@shared/schemas/tours';
import { UploadCancelled, uploadNewTour, uploadReplacementVideo } from '@/features/tours/api/upload-api';
import { NewTourPage } from '@/features/tours/components/new-tour-page';
import { ApiError, CSRF_HEADER, forgetCsrfToken } from '@/lib/api';

// The contract under test is the tours brief (multipart field "video", optional text fields,
// 202 { tour }, 422 upload_* with a message, the CSRF header from GET /api/auth/csrf) and the
// XMLHttpRequest Living Standard: upload progress arrives as ProgressEvents on xhr.upload with
// loaded/total, and abort() fires "abort". ARIA progressbar attributes per WAI-ARIA 1.2.

/** Invented tour for the fictional Fernhollow Maple Circle. */
function tourDto(over: Partial<TourDto> = {}): TourDto {
  return {
    id: 41,
    title: 'Spring walk by the pond',
    descriptionHtml: '',
    garden: 'Pellworth Sunken Garden (fictional)',
    filmedOn: null,
    state: 'processing',
    publishedAt: null,
    author: { id: 3, displayName: 'Ada Pellworth' },
    durationMs: 4000,
    width: 640,
    height: 360,
    sourceName: 'walk.mp4',
    sourceCodecs: 'h264 + aac',
    posterUrl: null,
    thumbStrip: null,
    renditions: [],
    failureReason: null,
    job: { id: 9, state: 'queued', progress: 0, etaSeconds: null, attempts: 0, maxAttempts: 3, error: null },
    canEdit: true,
    createdAt: '2026-04-18T10:00:00.000Z',
    updatedAt: '2026-04-18T10:00:00.000Z',
    ...over,
  };
}

type Listener = ((event: { loaded: number; total: number; lengthComputable: boolean }) => void) | null;

/** A stand-in for the browser's XMLHttpRequest that the test drives by hand. */
class FakeXhr {
  static all: FakeXhr[] = [];
  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: FormData | null = null;
  status = 0;
  responseText = '';
  withCredentials = true;
  aborted = false;
  responseHeaders: Record<string, string> = {};
  upload: { onprogress: Listener } = { onprogress: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  onabort: (() => void) | null = null;
  constructor() {
    FakeXhr.all.push(this);
  }
  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name.toLowerCase()] = value;
  }
  getResponseHeader(name: string) {
    return this.responseHeaders[name.toLowerCase()] ?? null;
  }
  send(body: FormData) {
    this.body = body;
  }
  abort() {
    this.aborted = true;
    this.onabort?.();
  }
  progress(loaded: number, total: number) {
    this.upload.onprogress?.({ loaded, total, lengthComputable: true });
  }
  respond(status: number, body: unknown) {
    this.status = status;
    this.responseText = typeof body === 'string' ? body : JSON.stringify(body);
    this.onload?.();
  }
}

let tokens = 0;
beforeEach(() => {
  forgetCsrfToken();
  FakeXhr.all = [];
  tokens = 0;
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string) => {
      if (String(url) === '/api/auth/csrf') {
        tokens += 1;
        return new Response(JSON.stringify({ token: `token-${tokens}` }), { status: 200, headers: { 'content-type': 'application/json' } });
      }
      return new Response(JSON.stringify({ user: null }), { status: 200, headers: { 'content-type': 'application/json' } });
    }),
  );
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

async function nextXhr(count = 1): Promise<FakeXhr> {
  await waitFor(() => expect(FakeXhr.all.length).toBeGreaterThanOrEqual(count));
  return FakeXhr.all[count - 1]!;
}

const clip = () => new File([new Uint8Array(2048)], 'spring-walk.mp4', { type: 'video/mp4' });

describe('uploadVideo over XMLHttpRequest', () => {
  it('posts multipart with the details before the file, the CSRF header and progress, and resolves the tour on 202', async () => {
    const seen: { sent: number; total: number }[] = [];
    const pending = uploadNewTour(clip(), { title: 'Spring walk by the pond', garden: 'Pellworth Sunken Garden (fictional)' }, { onProgress: (p) => seen.push(p) });
    const xhr = await nextXhr();
    expect(xhr.method).toBe('POST');
    expect(xhr.url).toBe('/api/tours');
    expect(xhr.headers[CSRF_HEADER]).toBe('token-1');
    expect(xhr.withCredentials).toBe(false);
    const keys = [...xhr.body!.keys()];
    expect(keys).toEqual(['title', 'garden', 'video']);
    expect((xhr.body!.get('video') as File).name).toBe('spring-walk.mp4');

    xhr.progress(512, 2300);
    xhr.progress(2300, 2300);
    xhr.respond(202, { tour: tourDto() });
    await expect(pending).resolves.toMatchObject({ id: 41, state: 'processing' });
    expect(seen).toEqual([
      { sent: 512, total: 2300 },
      { sent: 2300, total: 2300 },
    ]);
  });

  it('sends a replacement to the tour’s own video address', async () => {
    const pending = uploadReplacementVideo(41, clip());
    const xhr = await nextXhr();
    expect(xhr.url).toBe('/api/tours/41/video');
    xhr.respond(202, { tour: tourDto({ state: 'published' }) });
    await expect(pending).resolves.toMatchObject({ state: 'published' });
  });

  it('rejects with the server’s code and message for a refused file (422 upload_*)', async () => {
    const pending = uploadNewTour(clip(), {});
    const xhr = await nextXhr();
    xhr.respond(422, { error: { code: 'upload_audio_only', message: 'This file has sound but no picture.' } });
    const error = await pending.catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 422, code: 'upload_audio_only', message: 'This file has sound but no picture.' });
  });

  it('still gives an ApiError when a proxy answers 413 with HTML', async () => {
    const pending = uploadNewTour(clip(), {});
    const xhr = await nextXhr();
    xhr.respond(413, '<html><body>Request Entity Too Large</body></html>');
    await expect(pending).rejects.toMatchObject({ status: 413, code: 'http_error' });
  });

  it('fetches a fresh token and sends once more after 403 csrf_invalid', async () => {
    const pending = uploadNewTour(clip(), {});
    const first = await nextXhr(1);
    first.respond(403, { error: { code: 'csrf_invalid', message: 'Stale token.' } });
    const second = await nextXhr(2);
    expect(second.headers[CSRF_HEADER]).toBe('token-2');
    second.respond(202, { tour: tourDto() });
    await expect(pending).resolves.toMatchObject({ id: 41 });
  });

  it('aborts on Cancel and rejects with UploadCancelled', async () => {
    const controller = new AbortController();
    const pending = uploadNewTour(clip(), {}, { signal: controller.signal });
    const xhr = await nextXhr();
    controller.abort();
    await expect(pending).rejects.toBeInstanceOf(UploadCancelled);
    expect(xhr.aborted).toBe(true);
  });

  it('turns a network failure into the network ApiError', async () => {
    const pending = uploadNewTour(clip(), {});
    const xhr = await nextXhr();
    xhr.onerror?.();
    await expect(pending).rejects.toMatchObject({ status: 0, code: 'network' });
  });
});

function renderNewTourPage() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={['/tours/new']}>
        <Routes>
          <Route path="/tours/new" element={<NewTourPage />} />
          <Route path="/tours/:id/edit" element={<p>Edit page reached</p>} />
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

describe('the upload page', () => {
  it('asks for a file before sending anything', async () => {
    renderNewTourPage();
    fireEvent.click(screen.getByRole('button', { name: 'Upload tour' }));
    expect(await screen.findByText('Choose a video file to upload.')).toBeTruthy();
    expect(FakeXhr.all).toHaveLength(0);
  });

  it('shows bytes and percent on an ARIA progress bar, and Cancel stops the upload', async () => {
    renderNewTourPage();
    const input = document.querySelector<HTMLInputElement>('input[type="file"]')!;
    fireEvent.change(input, { target: { files: [clip()] } });
    fireEvent.click(screen.getByRole('button', { name: 'Upload tour' }));
    const xhr = await nextXhr();
    xhr.progress(12_300_000, 80_000_000);
    const bar = await screen.findByRole('progressbar', { name: 'Upload progress' });
    await waitFor(() => expect(bar.getAttribute('aria-valuenow')).toBe('15'));
    expect(bar.getAttribute('aria-valuetext')).toBe('12.3 MB of 80.0 MB · 15 %');
    expect(screen.getByText('12.3 MB of 80.0 MB · 15 %')).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Cancel upload' }));
    expect(xhr.aborted).toBe(true);
    expect(await screen.findByText(/Upload cancelled/)).toBeTruthy();
    expect(screen.queryByRole('progressbar')).toBeNull();
  });

  it('checks an optional title with the shared schema before uploading', async () => {
    renderNewTourPage();
    fireEvent.change(document.querySelector('input[type="file"]')!, { target: { files: [clip()] } });
    fireEvent.change(screen.getByLabelText('Title'), { target: { value: 'ab' } });
    fireEvent.click(screen.getByRole('button', { name: 'Upload tour' }));
    expect(await screen.findByText('Use at least 3 characters.')).toBeTruthy();
    expect(FakeXhr.all).toHaveLength(0);
  });

  it('goes to the tour’s edit page once the server accepts the file', async () => {
    renderNewTourPage();
    fireEvent.change(document.querySelector('input[type="file"]')!, { target: { files: [clip()] } });
    fireEvent.click(screen.getByRole('button', { name: 'Upload tour' }));
    const xhr = await nextXhr();
    xhr.progress(2300, 2300);
    expect(await screen.findByText(/Checking the video/)).toBeTruthy();
    xhr.respond(202, { tour: tourDto() });
    expect(await screen.findByText('Edit page reached')).toBeTruthy();
  });

  it('shows the server’s reason when it refuses the file', async () => {
    renderNewTourPage();
    fireEvent.change(document.querySelector('input[type="file"]')!, { target: { files: [clip()] } });
    fireEvent.click(screen.getByRole('button', { name: 'Upload tour' }));
    const xhr = await nextXhr();
    xhr.respond(422, { error: { code: 'upload_still_image', message: 'This file is a still picture, not a video.' } });
    expect(await screen.findByText('This file is a still picture, not a video.')).toBeTruthy();
    expect(screen.getByRole('alert').textContent).toContain('The video was not uploaded.');
  });
});
