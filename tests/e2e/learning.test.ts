import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, shot } from '../support/browser';

// The learner's journey of issue 7, end to end in Chromium against the built app with the demo
// seed: the fictional Fernhollow Maple Circle, its invented cultivars (Sora-no-hane, Mizu-kagari,
// …, see server/db/seed/demo-cultivars.ts) and three demo walks that publish themselves after
// their background transcode.

const base = inject('e2eBaseUrl');
const VIEWER = { email: 'viewer@fernhollow.example', password: 'maple-walk-demo' };
const AUTHOR = { email: 'author@fernhollow.example', password: 'maple-walk-demo' };
const SUITE = 'learning';
/** Pages load their code on first use, so checks on the screen wait up to 10 s (vitest polls 1 s by default). */
const WAIT = { timeout: 10_000 };

let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;
let compareUrl = '';

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
});
afterAll(async () => browser?.close());

/** Leaves the app first, so no answer still on its way can set the session cookie again. */
async function signOut(p: Page) {
  await p.goto('about:blank');
  await p.context().clearCookies();
}

async function signIn(p: Page, email: string, password: string) {
  await signOut(p);
  await p.goto(`${base}/sign-in`);
  await p.getByLabel('E-mail').fill(email);
  await p.getByLabel('Password').fill(password);
  await p.getByRole('button', { name: 'Sign in' }).click();
  await p.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
}

/**
 * Answers one finder question, opening "More questions" or "Other answers" when the answer is
 * folded away, and waits for the answer to be listed under "Your answers".
 */
async function answer(p: Page, question: string, option: RegExp) {
  const region = p.getByRole('region', { name: question, exact: true }).first();
  if (!(await region.isVisible())) await p.getByText(/^More questions/).click();
  await region.waitFor();
  const button = region.getByRole('button', { name: option }).first();
  if (!(await button.isVisible())) await region.getByText('Other answers').click();
  await button.click();
  // The block may move (suggested ↔ folded list) once answered, so the check is on the answer list.
  await p.getByRole('button', { name: `Remove answer: ${question}` }).waitFor();
}

function candidates(p: Page) {
  return p.getByRole('list', { name: 'Closest matches' }).getByRole('article');
}

async function api<T>(p: Page, path: string): Promise<{ status: number; body: T }> {
  return p.evaluate(async (url) => {
    const r = await fetch(url, { headers: { accept: 'application/json' } });
    return { status: r.status, body: (await r.json()) as T };
  }, path);
}

describe('the demo club', () => {
  // Learn mode and the tour clips need the demo walks, which transcode and publish in the background.
  it('has its demo tours published', { timeout: 240_000 }, async () => {
    await page.goto(`${base}/`);
    await expect
      .poll(async () => (await api<unknown>(page, '/api/learn/question')).status, { timeout: 230_000, interval: 2_000 })
      .toBe(200);
  });
});

