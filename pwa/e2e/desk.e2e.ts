import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
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
  await page.getByLabel('Email', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: 'Not now' }).click();
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

  it('lands on the compounds list', async () => {
    await page.getByRole('heading', { name: 'Compounds' }).waitFor();
    await page.getByRole('table', { name: 'Compounds' }).waitFor();
    await screenshot(page, 'desk-compounds');
  });

  it('creates a compound and imports Treloar’s data as CSV, all three modes', async () => {
    await page.getByRole('button', { name: 'New compound' }).click();
    await page.getByLabel('Code').fill(COMPOUND);
    await page.getByLabel('Name', { exact: true }).fill('Gum natural rubber after Treloar 1944');
    await page.getByLabel('Nominal hardness, Shore A').fill('40');
    await page.getByRole('button', { name: 'Create compound' }).click();
    await page.getByRole('heading', { name: new RegExp(COMPOUND) }).waitFor();

    await page.getByLabel('CSV file from the lab').setInputFiles(TRELOAR_CSV);
    await page.getByRole('table', { name: 'File preview' }).waitFor();
    const check = page.getByRole('region', { name: 'Import check' });
    await expect(check.textContent()).resolves.toContain('uniaxial 25, equibiaxial 17, planar 14');
    await screenshot(page, 'desk-csv-import');
    await page.getByRole('button', { name: 'Keep 56 points as test data' }).click();
    const sets = page.getByRole('table', { name: 'Test data' });
    await sets.getByText('treloar-1944 — planar').waitFor();
    await expect(sets.locator('tbody tr').count()).resolves.toBe(3);
    await screenshot(page, 'desk-compound');
  });

  it('fits Yeoh to all three modes and publishes it', async () => {
    await page.getByRole('link', { name: 'Fit models' }).click();
    await page.getByRole('region', { name: 'Fit setup' }).waitFor();
    await expect(page.getByLabel('Yeoh').isChecked()).resolves.toBe(true);
    await page.getByRole('button', { name: 'Fit 1 model' }).click();
    const results = page.getByRole('table', { name: 'Fit results' });
    await results.waitFor();
    const row = results.locator('tbody tr').first();
    await expect(row.textContent()).resolves.toMatch(/C10 = 0\.\d+ MPa, C20 = /);
    await page.getByRole('table', { name: 'Stability' }).waitFor();
    await screenshot(page, 'desk-fit');

    await page.getByRole('button', { name: 'Publish…' }).click();
    await page
      .getByLabel('Why these constants (kept with the version)')
      .fill('Yeoh on Treloar 1944, all three modes');
    await page.getByRole('button', { name: 'Publish Yeoh as the current constants' }).click();
    await page.getByText('published', { exact: true }).waitFor();

    await page.getByRole('link', { name: `Back to ${COMPOUND}` }).click();
    const versions = page.getByRole('table', { name: 'Constant versions' });
    await versions.getByText('current').waitFor();
    await expect(versions.textContent()).resolves.toContain(
      'Yeoh on Treloar 1944, all three modes',
    );
  });

  it('shows the fit report', async () => {
    await page.getByRole('link', { name: 'Fit report' }).first().click();
    await page.getByRole('article', { name: 'Fit report' }).waitFor();
    await screenshot(page, 'desk-fit-report');
  });

  it('releases a part spec on that compound, then a new revision of it', async () => {
    await page.getByRole('link', { name: 'Part specs' }).click();
    await page.getByRole('button', { name: 'New part spec' }).click();
    await page.getByLabel('Part number').fill(PART);
    await page.getByLabel('Name', { exact: true }).fill('Bonded mounting pad, Treloar gum');
    await page.getByRole('button', { name: 'Create part spec' }).click();
    await page.getByRole('heading', { name: new RegExp(PART) }).waitFor();

    await page
      .getByLabel('Compound')
      .selectOption({ label: `${COMPOUND} · Gum natural rubber after Treloar 1944 (v1)` });
    await page.getByTestId('derived-load').waitFor();
    await page.getByRole('button', { name: 'Release…' }).click();
    await page.getByRole('button', { name: 'Release it' }).click();
    await page.getByRole('table', { name: 'Revisions' }).getByText('released').waitFor();

    await page.getByRole('button', { name: 'Start revision 2' }).click();
    await page.getByLabel('Test deflection, mm').fill('1.5');
    await page
      .getByLabel('What changed in this revision')
      .fill('Test deflection 1.5 mm to match the customer rig');
    const load = page.getByTestId('derived-load');
    await expect.poll(() => load.textContent()).not.toBe('');
    expectedLoad = newtons((await load.textContent()) ?? '');
    expect(expectedLoad).toBeGreaterThan(0);
    await screenshot(page, 'desk-spec-editor');
    await page.getByRole('button', { name: 'Release…' }).click();
    await page.getByRole('button', { name: 'Release it' }).click();
    const revisions = page.getByRole('table', { name: 'Revisions' });
    await revisions.getByText('superseded').waitFor();
    await expect(revisions.locator('tbody tr').first().textContent()).resolves.toMatch(
      /rev 2\s*released/,
    );
    await screenshot(page, 'desk-spec-revisions');
  });

  it('shows the other desk screens', async () => {
    await page.getByRole('link', { name: 'Formula models' }).click();
    await page.getByText('Reads correctly.').waitFor();
    await screenshot(page, 'desk-formulas');

    await page.getByRole('link', { name: 'Set and aging' }).click();
    await page
      .getByLabel('Compound')
      .selectOption({ label: `${COMPOUND} · Gum natural rubber after Treloar 1944` });
    // Times made from Ea = 100 kJ/mol, t ∝ exp(Ea/RT): the fit must give 100 back (REFERENCES §7).
    for (const [i, [t, h]] of [
      [70, 9000],
      [85, 2073.6],
      [100, 537.6],
    ].entries()) {
      await page.getByLabel(`temperature ${i + 1}`).fill(String(t));
      await page.getByLabel(`hours ${i + 1}`).fill(String(h));
    }
    const ea = page.getByTestId('activation-energy');
    await ea.waitFor();
    expect(Number((await ea.textContent())?.replace(' kJ/mol', ''))).toBeCloseTo(100, 0);
    await screenshot(page, 'desk-aging');

    await page.getByRole('link', { name: 'Trends' }).click();
    await page.getByRole('heading', { name: 'Trends and capability' }).waitFor();
    const part = page.getByLabel('Part');
    const seeded = await part.locator('option').nth(1).getAttribute('value');
    if (seeded) await part.selectOption(seeded);
    await page.waitForTimeout(500);
    await screenshot(page, 'desk-trends');

    await page.getByRole('link', { name: 'Reports' }).click();
    await page.getByRole('region', { name: 'Fit reports' }).waitFor();
    await screenshot(page, 'desk-reports');
  });

  it('puts the new expected load on the inspector’s tablet', async () => {
    const tablet = await openBrowser();
    try {
      const inspector = tablet.page;
      await signIn(inspector, baseUrl, 'inspector@demo.test');
      await inspector.getByRole('link', { name: /^P/ }).first().click();
      const partSelect = inspector.getByLabel('Part');
      await expect
        .poll(async () => (await partSelect.locator('option').allTextContents()).join('|'), {
          timeout: 30_000,
        })
        .toContain(`${PART} — Bonded mounting pad, Treloar gum (rev 2)`);
      await partSelect.selectOption({
        label: `${PART} — Bonded mounting pad, Treloar gum (rev 2)`,
      });
      await inspector.getByLabel('Lot number').fill(`L-${RUN}`);
      await inspector.getByLabel('Lot size (parts)').fill('200');
      await inspector.getByRole('button', { name: 'Start checking' }).click();
      await inspector
        .getByText(/record/i)
        .first()
        .click();
      await inspector.getByLabel(/^Load/).fill(String(Math.round(expectedLoad)));
      const reason = inspector.getByText(/the expected [\d\s\u00a0\u202f.]+ N/);
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
