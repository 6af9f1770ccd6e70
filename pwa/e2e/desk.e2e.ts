import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it, onTestFailed } from 'vitest';
import { openBrowser, screenshot, type BrowserSession } from './browser';

/*
 * The quality engineer's desk end to end: Treloar's 1944 data (REFERENCES §3) in as CSV, Yeoh
 * fitted to all three modes and published, a part spec on that compound released in a new
 * revision, and an inspector's tablet checking against that revision's expected load.
 */

const TRELOAR_CSV = join(dirname(fileURLToPath(import.meta.url)), 'fixtures/treloar-1944.csv');
const PASSWORD = 'demo-password-1';
// Unique per run, so the suite can run against a data folder that has seen it before.
const RUN = Date.now().toString(36).toUpperCase();
const COMPOUND = `TR44-${RUN}`;
const PART = `PAD-${RUN}`;

async function signIn(page: Page, baseUrl: string, email: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await onScreen(page).getByLabel('Email', { exact: true }).fill(email);
  await onScreen(page).getByLabel('Password', { exact: true }).fill(PASSWORD);
  await onScreen(page).getByRole('button', { name: 'Sign in' }).click();
  await onScreen(page).getByRole('button', { name: 'Not now' }).click();
}

/**
 * Ionic keeps pages it navigated away from in the DOM, hidden: look inside the page on show.
 * (getByRole already skips hidden pages; getByLabel and getByText do not.)
 */
function onScreen(page: Page) {
  // While a transition is half done two pages can show; the newest is last in the outlet.
  return page.locator('div.ion-page:not(.ion-page-hidden):visible').last();
}

/** The page whose title bar reads `title`: for screens that are not the desk's own. */
function titled(page: Page, title: RegExp) {
  return page
    .locator('div.ion-page:not(.ion-page-hidden)', {
      has: page.locator('ion-title', { hasText: title }),
    })
    .last();
}

/** A load as either side prints it ("10 234 N", "1.023e+4 N") → newtons. */
function newtons(text: string): number {
  return Number(text.replace(/[\s\u00a0\u202f]/g, '').replace(/N$/, ''));
}