describe('a learner narrows down a tree with the finder and compares it with its look-alike', () => {
  it('starts with the starter questions and an empty list', async () => {
    await page.goto(`${base}/`);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Tree finder' }).click();
    await page.waitForURL(/\/finder$/);
    await expect.poll(() => page.getByRole('heading', { level: 1, name: 'Tree finder' }).count(), WAIT).toBe(1);
    await expect.poll(() => page.getByText('Answer a question to rank the trees').count(), WAIT).toBe(1);
    // Nothing answered: the fixed glance-level start (leaf form first), not an error.
    await expect.poll(() => page.getByText(/^Most useful next: Leaf form/).count(), WAIT).toBe(1);
    await shot(page, SUITE, '01-finder-start');
  });

  it('answers three questions in its own order and sees Sora-no-hane first', async () => {
    await answer(page, 'Leaf form', /Lace, cut to the base/);
    await expect.poll(() => page.getByText('Your answers (1)').count(), WAIT).toBe(1);
    await answer(page, 'Shape', /^Weeping$/);
    await expect.poll(() => page.getByText('Your answers (2)').count(), WAIT).toBe(1);
    // Winter months have no leaf colour, so the season is picked first; the colour belongs to it.
    const colour = page.getByRole('region', { name: /^(Colour in|Leaf colour)/ }).first();
    if (!(await colour.isVisible())) await page.getByText(/^More questions/).click();
    await colour.getByRole('radio', { name: /spring/i }).click();
    await page.waitForURL((u) => u.searchParams.get('season') === 'spring');
    await answer(page, 'Colour in spring', /^Deep red$/);
    await expect.poll(() => page.getByText('Your answers (3)').count(), WAIT).toBe(1);
    expect(new URL(page.url()).searchParams.get('colour')).toBe('deep-red');

    await expect.poll(() => candidates(page).first().getByRole('heading').textContent(), WAIT).toContain('Sora-no-hane');
    const top = candidates(page).first();
    // Three of three answers match: (3 + 0.5) / (3 + 1) = 87.5 %, shown rounded (hand-worked from the scoring rule in shared/finder/score.ts).
    expect(await top.getByText(/^Fits your answers: \d+%$/).textContent()).toBe('Fits your answers: 88%');
    expect(await top.getByText('Invented for the demo').count()).toBe(1);
    // The lime-green twin conflicts on spring colour and says so with a mark, not colour alone.
    const twin = candidates(page).filter({ hasText: 'Mizu-kagari' });
    expect(await twin.getByText(/Does not match: /).count()).toBeGreaterThan(0);
    await shot(page, SUITE, '02-finder-ranked');
  });

  it('opens the top candidate side by side with its nearest look-alike', async () => {
    const top = candidates(page).first();
    await top.getByRole('button', { name: 'Compare with…' }).click();
    const closest = top.getByRole('listitem').filter({ hasText: 'closest look-alike' });
    await closest.waitFor();
    expect(await closest.textContent()).toContain('Mizu-kagari');
    await closest.getByRole('link').click();
    await page.waitForURL(/\/compare\?ids=\d+,\d+$/);
    compareUrl = page.url();
    await expect.poll(() => page.getByRole('heading', { name: /^Where they differ/ }).count(), WAIT).toBe(1);

    const spring = page.getByRole('row', { name: /Leaf colour in spring/ });
    await expect.poll(() => spring.count(), WAIT).toBe(1);
    // Marked in words ("Differs"), not by the highlight colour alone.
    expect(await spring.getByRole('rowheader').textContent()).toContain('Differs');
    expect(await spring.textContent()).toContain('Deep red');
    expect(await spring.textContent()).toContain('Lime');
    // Rows both records share are folded under "Alike in".
    expect(await page.getByText(/^Alike in \d+ traits?:.*leaf form/).count()).toBe(1);
    expect(await page.getByRole('row', { name: /^Leaf form/ }).isVisible()).toBe(false);
    expect(await page.locator('video').count()).toBe(2);
    await shot(page, SUITE, '03-side-by-side');
  });

  it('a visitor with too few records gets the picker, not an error', async () => {
    await page.goto(`${base}/compare?ids=1`);
    await expect.poll(() => page.getByRole('heading', { name: 'Pick one more record' }).count(), WAIT).toBe(1);
    await page.getByLabel('Find a cultivar record').fill('Akane');
    await page.getByRole('button', { name: /Akane-shizuku/ }).click();
    await page.waitForURL(/\/compare\?ids=1,\d+$/);
    await expect.poll(() => page.getByRole('heading', { name: /^Where they differ/ }).count(), WAIT).toBe(1);
  });
});

describe('pair notes', () => {
  it('an author writes how to tell the pair apart with the editor; readers see its paragraphs and bold words', async () => {
    await signIn(page, AUTHOR.email, AUTHOR.password);
    await page.goto(compareUrl);
    await page.getByRole('button', { name: 'Write a note' }).click();
    await page.getByRole('textbox', { name: 'How to tell them apart' }).click();
    await page.keyboard.type('In spring one is deep red, its twin lime (fictional demo note).');
    await page.keyboard.press('Enter');
    await page.keyboard.type('In winter the twin has ');
    await page.getByRole('button', { name: 'Bold (Ctrl+B)' }).click();
    await page.keyboard.type('green bark.');
    await page.getByRole('button', { name: 'Save the note' }).click();
    await expect.poll(() => page.getByText('In winter the twin has green bark.').count(), WAIT).toBe(1);
    // The formatting is kept: the bold words come back bold.
    expect(await page.locator('strong', { hasText: 'green bark.' }).count()).toBe(1);
    await signOut(page);
    await page.goto(compareUrl);
    const note = page.getByRole('region', { name: /and 'Mizu-kagari'|'Mizu-kagari' and/ });
    await expect.poll(() => note.locator('p').count(), WAIT).toBe(2);
    expect(await note.getByRole('button', { name: /note/ }).count()).toBe(0);
    await shot(page, SUITE, '03b-pair-note');
  });
});

describe('reader preferences', () => {
  it('a visitor sets a zone that stays in the browser', async () => {
    await page.goto(`${base}/finder?leafForm=palmatum`);
    await page.getByRole('button', { name: /^My garden/ }).click();
    await page.getByLabel('Hardiness zone').selectOption('6a');
    await expect.poll(() => page.getByText(/Zone 6a: average coldest winter night −10 to −5 °F \(−23\.3 to −20\.6 °C\)/).count(), WAIT).toBe(1);
    await page.reload();
    await page.getByRole('button', { name: /^My garden/ }).click();
    expect(await page.getByLabel('Hardiness zone').inputValue()).toBe('6a');
    // Ember Lantern's record says 5b–8a: zone 6a is inside (fictional record).
    await expect.poll(() => candidates(page).filter({ hasText: 'Ember Lantern' }).getByText('Suits zone 6a').count(), WAIT).toBe(1);
    await shot(page, SUITE, '04a-finder-my-garden');
  });

  it('a signed-in reader works the zone out from a temperature on the account page', async () => {
    await signIn(page, VIEWER.email, VIEWER.password);
    await page.goto(`${base}/account`);
    await page.getByText(/Not sure\? Work it out/).click();
    await page.getByLabel('Average coldest winter night').fill('-15');
    await page.getByRole('radio', { name: '°C' }).check();
    await page.getByRole('button', { name: 'Work out my zone' }).click();
    // −15 °C = 5 °F, the bottom edge of 7b (USDA map: 7b is 5…10 °F; an edge belongs to the warmer band).
    await expect.poll(() => page.getByText(/That is zone 7b/).count(), WAIT).toBe(1);
    await expect.poll(async () => (await api<{ user: { hardinessZone: string | null } }>(page, '/api/auth/me')).body.user.hardinessZone, WAIT).toBe('7b');
    await page.getByLabel('Average coldest winter night').fill('-80');
    await page.getByRole('button', { name: 'Work out my zone' }).click();
    await expect.poll(() => page.getByText(/not a plausible average annual extreme minimum/).count(), WAIT).toBe(1);
    await shot(page, SUITE, '04-account-garden');
  });
});

