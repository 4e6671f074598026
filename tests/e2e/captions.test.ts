import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, shot } from '../support/browser';
import { generateClip } from '../support/make-clip';

// The captions journey of issue 4, end to end in Chromium against the built app with the demo
// seed (the fictional Fernhollow Maple Circle). The tour, the narration and the SRT file below are
// invented test data; 'Yuki-hotaru' and 'Mizu-kagari' are invented demo cultivar records.
// SRT layout per the Matroska specification's "SRT Subtitles" (sequence number, HH:MM:SS,mmm
// timings, CRLF line ends, formatting tags such as <i>); the export is W3C WebVTT.

const base = inject('e2eBaseUrl');
const AUTHOR = { email: 'author@fernhollow.example', password: 'maple-walk-demo' };
const SUITE = 'captions';
const CLIP_SECONDS = 24;

/** Block 2 misspells the invented record name ('Yuki-hotaro'); block 6 has a broken arrow; block 7 runs past the clip. */
const SRT = [
  '1',
  '00:00:01,000 --> 00:00:04,000',
  'Welcome to the pond corner of our garden.',
  '',
  '2',
  '00:00:04,500 --> 00:00:08,000',
  'Under the birch: <i>Yuki-hotaro</i>,',
  'kept in shade.',
  '',
  '3',
  '00:00:09,000 --> 00:00:12,500',
  'Its cream flecks burn in hot sun.',
  '',
  '4',
  '00:00:13,000 --> 00:00:16,000',
  'By the steps: Mizu-kagari.',
  '',
  '5',
  '00:00:17,000 --> 00:00:20,000',
  'Lime green in spring.',
  '',
  '6',
  '00:00:21,000 -> 00:00:22,000',
  'This block has a broken arrow.',
  '',
  '7',
  '00:00:30,000 --> 00:00:32,000',
  'This cue runs past the end of the clip.',
  '',
].join('\r\n');

let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;
let dir: string;
let srtFile: string;
let tourId = 0;
/** Uncaught errors in the page; the journey must end without any. */
const pageErrors: string[] = [];

/** expect.poll with room for a busy machine: two cores shared by the server, ffmpeg and Chromium. */
function eventually<T>(fn: () => T | Promise<T>, timeout = 15_000) {
  return expect.poll(fn, { timeout, interval: 100 });
}

async function signIn(p: Page) {
  await p.goto(`${base}/sign-in`);
  await p.getByLabel('E-mail').fill(AUTHOR.email);
  await p.getByLabel('Password').fill(AUTHOR.password);
  await p.getByRole('button', { name: 'Sign in' }).click();
  await p.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
}

async function csrf(p: Page): Promise<string> {
  const r = await p.request.get(`${base}/api/auth/csrf`);
  return ((await r.json()) as { token: string }).token;
}

async function apiJson<T>(p: Page, url: string): Promise<T> {
  const r = await p.request.get(`${base}${url}`);
  expect(r.status(), url).toBe(200);
  return (await r.json()) as T;
}

type TrackDetail = { track: { id: number; version: number }; cues: { id: string | null; startMs: number; endMs: number; text: string; settings: string }[] };

async function openTrack(p: Page): Promise<TrackDetail> {
  const tracks = await apiJson<{ items: { id: number }[] }>(p, `/api/tours/${tourId}/tracks`);
  return apiJson<TrackDetail>(p, `/api/tracks/${tracks.items[0]!.id}`);
}

async function exportedVtt(p: Page): Promise<string> {
  const { track } = await openTrack(p);
  const r = await p.request.get(`${base}/api/tracks/${track.id}/export.vtt`);
  expect(r.status()).toBe(200);
  return r.text();
}

/** Waits until the editor's readout shows the playhead at `time` (a seek settles in a moment). */
async function playheadAt(time: string) {
  try {
    await eventually(() => page.getByText(new RegExp(`^Playhead at ${time.replace('.', '\\.')} /`)).count()).toBe(1);
  } catch (error) {
    await shot(page, SUITE, `failed-playhead-${time.replace(/[:.]/g, '-')}`);
    throw error;
  }
}