describe('quality desk', () => {
  const baseUrl = inject('baseUrl');
  let desk: BrowserSession;
  let page: Page;
  let expectedLoad = 0;

  beforeAll(async () => {
    desk = await openBrowser();
    page = desk.page;
    await signIn(page, baseUrl, 'quality@demo.test');
  });
  afterAll(() => desk.close());
  // What the desk showed when a step failed, beside the screenshots of the screens.
  const keepFailure = (name: string) => onTestFailed(() => screenshot(page, `desk-failed-${name}`));

  it('lands on the compounds list', async () => {
    await onScreen(page).getByRole('heading', { name: 'Compounds' }).waitFor();
    await onScreen(page).getByRole('table', { name: 'Compounds' }).waitFor();
    await screenshot(page, 'desk-compounds');
  });

  it('creates a compound and imports Treloar’s data as CSV, all three modes', async () => {
    await onScreen(page).getByRole('button', { name: 'New compound' }).click();
    await onScreen(page).getByLabel('Code').fill(COMPOUND);
    await onScreen(page)
      .getByLabel('Name', { exact: true })
      .fill('Gum natural rubber after Treloar 1944');
    await onScreen(page).getByLabel('Nominal hardness, Shore A').fill('40');
    await onScreen(page).getByRole('button', { name: 'Create compound' }).click();
    await onScreen(page)
      .getByRole('heading', { name: new RegExp(COMPOUND) })
      .waitFor();

    await onScreen(page).getByLabel('CSV file from the lab').setInputFiles(TRELOAR_CSV);
    await onScreen(page).getByRole('table', { name: 'File preview' }).waitFor();
    const check = onScreen(page).getByRole('region', { name: 'Import check' });
    await expect(check.textContent()).resolves.toContain('uniaxial 25, equibiaxial 17, planar 14');
    await check.scrollIntoViewIfNeeded();
    await screenshot(page, 'desk-csv-import');
    await onScreen(page).getByRole('button', { name: 'Keep 56 points as test data' }).click();
    const sets = onScreen(page).getByRole('table', { name: 'Test data' });
    await sets.getByText('treloar-1944 — planar').waitFor();
    await expect(sets.locator('tbody tr').count()).resolves.toBe(3);
    await screenshot(page, 'desk-compound');
  });

  it('fits Yeoh to all three modes and publishes it', async () => {
    await onScreen(page).getByRole('link', { name: 'Fit models' }).click();
    await onScreen(page).getByRole('region', { name: 'Fit setup' }).waitFor();
    await expect(onScreen(page).getByLabel('Yeoh').isChecked()).resolves.toBe(true);
    await onScreen(page).getByRole('button', { name: 'Fit 1 model' }).click();
    const results = onScreen(page).getByRole('table', { name: 'Fit results' });
    await results.waitFor();
    const row = results.locator('tbody tr').first();
    await expect(row.textContent()).resolves.toMatch(/C10 = 0\.\d+ MPa, C20 = /);
    const stability = onScreen(page).getByRole('table', { name: 'Stability' });
    await stability.waitFor();
    await screenshot(page, 'desk-fit');
    await results.scrollIntoViewIfNeeded();
    await screenshot(page, 'desk-fit-table');
    await stability.scrollIntoViewIfNeeded();
    await screenshot(page, 'desk-fit-stability');

    await onScreen(page).getByRole('button', { name: 'Publish…' }).click();
    await page
      .getByLabel('Why these constants (kept with the version)')
      .fill('Yeoh on Treloar 1944, all three modes');
    await onScreen(page)
      .getByRole('button', { name: 'Publish Yeoh as the current constants' })
      .click();
    await onScreen(page).getByText('published', { exact: true }).waitFor();

    await onScreen(page)
      .getByRole('link', { name: `Back to ${COMPOUND}` })
      .click();
    const versions = onScreen(page).getByRole('table', { name: 'Constant versions' });
    await versions.getByText('current').waitFor();
    await expect(versions.textContent()).resolves.toContain('Yeoh');
  });

  it('shows the fit report', async () => {
    await onScreen(page).getByRole('link', { name: 'Fit report' }).first().click();
    await onScreen(page).getByRole('article', { name: 'Fit report' }).waitFor();
    await screenshot(page, 'desk-fit-report');
  });

  it('releases a part spec on that compound, then a new revision of it', async () => {
    keepFailure('spec');
    await onScreen(page).getByRole('link', { name: 'Part specs' }).click();
    await onScreen(page).getByRole('button', { name: 'New part spec' }).click();
    await onScreen(page).getByLabel('Part number').fill(PART);
    await onScreen(page)
      .getByLabel('Name', { exact: true })
      .fill('Bonded mounting pad, Treloar gum');
    await onScreen(page).getByRole('button', { name: 'Create part spec' }).click();
    await onScreen(page)
      .getByRole('heading', { name: new RegExp(PART) })
      .waitFor();

    await onScreen(page)
      .getByLabel('Compound', { exact: true })
      .selectOption({ label: `${COMPOUND} · Gum natural rubber after Treloar 1944 (v1)` });
    await onScreen(page).getByTestId('derived-load').waitFor();
    await onScreen(page).getByRole('button', { name: 'Release…' }).click();
    await onScreen(page).getByRole('button', { name: 'Release it' }).click();
    await onScreen(page).getByRole('table', { name: 'Revisions' }).getByText('released').waitFor();

    await onScreen(page).getByRole('button', { name: 'Start revision 2' }).click();
    await onScreen(page).getByLabel('Test deflection, mm').fill('1.5');
    const load = onScreen(page).getByTestId('derived-load');
    await expect.poll(() => load.textContent()).not.toBe('');
    expectedLoad = newtons((await load.textContent()) ?? '');
    expect(expectedLoad).toBeGreaterThan(0);
    await onScreen(page)
      .getByRole('group', { name: 'Shape', exact: true })
      .scrollIntoViewIfNeeded();
    await screenshot(page, 'desk-spec-editor');
    await onScreen(page)
      .getByRole('table', { name: 'Acceptance windows' })
      .scrollIntoViewIfNeeded();
    await screenshot(page, 'desk-spec-windows');
    await onScreen(page).getByRole('button', { name: 'Release…' }).click();
    await onScreen(page).getByRole('button', { name: 'Release it' }).click();
    const revisions = onScreen(page).getByRole('table', { name: 'Revisions' });
    await revisions.getByText('superseded').waitFor();
    await expect(revisions.locator('tbody tr').first().textContent()).resolves.toMatch(
      /rev 2\s*released/,
    );
    await revisions.scrollIntoViewIfNeeded();
    await screenshot(page, 'desk-spec-revisions');
  });

  it('shows the other desk screens', async () => {
    keepFailure('screens');
    await onScreen(page).getByRole('link', { name: 'Formula models' }).click();
    await onScreen(page).getByText('Reads correctly.').waitFor();
    await screenshot(page, 'desk-formulas');
    await onScreen(page).getByLabel('W(I1, I2) =').fill('C10 (I1 - 3) + * C01 (I2 - 3)');
    await onScreen(page).getByTestId('syntax-marker').waitFor();
    await screenshot(page, 'desk-formula-error');

    await onScreen(page).getByRole('link', { name: 'Set and aging' }).click();
    await onScreen(page)
      .getByLabel('Compound', { exact: true })
      .selectOption({ label: `${COMPOUND} · Gum natural rubber after Treloar 1944` });
    // Times made from Ea = 100 kJ/mol, t ∝ exp(Ea/RT): the fit must give 100 back (REFERENCES §7).
    for (const [i, [t, h]] of [
      [70, 9000],
      [85, 2073.6],
      [100, 537.6],
    ].entries()) {
      await onScreen(page)
        .getByLabel(`temperature ${i + 1}`)
        .fill(String(t));
      await onScreen(page)
        .getByLabel(`hours ${i + 1}`)
        .fill(String(h));
    }
    const ea = onScreen(page).getByTestId('activation-energy');
    await ea.waitFor();
    expect(Number((await ea.textContent())?.replace(' kJ/mol', ''))).toBeCloseTo(100, 0);
    await onScreen(page).getByRole('region', { name: 'Arrhenius fit' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'desk-aging');
    await onScreen(page).getByRole('region', { name: 'Expected set' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'desk-aging-predictions');

    await onScreen(page).getByRole('link', { name: 'Trends' }).click();
    await onScreen(page).getByRole('heading', { name: 'Trends and capability' }).waitFor();
    const part = onScreen(page).getByLabel('Part');
    const seeded = await part.locator('option').nth(1).getAttribute('value');
    if (seeded) await part.selectOption(seeded);
    // The seeded week gives the chart its lots, all in one request to the trends route.
    await onScreen(page)
      .getByText(/^\d+ lots, \d+ parts each/)
      .waitFor();
    await screenshot(page, 'desk-trends');
    await onScreen(page).getByRole('region', { name: 'Capability' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'desk-trends-capability');

    await onScreen(page).getByRole('link', { name: 'Reports' }).click();
    await onScreen(page).getByRole('table', { name: 'Lots' }).waitFor();
    await screenshot(page, 'desk-reports');
  });

  it('puts the new expected load on the inspector’s tablet', async () => {
    const tablet = await openBrowser();
    try {
      const inspector = tablet.page;
      await signIn(inspector, baseUrl, 'inspector@demo.test');
      // Ionic renders a button with a route as a link.
      await onScreen(inspector).getByRole('link', { name: 'Start a lot' }).first().click();
      const start = titled(inspector, /^Start a lot on/);
      // The part is the form's first choice; its label's text takes in the options as well.
      const partSelect = start.locator('select').first();
      const option = `${PART} — Bonded mounting pad, Treloar gum (rev 2)`;
      // The tablet pulls released revisions on its own schedule; give it a few sync rounds.
      await expect
        .poll(async () => (await partSelect.locator('option').allTextContents()).join('|'), {
          timeout: 60_000,
        })
        .toContain(option);
      await partSelect.selectOption({ label: option });
      await start.getByLabel('Lot number').fill(`L-${RUN}`);
      await start.getByLabel('Lot size (parts)').fill('200');
      await start.getByRole('button', { name: 'Start checking' }).click();
      await titled(inspector, new RegExp(`^Lot L-${RUN}`))
        .getByRole('link', { name: 'Check part 1' })
        .click();
      const part = titled(inspector, /part 1/i);
      await part.getByLabel(/^Load at the test deflection/).fill(String(Math.round(expectedLoad)));
      const reason = part.getByTestId('reason-load');
      await reason.waitFor();
      const shown =
        /the expected ([\d\s\u00a0\u202f.]+ N)/.exec((await reason.textContent()) ?? '')?.[1] ?? '';
      // The tablet rounds to whole newtons, the desk to four significant digits.
      expect(Math.abs(newtons(shown) - expectedLoad) / expectedLoad).toBeLessThan(0.001);
      await screenshot(inspector, 'desk-inspector-expected-load');
    } finally {
      await tablet.close();
    }
  });
});