describe('learn mode records a score', () => {
  it('answers a clip with the keyboard and the progress total goes up by one', async () => {
    const before = (await api<{ total: number }>(page, '/api/learn/progress')).body.total;
    await page.goto(`${base}/`);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Learn' }).click();
    await page.waitForURL(/\/learn$/);
    await expect.poll(() => page.getByRole('heading', { name: 'Which tree is this?' }).count(), { timeout: 15_000 }).toBe(1);
    const options = page.getByRole('group', { name: 'Pick its name' }).getByRole('button');
    expect(await options.count()).toBe(4);
    expect(await page.locator('video').getAttribute('src')).toMatch(/#t=\d+(\.\d+)?,\d+(\.\d+)?$/);
    await expect.poll(() => page.getByText('Answered', { exact: true }).count(), WAIT).toBe(1);
    await shot(page, SUITE, '05-learn-question');

    await page.locator('body').press('1');
    await expect.poll(() => page.getByText(/^(✓ )?Right\.|^(✗ )?Not this time\./).count(), WAIT).toBe(1);
    const marks = page.getByRole('group', { name: 'Pick its name' }).getByText('Right answer');
    expect(await marks.count()).toBe(1);
    expect(await page.getByRole('link', { name: 'Watch this moment in its tour' }).getAttribute('href')).toMatch(/^\/tours\/\d+\?t=\d+(\.\d)?$/);
    await expect.poll(async () => (await api<{ total: number }>(page, '/api/learn/progress')).body.total, WAIT).toBe(before + 1);
    const answered = page.getByRole('region', { name: 'Your progress' }).getByRole('definition').first();
    await expect.poll(() => answered.textContent(), WAIT).toBe(String(before + 1));
    await shot(page, SUITE, '06-learn-answered');

    await page.locator('body').press('n');
    await expect.poll(() => page.getByRole('button', { name: 'Next clip' }).isDisabled(), WAIT).toBe(true);
  });
});

describe('on a phone', () => {
  let phone: Awaited<ReturnType<typeof openBrowser>>;
  beforeAll(async () => {
    phone = await openBrowser({ viewport: { width: 390, height: 844 } });
  });
  afterAll(async () => phone?.close());

  it('the menu lists the finder and learn mode, and the pages fit the screen', async () => {
    const p = phone.page;
    await p.goto(`${base}/`);
    await p.getByRole('button', { name: 'Menu' }).click();
    const nav = p.getByRole('navigation', { name: 'Main' }).filter({ visible: true });
    expect(await nav.getByRole('link', { name: 'Tree finder' }).isVisible()).toBe(true);
    expect(await nav.getByRole('link', { name: 'Learn' }).isVisible()).toBe(true);
    await nav.getByRole('link', { name: 'Tree finder' }).click();
    await p.waitForURL(/\/finder$/);
    await p.goto(`${base}/finder?leafForm=dissectum&habit=weeping&season=spring&colour=deep-red`);
    await expect.poll(() => candidates(p).count(), WAIT).toBeGreaterThan(0);
    const overflow = () => p.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(await overflow()).toBeLessThanOrEqual(0);
    await shot(p, SUITE, '07-phone-finder');

    const top = candidates(p).first();
    await top.getByRole('button', { name: 'Compare with…' }).click();
    await top.getByRole('listitem').filter({ hasText: 'closest look-alike' }).getByRole('link').click();
    await p.waitForURL(/\/compare\?ids=/);
    await expect.poll(() => p.getByRole('heading', { name: /^Where they differ/ }).count(), WAIT).toBe(1);
    expect(await overflow()).toBeLessThanOrEqual(0);
    await shot(p, SUITE, '08-phone-compare');

    await p.goto(`${base}/learn`);
    await expect.poll(() => p.getByRole('heading', { name: 'Which tree is this?' }).count(), { timeout: 15_000 }).toBe(1);
    expect(await p.getByText(/Scores are kept for signed-in learners/).count()).toBe(1);
    expect(await overflow()).toBeLessThanOrEqual(0);
    await shot(p, SUITE, '09-phone-learn');
  });
});
