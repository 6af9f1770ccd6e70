/**
 * What a person does on the tablet, as steps for the browser scenarios, plus a direct line to
 * the plant server to check what arrived there.
 */
import { expect } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { screenshot } from './browser';

export const DEMO_PASSWORD = 'demo-password-1';

/** The screen on top: Ionic keeps earlier pages in the DOM, hidden. */
export function screen(page: Page): Locator {
  return page.locator('.ion-page:not(.ion-page-hidden)').last();
}

export async function waitForServiceWorker(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
    if (navigator.serviceWorker.controller) return;
    await new Promise((resolve) =>
      navigator.serviceWorker.addEventListener('controllerchange', resolve, { once: true }),
    );
  });
}

export async function signInWithPassword(page: Page, email: string): Promise<void> {
  const view = screen(page);
  await view.getByLabel('Email', { exact: true }).fill(email);
  await view.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await view.getByRole('button', { name: 'Sign in' }).click();
}

export async function choosePin(page: Page, pin: string): Promise<void> {
  const input = screen(page).getByTestId('pin-input');
  await input.fill(pin);
  await input.press('Enter');
  await screen(page).getByText('Type it again').waitFor();
  await screen(page).getByTestId('pin-input').fill(pin);
  await screen(page).getByTestId('pin-input').press('Enter');
}

/** The side menu's "Hand over the tablet": the person stays known and can come back by PIN. */
export async function handOver(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Hand over the tablet' }).click();
  await page.waitForURL('**/sign-in');
}

export async function switchByPin(page: Page, name: string, pin: string): Promise<void> {
  const view = screen(page);
  await view.getByRole('button', { name: new RegExp(name) }).click();
  await view.getByTestId('pin-input').fill(pin);
  await view.getByTestId('pin-input').press('Enter');
}

/** Waits for a page transition to end: a tap during Ionic's animation may go nowhere. */
export async function settled(page: Page): Promise<void> {
  await page.waitForFunction(
    () => document.querySelectorAll('div.ion-page:not(.ion-page-hidden)').length === 1,
  );
}

/** A screenshot of the screen once Ionic's page transition is over. */
export async function shot(page: Page, name: string): Promise<void> {
  await settled(page);
  await screenshot(page, name);
}

export async function waitForBoard(page: Page): Promise<void> {
  await page.waitForURL('**/presses');
  await screen(page).getByTestId('press-P1').waitFor();
  await settled(page);
}

export async function startLot(
  page: Page,
  {
    press,
    part,
    lotNumber,
    lotSize,
  }: { press: string; part: string; lotNumber: string; lotSize: number },
): Promise<void> {
  await screen(page).getByTestId(`press-${press}`).getByText('Start a lot').click();
  const view = screen(page);
  // Selects are found by name: a select's accessible name includes its chosen option.
  const partSelect = view.locator('select[name="specId"]');
  const option = view.locator('option', { hasText: part });
  await option.waitFor({ state: 'attached' });
  await partSelect.selectOption({ value: (await option.getAttribute('value')) ?? '' });
  await view.getByLabel('Lot number', { exact: true }).fill(lotNumber);
  await view.getByLabel('Lot size (parts)', { exact: true }).fill(String(lotSize));
  await view.getByTestId('plan-summary').waitFor();
}

export interface PartValues {
  thickness: number;
  side?: number;
  hardness: [number, number, number];
  load: number;
}

/** Types one part on the part screen and saves it; returns the verdict that was shown. */
export async function recordPart(page: Page, values: PartValues): Promise<string> {
  const view = screen(page);
  await view.getByTestId('field-load').waitFor();
  await view.getByTestId('field-thickness').fill(String(values.thickness));
  if (values.side !== undefined) await view.getByTestId('field-side').fill(String(values.side));
  for (const [i, reading] of values.hardness.entries()) {
    await view.getByTestId(`field-hardness${i + 1}`).fill(String(reading));
  }
  await view.getByTestId('field-load').fill(String(values.load));
  const verdict = (await view.getByTestId('verdict-overall').textContent()) ?? '';
  // The ion-button itself carries the label; its inner native button only has a slot.
  const save = view.locator('ion-button', { hasText: /^Save part \d+$/ });
  const sample = (await save.textContent())?.replace(/\D+/g, '');
  await save.click();
  // The form moves on to the next part, or back to the lot after the last one.
  await page.waitForFunction(
    (n) =>
      !location.pathname.endsWith('/part') ||
      [...document.querySelectorAll('[data-testid="saved-note"]')].some((note) =>
        note.textContent?.startsWith(`Part ${n} saved`),
      ),
    sample,
  );
  return verdict;
}

/** A JSON client for the plant server, signed in as a demo person. */
export async function serverAs(baseUrl: string, email: string) {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  expect(login.status).toBe(200);
  const { accessToken } = (await login.json()) as { accessToken: string };
  return async <T>(path: string): Promise<T> => {
    const response = await fetch(`${baseUrl}/api${path}`, {
      headers: { authorization: `Bearer ${accessToken}` },
    });
    expect(response.status, `GET ${path}`).toBe(200);
    const type = response.headers.get('content-type') ?? '';
    return (type.includes('json') ? response.json() : response.arrayBuffer()) as Promise<T>;
  };
}

/** Polls until the check passes: sync and mail happen in their own time. */
export async function eventually(check: () => Promise<void>, timeoutMs = 30_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      await check();
      return;
    } catch (error) {
      if (Date.now() > deadline) throw error;
      await new Promise((resolve) => setTimeout(resolve, 500));
    }
  }
}
