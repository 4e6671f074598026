import { mkdtempSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { CDPSession, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, shot } from '../support/browser';
import { generateClip } from '../support/make-clip';

// The author's journey of the tours issue, end to end in Chromium against the built app with the
// demo seed (fictional Fernhollow Maple Circle; the tour below is invented test data).

const base = inject('e2eBaseUrl');
const AUTHOR = { email: 'author@fernhollow.example', password: 'maple-walk-demo' };
const TITLE = 'Pond corner in spring (fictional test walk)';
const SUITE = 'tours';

let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;
let cdp: CDPSession;
let clipDir: string;
let clip: string;
let tourId = 0;

/** Slows uploads down (DevTools network conditions) so the progress bar can be seen and cancelled. */
async function throttleUploads(bytesPerSecond: number) {
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: bytesPerSecond });
}

/** expect.poll with room for a busy machine: two cores shared by the server, ffmpeg and Chromium. */
function eventually<T>(fn: () => T | Promise<T>, timeout = 15_000) {
  return expect.poll(fn, { timeout, interval: 100 });
}

async function signIn(p: Page, email: string, password: string) {
  await p.goto(`${base}/sign-in`);
  // The first page can be slow while the server is still rendering the demo walks on a busy machine.
  await p.getByLabel('E-mail').fill(email, { timeout: 90_000 });
  await p.getByLabel('Password').fill(password);
  await p.getByRole('button', { name: 'Sign in' }).click();
  await p.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
}

async function myTourCount(p: Page): Promise<number> {
  return p.evaluate(async () => ((await (await fetch('/api/tours?mine=1')).json()) as { total: number }).total);
}

async function videoState(p: Page) {
  return p.evaluate(() => {
    const v = document.querySelector('video');
    return v ? { time: v.currentTime, ready: v.readyState, paused: v.paused, src: v.currentSrc, error: v.error?.code ?? null } : null;
  });
}

beforeAll(async () => {
  clipDir = mkdtempSync(path.join(os.tmpdir(), 'grovewalk-e2e-clip-'));
  clip = await generateClip(path.join(clipDir, 'pond-corner.mp4'), { seconds: 4, width: 640, height: 360, audio: true, label: 'Fernhollow test walk - fictional' });
  browser = await openBrowser();
  page = browser.page;
  cdp = await browser.context.newCDPSession(page);
  await cdp.send('Network.enable');
});

afterAll(async () => {
  await browser?.close();
  if (clipDir) rmSync(clipDir, { recursive: true, force: true });
});

