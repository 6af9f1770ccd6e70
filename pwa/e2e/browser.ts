import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const CHROMIUM_PATH = '/usr/bin/chromium';

const screenshotDir = join(dirname(fileURLToPath(import.meta.url)), '../../screenshots');

// Flags that keep Chromium from phoning home on this closed network.
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** A fresh Chromium profile, landscape tablet-sized (1280 × 800). */
export async function openBrowser(): Promise<BrowserSession> {
  const userDataDir = mkdtempSync(join(tmpdir(), 'gumshoe-chromium-'));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    viewport: { width: 1280, height: 800 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(userDataDir, { recursive: true, force: true });
    },
  };
}

/** Saves a screenshot of a main screen to the gitignored screenshots/ folder. */
export async function screenshot(page: Page, name: string) {
  mkdirSync(screenshotDir, { recursive: true });
  await page.evaluate(() => document.fonts.ready);
  await page.screenshot({ path: join(screenshotDir, `${name}.png`) });
}