async function tab(p: Page, name: 'Cues' | 'Stops' | 'Downloads') {
  await p.getByRole('tab', { name: new RegExp(`^${name}`) }).click();
}

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'grovewalk-e2e-captions-'));
  srtFile = path.join(dir, 'pond-corner.en.srt');
  writeFileSync(srtFile, SRT, 'utf8');
  const clip = await generateClip(path.join(dir, 'pond-corner.mp4'), { seconds: CLIP_SECONDS, width: 640, height: 360, audio: true, label: 'Fernhollow captions test - fictional' });
  browser = await openBrowser();
  page = browser.page;
  page.on('pageerror', (error) => pageErrors.push(error.message));
  await signIn(page);
  // Upload through the API with the signed-in browser's own session (the upload page has its own e2e test).
  const r = await page.request.post(`${base}/api/tours`, {
    headers: { 'x-csrf-token': await csrf(page) },
    multipart: {
      title: 'Pond corner captions (fictional test walk)',
      garden: 'Pellworth Sunken Garden (fictional)',
      video: { name: 'pond-corner.mp4', mimeType: 'video/mp4', buffer: readFileSync(clip) },
    },
  });
  expect(r.status()).toBe(202);
  tourId = ((await r.json()) as { tour: { id: number } }).tour.id;
});

