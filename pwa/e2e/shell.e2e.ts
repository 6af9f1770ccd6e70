import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, type BrowserSession } from './browser';

describe('app shell', () => {
  const baseUrl = inject('baseUrl');
  let session: BrowserSession;
  const requested: string[] = [];

  beforeAll(async () => {
    session = await openBrowser();
    session.page.on('request', (request) => requested.push(request.url()));
    await session.page.goto(baseUrl);
  });
  afterAll(() => session.close());

  it('renders the Gumshoe shell', async () => {
    await expect(session.page.title()).resolves.toBe('Gumshoe');
    await session.page.locator('ion-app').waitFor();
    await screenshot(session.page, 'shell');
  });

  it('uses the Barlow font served from the app itself', async () => {
    const barlowFaces = await session.page.evaluate(async () => {
      await document.fonts.load('16px Barlow');
      await document.fonts.ready;
      return [...document.fonts].filter(
        (face) => face.family.replace(/["']/g, '') === 'Barlow' && face.status === 'loaded',
      ).length;
    });
    expect(barlowFaces).toBeGreaterThan(0);
    const bodyFont = await session.page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(bodyFont).toMatch(/^"?Barlow/);
    const fontRequests = requested.filter((url) => /\.woff2?(\?|$)/.test(url));
    expect(fontRequests.length).toBeGreaterThan(0);
    expect(fontRequests.every((url) => url.startsWith(`${baseUrl}/assets/`))).toBe(true);
    expect(requested.every((url) => url.startsWith(baseUrl) || url.startsWith('data:'))).toBe(true);
  });

  it('is controlled by the service worker', async () => {
    const controlled = await session.page.evaluate(async () => {
      await navigator.serviceWorker.ready;
      if (navigator.serviceWorker.controller) return true;
      await new Promise((resolve) =>
        navigator.serviceWorker.addEventListener('controllerchange', resolve, { once: true }),
      );
      return navigator.serviceWorker.controller !== null;
    });
    expect(controlled).toBe(true);
  });

  it('still shows the app after a reload while offline', async () => {
    await session.context.setOffline(true);
    try {
      await session.page.reload();
      await session.page.locator('ion-app').waitFor();
      await expect(session.page.title()).resolves.toBe('Gumshoe');
      await screenshot(session.page, 'shell-offline');
    } finally {
      await session.context.setOffline(false);
    }
  });

  it('serves the web app manifest', async () => {
    const response = await fetch(`${baseUrl}/manifest.webmanifest`);
    expect(response.ok).toBe(true);
    const manifest = (await response.json()) as { name: string; icons: unknown[] };
    expect(manifest.name).toBe('Gumshoe');
    expect(manifest.icons.length).toBeGreaterThan(0);
  });
});
