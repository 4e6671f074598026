import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { ROOT } from '../../server/config';

/** Screenshots kept as test artifacts. */
export const ARTIFACTS = path.join(ROOT, 'test-artifacts');

/** Debian's Chromium, headless, with a throwaway profile (never a downloaded browser). */
export async function openBrowser(opts: { viewport?: { width: number; height: number } } = {}): Promise<{ context: BrowserContext; page: Page; close(): Promise<void> }> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'grovewalk-chromium-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: opts.viewport ?? { width: 1280, height: 800 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Saves a full-page screenshot under test-artifacts/<suite>/<name>.png. */
export async function shot(page: Page, suite: string, name: string): Promise<string> {
  const dir = path.join(ARTIFACTS, suite);
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