afterAll(async () => {
  await browser?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('an author captions a tour and marks its stops', () => {
  it('waits for the uploaded video to be prepared', { timeout: 300_000 }, async () => {
    // The demo seed's own walks may be ahead in the queue.
    await eventually(async () => (await apiJson<{ tour: { renditions: unknown[] } }>(page, `/api/tours/${tourId}`)).tour.renditions.length, 280_000).toBeGreaterThan(0);
  });

  it('finds "Captions and stops" on the edit page and sees the empty editor', async () => {
    await page.goto(`${base}/tours/${tourId}/edit`);
    await page.getByRole('heading', { level: 1, name: 'Edit tour' }).waitFor().catch(() => undefined);
    await shot(page, SUITE, '00-edit-page');
    await page.getByRole('link', { name: 'Captions and stops' }).click();
    await page.waitForURL(new RegExp(`/tours/${tourId}/captions`));
    await page.getByRole('heading', { level: 1, name: 'Captions and stops' }).waitFor();
    await page.getByText('No captions yet').waitFor();
    await eventually(() => page.evaluate(() => document.querySelector('video')?.readyState ?? 0), 20_000).toBeGreaterThanOrEqual(1);
    await shot(page, SUITE, '01-empty');
  });

  it('imports an SRT file after reviewing what was read: format, encoding, problems by line, a cue past the end', async () => {
    await page.getByRole('button', { name: 'Import file' }).first().click();
    await page.getByLabel('Caption file', { exact: true }).setInputFiles(srtFile);
    await page.getByRole('heading', { name: 'Review the file before importing' }).waitFor();
    const review = page.locator('section', { has: page.getByRole('heading', { name: 'Review the file before importing' }) });
    await review.getByText('SubRip (.srt)').waitFor();
    expect(await review.getByText('UTF-8', { exact: false }).count()).toBeGreaterThan(0);
    // Block 6 is dropped with an error on its own lines (22–23); six cues are read.
    const problems = review.locator('ol').first();
    expect(await problems.getByText(/^Line 2[23]/).count()).toBeGreaterThan(0);
    expect(await problems.getByText('Error', { exact: true }).count()).toBeGreaterThan(0);
    expect(await problems.getByText(/run past the end of the video/).count()).toBe(1);
    expect(await review.getByText('after the end', { exact: true }).count()).toBe(1);
    // The <i> tag is read as formatting: the review shows the words without it.
    expect(await review.getByRole('cell', { name: /Under the birch: Yuki-hotaro,/ }).count()).toBe(1);
    await shot(page, SUITE, '02-review');

    await review.getByRole('button', { name: 'Import the 6 cues that were read' }).click();
    await page.getByRole('textbox', { name: 'Text of cue 6' }).waitFor();
    await eventually(() => page.getByLabel('Caption track').inputValue()).not.toBe('');
    const stored = await openTrack(page);
    expect(stored.cues.map((c) => [c.startMs, c.endMs])).toEqual([
      [1000, 4000],
      [4500, 8000],
      [9000, 12_500],
      [13_000, 16_000],
      [17_000, 20_000],
      [30_000, 32_000],
    ]);
    expect(stored.cues[1]!.text).toBe('Under the birch: <i>Yuki-hotaro</i>,\nkept in shade.');
    await page.getByText(/cues · \d+ with issues/).waitFor();
    await shot(page, SUITE, '03-imported');
  });

  it('fixes a cue with the keyboard: moves to it, retypes the text, nudges its end, undoes and redoes', async () => {
    await page.getByRole('textbox', { name: 'Text of cue 1' }).click();
    await page.keyboard.press('Alt+ArrowDown');
    const cue2 = page.getByRole('textbox', { name: 'Text of cue 2' });
    await eventually(() => cue2.evaluate((el) => el === document.activeElement)).toBe(true);
    await page.keyboard.press('Control+a');
    await page.keyboard.type('Under the birch: <i>Yuki-hotaru</i>,');
    await page.keyboard.press('Enter');
    await page.keyboard.type('kept in shade.');
    await page.keyboard.press('Alt+Shift+ArrowRight');
    const end2 = page.getByRole('textbox', { name: 'End of cue 2' });
    await eventually(() => end2.inputValue()).toBe('00:08.100');
    await page.keyboard.press('Control+z');
    await eventually(() => end2.inputValue()).toBe('00:08.000');
    expect(await cue2.inputValue()).toBe('Under the birch: <i>Yuki-hotaru</i>,\nkept in shade.');
    await page.keyboard.press('Control+Shift+z');
    await eventually(() => end2.inputValue()).toBe('00:08.100');
    // The selected cue explains its findings with the limit and its source.
    await page.getByText('Keyboard shortcuts', { exact: true }).click();
    await page.getByRole('table', { name: 'Keyboard shortcuts of the caption editor' }).waitFor();
    await eventually(() => page.getByText(/^Saved at \d\d:\d\d$/).count(), 20_000).toBe(1);
    await shot(page, SUITE, '04-fixed-and-saved');
    await page.getByText('Keyboard shortcuts', { exact: true }).click();
    const vtt = await exportedVtt(page);
    expect(vtt).toContain('00:00:04.500 --> 00:00:08.100\nUnder the birch: <i>Yuki-hotaru</i>,\nkept in shade.');
  });

  it('shows quality findings with their source, and filters to the cues that have them', async () => {
    await page.getByRole('textbox', { name: 'Text of cue 6' }).click();
    const row = page.locator('li[data-cue-key]', { has: page.getByRole('textbox', { name: 'Text of cue 6' }) });
    // Cue 6 has a 39-character line (BBC Subtitle Guidelines §3.1 allow 37).
    expect(await row.getByRole('list', { name: 'Quality checks on cue 6' }).getByRole('listitem').count()).toBeGreaterThan(0);
    await row.getByRole('button', { name: /^Why\?/ }).click();
    await row.getByText(/^Limit: over 37 characters per line — BBC Subtitle Guidelines.*§3\.1/).waitFor();
    await page.getByLabel('Only cues with issues').check();
    const shown = await page.locator('li[data-cue-key]').count();
    expect(shown).toBeLessThan(6);
    await shot(page, SUITE, '05-quality-filter');
    await page.getByLabel('Only cues with issues').uncheck();
  });

  it('asks before leaving while a change is not saved yet', async () => {
    await page.getByRole('textbox', { name: 'Text of cue 3' }).click();
    await page.keyboard.press('End');
    await page.keyboard.type(' Shade it.');
    await page.getByRole('link', { name: 'Edit tour' }).click();
    const dialog = page.getByRole('dialog', { name: 'Leave with unsaved changes?' });
    await dialog.waitFor();
    await shot(page, SUITE, '05b-leave-guard');
    await dialog.getByRole('button', { name: 'Stay here' }).click();
    expect(page.url()).toContain(`/tours/${tourId}/captions`);
    await eventually(() => page.getByText(/^Saved at \d\d:\d\d$/).count(), 20_000).toBe(1);
    expect((await openTrack(page)).cues[2]!.text).toBe('Its cream flecks burn in hot sun. Shade it.');
  });

  it('adds two stops linked to cultivar records with the picker', async () => {
    // Stop for Mizu-kagari from the playhead at cue 4 (13 s): ten seconds, within the clip.
    await page.getByRole('button', { name: /^Cue 4, go to/ }).click();
    await playheadAt('00:13.000');
    await tab(page, 'Stops');
    await page.getByRole('button', { name: 'Add stop at playhead (00:13.000)' }).click();
    const form = page.locator('form', { has: page.getByRole('heading', { name: 'New stop from the playhead' }) });
    await form.getByRole('combobox', { name: 'Cultivar record' }).click();
    await page.keyboard.type('Mizu');
    // The list keeps the previous matches while the new ones load: wait until the first record is the one asked for.
    await eventually(() => form.getByRole('option').nth(1).textContent()).toMatch(/Mizu-kagari/);
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Enter');
    await eventually(() => form.getByText(/Linked to: .*Mizu-kagari/).count()).toBe(1);
    await shot(page, SUITE, '06-stop-form');
    await form.getByRole('button', { name: 'Save stop' }).click();
    await page.getByRole('heading', { name: 'New stop from the playhead' }).waitFor({ state: 'detached' });

    // Stop for Yuki-hotaru from cue 2: from its start to where the next stop begins.
    await tab(page, 'Cues');
    await page.getByRole('button', { name: /^Cue 2, go to/ }).click();
    await playheadAt('00:04.500');
    await tab(page, 'Stops');
    await page.getByRole('button', { name: 'Add stop from this cue (00:04.500)' }).click();
    const second = page.locator('form', { has: page.getByRole('heading', { name: 'New stop from the selected cue' }) });
    await second.getByRole('combobox', { name: 'Cultivar record' }).click();
    await page.keyboard.type('Yuki');
    await eventually(() => second.getByRole('option').nth(1).textContent()).toMatch(/Yuki-hotaru/);
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Enter');
    await second.getByRole('button', { name: 'Save stop' }).click();
    await page.getByRole('heading', { name: 'New stop from the selected cue' }).waitFor({ state: 'detached' });

    const stops = await apiJson<{ items: { startMs: number; endMs: number; cultivar: { acceptedName: string } | null }[] }>(page, `/api/tours/${tourId}/stops`);
    expect(stops.items.map((s) => [s.startMs, s.endMs, s.cultivar?.acceptedName])).toEqual([
      [4500, 13_000, "Acer palmatum (Matsumurae Group) 'Yuki-hotaru'"],
      [13_000, 23_000, "Acer palmatum (Dissectum Group) 'Mizu-kagari'"],
    ]);
    const timeline = page.getByRole('list', { name: 'Stops on the timeline' });
    await eventually(() => timeline.getByRole('listitem').count()).toBe(2);
    await page.getByRole('heading', { name: 'Make jumps land exactly on each stop?' }).waitFor();
    await shot(page, SUITE, '07-stops');
  });

  it('shows the server’s overlap refusal next to the stop, and queues keyframes at the stop starts', async () => {
    await page.getByRole('button', { name: 'Edit stop 2' }).click();
    const form = page.locator('form', { has: page.getByRole('heading', { name: 'Edit stop 2' }) });
    const start = form.getByRole('textbox', { name: 'Starts at' });
    await start.fill('00:10.000');
    await start.press('Enter');
    await form.getByRole('button', { name: 'Save stop' }).click();
    await form.getByText(/overlaps the stop from 0:04\.500 to 0:13/).waitFor();
    await shot(page, SUITE, '08-stop-overlap');
    await form.getByRole('button', { name: 'Cancel' }).click();

    await page.getByRole('button', { name: 'Prepare the video again for exact jumps' }).click();
    await page.getByText(/^Queued\. The video is being prepared again/).waitFor();
  });

  it('never overwrites another save silently: shows who saved, then keeps the author’s version on request', async () => {
    // Someone else (the same account in another tab, here the API) saves the track first.
    const before = await openTrack(page);
    const theirs = before.cues.map((c, i) => (i === 4 ? { ...c, text: 'Lime green in spring (their edit).' } : c));
    const put = await page.request.put(`${base}/api/tracks/${before.track.id}/cues`, {
      headers: { 'x-csrf-token': await csrf(page) },
      data: { version: before.track.version, cues: theirs },
    });
    expect(put.status()).toBe(200);

    await tab(page, 'Cues');
    const cue5 = page.getByRole('textbox', { name: 'Text of cue 5' });
    await cue5.click();
    await page.keyboard.press('End');
    await page.keyboard.type(' Mine.');
    const alert = page.getByRole('alert').filter({ hasText: 'Someone else saved this track while you were editing.' });
    await alert.waitFor({ timeout: 20_000 });
    expect(await alert.getByText(/You \(in another window or tab\) saved this track at/).count()).toBe(1);
    // Nothing of ours went in.
    expect((await openTrack(page)).cues[4]!.text).toBe('Lime green in spring (their edit).');
    await shot(page, SUITE, '09-conflict');
    await alert.getByRole('button', { name: 'Keep mine and save over it' }).click();
    await eventually(() => page.getByText(/^Saved at \d\d:\d\d$/).count(), 20_000).toBe(1);
    expect((await openTrack(page)).cues[4]!.text).toBe('Lime green in spring. Mine.');
  });

  it('downloads the track as WebVTT holding the change, and SRT and the stop tracks too', async () => {
    await tab(page, 'Downloads');
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'WebVTT (.vtt)' }).click()]);
    expect(download.suggestedFilename()).toMatch(/\.en\.vtt$/);
    const vtt = readFileSync(await download.path(), 'utf8');
    expect(vtt.startsWith('WEBVTT')).toBe(true);
    expect(vtt).toContain('00:00:04.500 --> 00:00:08.100\nUnder the birch: <i>Yuki-hotaru</i>,\nkept in shade.');
    expect(vtt).toContain('Lime green in spring. Mine.');
    const { track } = await openTrack(page);
    const srt = await (await page.request.get(`${base}/api/tracks/${track.id}/export.srt`)).text();
    expect(srt).toContain('00:00:04,500 --> 00:00:08,100\r\nUnder the birch: <i>Yuki-hotaru</i>,\r\nkept in shade.');
    const chapters = await (await page.request.get(`${base}/api/tours/${tourId}/chapters.vtt`)).text();
    expect(chapters).toContain('00:00:04.500 --> 00:00:13.000');
    expect(chapters).toContain('00:00:13.000 --> 00:00:23.000');
    const metadata = await (await page.request.get(`${base}/api/tours/${tourId}/metadata.vtt`)).text();
    expect(metadata).toContain('"slug"');
    await shot(page, SUITE, '10-downloads');
  });

  it('reads the transcript, each paragraph linking to its moment', async () => {
    await page.getByRole('link', { name: 'Open the transcript page' }).click();
    await page.waitForURL(new RegExp(`/tours/${tourId}/transcript`));
    await page.getByRole('heading', { level: 1, name: 'Transcript' }).waitFor();
    const first = page.getByRole('link', { name: /^Watch from 0:01/ });
    await first.waitFor();
    expect(await first.getAttribute('href')).toBe(`/tours/${tourId}?t=1`);
    await page.getByText(/Under the birch: Yuki-hotaru, kept in shade\./).first().waitFor();
    await shot(page, SUITE, '11-transcript');
  });

  it('stacks the editor on a phone without sideways scrolling', async () => {
    const phone = await openBrowser({ viewport: { width: 390, height: 844 } });
    try {
      await signIn(phone.page);
      await phone.page.goto(`${base}/tours/${tourId}/captions`);
      await phone.page.getByRole('textbox', { name: 'Text of cue 1' }).waitFor();
      const widths = await phone.page.evaluate(() => ({ doc: document.documentElement.scrollWidth, view: window.innerWidth }));
      expect(widths.doc).toBeLessThanOrEqual(widths.view);
      const video = await phone.page.locator('video').boundingBox();
      const list = await phone.page.getByRole('tablist', { name: 'Editor parts' }).boundingBox();
      expect(list!.y).toBeGreaterThan(video!.y + video!.height);
      await shot(phone.page, SUITE, '12-phone');
    } finally {
      await phone.close();
    }
  });

  it('tells someone who cannot edit a tour that the editor is not theirs', async () => {
    // A demo walk by another member of the fictional club, once it is published.
    const other = async () => {
      const list = await apiJson<{ items: { id: number; author: { displayName: string } }[] }>(page, '/api/tours?pageSize=50');
      return list.items.find((t) => t.author.displayName !== 'Ada Pellworth')?.id ?? 0;
    };
    await eventually(other, 120_000).toBeGreaterThan(0);
    await page.goto(`${base}/tours/${await other()}/captions`);
    await page.getByRole('heading', { level: 1, name: 'You cannot edit these captions' }).waitFor();
    await shot(page, SUITE, '13-not-editor');
  });

  it('ran the whole journey without an uncaught error in the page', () => {
    expect(pageErrors).toEqual([]);
  });
});