describe('an author uploads a tour, watches it being prepared, publishes it and plays it', () => {
  it('signs in and finds the upload page from the header', { timeout: 180_000 }, async () => {
    await signIn(page, AUTHOR.email, AUTHOR.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My tours', exact: true }).click();
    await page.waitForURL(/\/my\/tours$/);
    await page.getByRole('link', { name: 'Upload a tour' }).first().click();
    await page.waitForURL(/\/tours\/new$/);
    await eventually(() => page.getByRole('heading', { level: 1, name: 'Upload a tour' }).count()).toBe(1);
    await shot(page, SUITE, '01-upload-form');
  });

  it('can cancel an upload half way, and nothing is saved', async () => {
    const before = await myTourCount(page);
    // ~40 kB/s: the clip (about a megabyte) would take half a minute to send.
    await throttleUploads(40 * 1024);
    await page.locator('input[type="file"]').setInputFiles(clip);
    await page.getByRole('button', { name: 'Upload tour' }).click();
    const bar = page.getByRole('progressbar', { name: 'Upload progress' });
    await bar.waitFor();
    await eventually(async () => Number(await bar.getAttribute('aria-valuenow')), 15_000).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Cancel upload' }).click();
    await eventually(() => page.getByText(/Upload cancelled/).count()).toBe(1);
    expect(await bar.count()).toBe(0);
    await throttleUploads(-1);
    expect(await myTourCount(page)).toBe(before);
  });

  it('uploads with a progress bar showing bytes and percent, then lands on the edit page', async () => {
    expect(statSync(clip).size).toBeGreaterThan(50_000);
    await page.getByLabel('Title').fill(TITLE);
    await page.getByLabel('Garden or place').fill('Pellworth Sunken Garden (fictional)');
    await page.getByLabel('Date filmed').fill('2026-04-18');
    // Records whether the edit page ever showed the preparation progress bar (it may be brief for a short clip).
    await page.evaluate(() => {
      const w = window as unknown as { __sawPreparing?: boolean };
      const check = () => {
        if (document.querySelector('[role="progressbar"][aria-label="Video preparation"]')) w.__sawPreparing = true;
      };
      new MutationObserver(check).observe(document.body, { subtree: true, childList: true, attributes: true });
    });
    // ~400 kB/s: a few seconds of visible progress.
    await throttleUploads(400 * 1024);
    await page.locator('input[type="file"]').setInputFiles(clip);
    await page.getByRole('button', { name: 'Upload tour' }).click();
    const bar = page.getByRole('progressbar', { name: 'Upload progress' });
    await bar.waitFor();
    await eventually(async () => Number(await bar.getAttribute('aria-valuenow')), 15_000).toBeGreaterThan(0);
    const words = await bar.getAttribute('aria-valuetext');
    expect(words).toMatch(/^\d+(\.\d)? (B|kB|MB) of \d+\.\d (kB|MB) · \d+ %$/);
    expect(await page.getByRole('button', { name: 'Cancel upload' }).count()).toBe(1);
    await shot(page, SUITE, '02-uploading');

    await page.waitForURL(/\/tours\/\d+\/edit$/, { timeout: 60_000 });
    await throttleUploads(-1);
    tourId = Number(/\/tours\/(\d+)\/edit$/.exec(page.url())![1]);
    expect(tourId).toBeGreaterThan(0);
    await shot(page, SUITE, '03-preparing');
  });

  it('shows the preparation progress, then "Video ready"', { timeout: 300_000 }, async () => {
    await eventually(() => page.evaluate(() => (window as unknown as { __sawPreparing?: boolean }).__sawPreparing === true)).toBe(true);
    // The demo seed's own walks may be ahead in the queue; on a busy machine this takes minutes.
    await page.getByRole('heading', { name: 'Video ready' }).waitFor({ timeout: 280_000 });
    await eventually(() => page.getByText('Ready, not published').count()).toBeGreaterThan(0);
    await eventually(() => page.getByText(/^360p · 640×360 ·/).count()).toBe(1);
    await shot(page, SUITE, '04-ready');
  });

  it('writes a description with the editor and saves it', async () => {
    const editor = page.getByRole('textbox', { name: 'Description' });
    await editor.waitFor();
    await editor.click();
    await page.keyboard.type('A slow walk past the pond corner. ');
    await page.getByRole('button', { name: 'Bold (Ctrl+B)' }).click();
    await page.keyboard.type('Invented maples only.');
    await page.getByRole('button', { name: 'Save details' }).click();
    await eventually(() => page.getByText('Details saved.').count()).toBe(1);
    const saved = await page.evaluate(async (id) => ((await (await fetch(`/api/tours/${id}`)).json()) as { tour: { descriptionHtml: string } }).tour.descriptionHtml, tourId);
    expect(saved).toContain('<strong>Invented maples only.</strong>');
  });

  it('publishes', async () => {
    await page.getByRole('button', { name: 'Publish tour' }).click();
    await eventually(() => page.getByText(/Everyone can find and watch it/).count()).toBe(1);
    await shot(page, SUITE, '05-published');
  });

  it('lists it under My tours as published, and the home page now links to the tours', async () => {
    await page.getByRole('link', { name: 'My tours' }).first().click();
    await page.waitForURL(/\/my\/tours$/);
    const row = page.getByRole('listitem').filter({ has: page.getByRole('link', { name: TITLE }) });
    await row.waitFor();
    await eventually(() => row.getByText('Published', { exact: true }).count()).toBe(1);
    await shot(page, SUITE, '05b-my-tours');
    await page.goto(`${base}/`);
    await page.getByRole('link', { name: /Watch the tours/ }).waitFor();
    await shot(page, SUITE, '05c-home');
  });

  it('finds the tour in the public list', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Tours', exact: true }).click();
    await page.waitForURL(/\/tours$/);
    await page.getByRole('link', { name: TITLE }).waitFor();
    await shot(page, SUITE, '06-list');
  });

  it('opens the tour page and the player plays', async () => {
    await page.getByRole('link', { name: TITLE }).click();
    await page.waitForURL(new RegExp(`/tours/${tourId}$`));
    await page.locator('video').waitFor({ state: 'attached' });
    await eventually(async () => (await videoState(page))?.ready ?? 0, 20_000).toBeGreaterThanOrEqual(1);
    expect((await videoState(page))?.src).toContain(`/media/tours/${tourId}/`);
    await eventually(() => page.getByRole('heading', { name: 'Tree card' }).count()).toBe(1);
    await eventually(() => page.getByRole('heading', { name: 'Trail' }).count()).toBe(1);
    await shot(page, SUITE, '07-watch');

    // Muted, so headless Chromium's autoplay rules allow play() after the click.
    await page.evaluate(() => {
      document.querySelector('video')!.muted = true;
    });
    await page.locator('.vjs-big-play-button').click();
    await eventually(async () => (await videoState(page))?.time ?? 0, 20_000).toBeGreaterThan(0.5);
    const state = await videoState(page);
    expect(state?.error).toBeNull();
    // Hovering the progress bar shows a preview cut from the thumbnail sheets.
    // A first move wakes the controls (video.js hides them from the pointer while idle).
    const playerBox = (await page.locator('.video-js').boundingBox())!;
    await page.mouse.move(playerBox.x + playerBox.width / 2, playerBox.y + playerBox.height / 2);
    const progress = page.locator('.vjs-progress-control');
    const box = (await progress.boundingBox())!;
    await page.mouse.move(box.x + box.width * 0.6, box.y + box.height / 2, { steps: 4 });
    const preview = page.locator('.gw-thumb-preview');
    await preview.waitFor();
    expect(await preview.evaluate((el) => getComputedStyle(el).backgroundImage)).toContain(`/media/tours/${tourId}/`);
    await shot(page, SUITE, '08-playing');
    await page.mouse.move(0, 0);
  });

  it('answers the keyboard when the player has focus', async () => {
    await page.locator('.video-js').focus();
    await page.keyboard.press('k');
    await eventually(async () => (await videoState(page))?.paused).toBe(true);
    await page.keyboard.press('Shift+Period');
    await eventually(() => page.getByLabel('Speed').inputValue()).toBe('1.25');
    await page.keyboard.press('Home');
    await eventually(async () => (await videoState(page))?.time ?? -1).toBeLessThan(0.1);
    // Forward 5 s, but never past the end of this 4-second clip.
    const duration = await page.evaluate(() => document.querySelector('video')!.duration);
    await page.keyboard.press('ArrowRight');
    await eventually(async () => (await videoState(page))?.time ?? 0).toBeCloseTo(Math.min(5, duration), 1);

    // "Copy link at this moment" puts this page's address with ?t= (whole seconds) on the clipboard.
    await browser.context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: base });
    await page.getByRole('button', { name: 'Copy link at this moment' }).click();
    await eventually(() => page.getByText(/Link copied/).count()).toBe(1);
    const copied = new URL(await page.evaluate(() => navigator.clipboard.readText()));
    expect(copied.pathname).toBe(`/tours/${tourId}`);
    expect(Number(copied.searchParams.get('t'))).toBe(Math.floor(Math.min(5, duration)));

    await page.locator('.video-js').focus();
    await page.keyboard.press('ArrowLeft');
    await eventually(async () => (await videoState(page))?.time ?? -1).toBeCloseTo(Math.max(0, Math.min(5, duration) - 5), 1);
    await page.getByRole('button', { name: /^Keyboard shortcuts/ }).click();
    await page.getByRole('dialog', { name: 'Keyboard shortcuts' }).getByRole('table', { name: 'Keyboard shortcuts for the video' }).waitFor();
    await shot(page, SUITE, '08b-keyboard-help');
  });

  it('starts a ?t=2 link at two seconds', async () => {
    await page.goto(`${base}/tours/${tourId}?t=2`);
    await page.locator('video').waitFor({ state: 'attached' });
    await eventually(async () => (await videoState(page))?.ready ?? 0, 20_000).toBeGreaterThanOrEqual(1);
    await eventually(async () => (await videoState(page))?.time ?? 0).toBeGreaterThanOrEqual(1.9);
    expect((await videoState(page))!.time).toBeLessThan(2.5);
    await shot(page, SUITE, '09-deep-link');
  });

  it('says so for a tour that does not exist', async () => {
    await page.goto(`${base}/tours/99999999`);
    await eventually(() => page.getByRole('heading', { level: 1, name: 'Tour not found' }).count()).toBe(1);
  });

  it('stacks the tour page on a phone without sideways scrolling', async () => {
    const phone = await openBrowser({ viewport: { width: 390, height: 844 } });
    try {
      await phone.page.goto(`${base}/tours/${tourId}`);
      await phone.page.locator('video').waitFor({ state: 'attached' });
      await eventually(async () => (await videoState(phone.page))?.ready ?? 0, 20_000).toBeGreaterThanOrEqual(1);
      const widths = await phone.page.evaluate(() => ({ doc: document.documentElement.scrollWidth, view: window.innerWidth }));
      expect(widths.doc).toBeLessThanOrEqual(widths.view);
      // Stacked: the tree card comes below the player, not beside it.
      const player = await phone.page.locator('.video-js').boundingBox();
      const card = await phone.page.getByRole('heading', { name: 'Tree card' }).boundingBox();
      expect(card!.y).toBeGreaterThan(player!.y + player!.height);
      await shot(phone.page, SUITE, '10-watch-phone');
      await phone.page.goto(`${base}/tours`);
      await phone.page.getByRole('link', { name: TITLE }).waitFor();
      await shot(phone.page, SUITE, '11-list-phone');
    } finally {
      await phone.close();
    }
  });
});
