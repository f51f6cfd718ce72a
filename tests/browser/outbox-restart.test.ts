/**
 * What the archer typed with no signal survives the browser itself being
 * closed and started again (a phone's browser killed in the background, or
 * the phone restarted): a sight-in saved offline waits in IndexedDB, and after
 * a restart of Chromium on the same profile, still offline, the app opens
 * from its service worker and shows it waiting; back online it is sent once.
 * A persistent Chromium profile (chromium.launchPersistentContext) plays the
 * phone's browser.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { bowBody, buildBody, knownMarks } from '../api/bow-fixtures';
import { PHONE, chromiumOptions, pageErrors, screenshot, signUpInContext, stackForFile } from '../helpers/browser';

const stack = stackForFile();
jest.setTimeout(240_000);

const CSRF = { 'X-Pinwright-Csrf': '1' };

async function openBrowser(profile: string, offline: boolean): Promise<{ context: BrowserContext; page: Page }> {
  const context = await chromium.launchPersistentContext(profile, { ...chromiumOptions, viewport: PHONE, baseURL: stack.baseUrl, offline });
  const page = context.pages()[0] ?? (await context.newPage());
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(String(error)));
  (page as Page & { problems?: string[] }).problems = problems;
  return { context, page };
}

async function sightInCount(context: BrowserContext, bowId: number): Promise<number> {
  const res = await context.request.get(`${stack.baseUrl}/api/bows/${bowId}`, { headers: CSRF });
  if (res.status() !== 200) throw new Error(`bow read ${res.status()}`);
  return ((await res.json()) as { bow: { sightIns: unknown[] } }).bow.sightIns.length;
}

it('keeps a sight-in saved offline through a restart of the browser, and sends it once when the signal is back', async () => {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'pinwright-profile-'));
  try {
    let { context, page } = await openBrowser(profile, false);
    await signUpInContext(context, stack.baseUrl, 'Ansel Quarry');
    const nickname = `Scree Ridge slider ${Date.now().toString(36)}`;
    const bow = await context.request.post(`${stack.baseUrl}/api/bows`, { headers: CSRF, data: bowBody({ nickname }) });
    const bowId = ((await bow.json()) as { bow: { id: number } }).bow.id;
    const build = await context.request.post(`${stack.baseUrl}/api/bows/${bowId}/builds`, { headers: CSRF, data: buildBody() });
    expect(build.status()).toBe(201);

    // One visit online: the app, its service worker and the bow's form are on the phone.
    await page.goto('/');
    await page.getByText(nickname).first().waitFor({ timeout: 20_000 });
    await page.goto(`/bows/${bowId}/sight-ins/new`);
    await page.getByTestId('mark-distance-0').waitFor({ timeout: 20_000 });
    await page.evaluate(async () => void (await navigator.serviceWorker.ready));
    await page.waitForTimeout(1500); // the persisted query cache saves at most every 0.5 s

    // No signal: three marks, saved; it waits on the phone.
    await context.setOffline(true);
    await page.reload();
    await page.getByTestId('mark-distance-0').waitFor({ timeout: 20_000 });
    await page.getByTestId('sight-in-unit').getByRole('radio', { name: 'Yards' }).click();
    const marks = knownMarks([20, 40, 60]);
    for (const [index, mark] of marks.entries()) {
      if ((await page.getByTestId(`mark-distance-${index}`).count()) === 0) await page.getByTestId('mark-add').click();
      await page.getByTestId(`mark-distance-${index}`).fill(String(mark.distance));
      await page.getByTestId(`mark-reading-${index}`).fill(String(mark.scaleMm));
    }
    await page.getByTestId('sight-in-save').click();
    await page
      .getByTestId('outbox-item-0')
      .getByText(/^On this phone, not sent yet/)
      .waitFor();
    expect(pageErrors(page)).toEqual([]);

    // The browser is closed altogether (its process ends), then started again on the same profile, still with no signal.
    await context.close();
    ({ context, page } = await openBrowser(profile, true));
    await page.goto('/');
    const waiting = page.getByTestId('outbox-item-0');
    await waiting.getByText(/^On this phone, not sent yet/).waitFor({ timeout: 30_000 });
    expect(await waiting.getByText(/New sight-in · .* · 3 marks/).count()).toBe(1);
    // The bench the phone saw opens from the device too.
    await page.getByText(nickname).first().waitFor({ timeout: 20_000 });
    await screenshot(page, 'outbox-after-browser-restart');

    // Nothing reached the server while offline (the test's own API calls bypass the browser's network); back online it is sent once and leaves the list.
    expect(await sightInCount(context, bowId)).toBe(0);
    await context.setOffline(false);
    await page.getByTestId('outbox-panel').waitFor({ state: 'detached', timeout: 30_000 });
    expect(await sightInCount(context, bowId)).toBe(1);
    await page.waitForTimeout(1500); // more resend ticks change nothing
    expect(await sightInCount(context, bowId)).toBe(1);
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  } finally {
    fs.rmSync(profile, { recursive: true, force: true });
  }
});
