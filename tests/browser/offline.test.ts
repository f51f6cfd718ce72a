/**
 * Pinwright at the range with no signal (components/offline): after one
 * online visit, with Chromium set offline, a reload opens the bench with the
 * archer's bows, a sight-in with its marks and fit, and its tape preview; a
 * new sight-in entered offline shows the live fit and waits on the phone;
 * back online it reaches the server exactly once (checked through the API);
 * a waiting write the server refuses (its bow deleted meanwhile) is shown
 * with the reason and kept; signing out, online or offline, leaves nothing
 * of the account readable on the device (IndexedDB, localStorage, the
 * service worker's caches, inspected from the page). Screenshots at 390×844
 * and 1280×800 of the offline notice, a waiting item and a refused one.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { bowBody, buildBody, knownMarks } from '../api/bow-fixtures';
import { DESKTOP, PHONE, fullScreenshot, newPage, pageErrors, screenshot, signUpInContext, stackForFile } from '../helpers/browser';

const stack = stackForFile();
jest.setTimeout(240_000);

const CSRF = { 'X-Pinwright-Csrf': '1' };

/** The page at its size and, when the screen scrolls, its whole length. */
const shot = (page: Page, name: string) => fullScreenshot(page, name, { maxHeightPx: 6000, settleMs: 250, restoreMs: 150 });

/** Both sizes of the same view: phone first, then desktop, back to phone. */
async function bothSizes(page: Page, name: string, ready: () => Promise<unknown>) {
  for (const size of [PHONE, DESKTOP]) {
    await page.setViewportSize(size);
    await page.waitForTimeout(250);
    await ready();
    await shot(page, name);
  }
  await page.setViewportSize(PHONE);
  await page.waitForTimeout(150);
}

async function api<T = Record<string, unknown>>(
  context: BrowserContext,
  method: 'GET' | 'POST' | 'DELETE',
  path: string,
  data?: unknown,
): Promise<{ status: number; body: T }> {
  const res = await context.request.fetch(`${stack.baseUrl}${path}`, { method, headers: CSRF, data });
  const text = await res.text();
  return { status: res.status(), body: (text ? JSON.parse(text) : null) as T };
}

/** A bow with a build (and, if asked, a sight-in with marks at 20, 40 and 60 yd), made through the API as the page's account. */
async function bowWithBuild(context: BrowserContext, nickname: string, withSightIn: boolean) {
  const bow = await api<{ bow: { id: number } }>(context, 'POST', '/api/bows', bowBody({ nickname }));
  if (bow.status !== 201) throw new Error(`bow ${bow.status}`);
  const build = await api<{ build: { id: number } }>(
    context,
    'POST',
    `/api/bows/${bow.body.bow.id}/builds`,
    buildBody({ name: `${nickname} arrows` }),
  );
  if (build.status !== 201) throw new Error(`build ${build.status}`);
  let sightInId = 0;
  if (withSightIn) {
    const sightIn = await api<{ sightIn: { id: number } }>(context, 'POST', `/api/bows/${bow.body.bow.id}/sight-ins`, {
      buildId: build.body.build.id,
      date: '2026-11-02',
      placeLabel: 'Sorrel Flats range',
      marks: knownMarks([20, 40, 60]),
    });
    if (sightIn.status !== 201) throw new Error(`sight-in ${sightIn.status}`);
    sightInId = sightIn.body.sightIn.id;
  }
  return { bowId: bow.body.bow.id, buildId: build.body.build.id, sightInId };
}

/** Waits until the page's service worker has installed its precache and is active (it serves the app offline). */
async function workerReady(page: Page) {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
}

/** Everything the device keeps where a page can read it: IndexedDB (every database, every store), localStorage, the Cache Storage request URLs. */
async function deviceContents(page: Page): Promise<string> {
  return page.evaluate(async () => {
    const out: string[] = [];
    for (const info of await indexedDB.databases()) {
      if (!info.name) continue;
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const open = indexedDB.open(info.name as string);
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      for (const store of Array.from(db.objectStoreNames)) {
        const values = await new Promise<unknown[]>((resolve, reject) => {
          const request = db.transaction(store, 'readonly').objectStore(store).getAll();
          request.onsuccess = () => resolve(request.result);
          request.onerror = () => reject(request.error);
        });
        out.push(`${info.name}/${store}: ${JSON.stringify(values)}`);
      }
      db.close();
    }
    for (let index = 0; index < localStorage.length; index += 1) {
      const key = localStorage.key(index) as string;
      out.push(`localStorage ${key}: ${localStorage.getItem(key)}`);
    }
    for (const name of await caches.keys()) {
      const cache = await caches.open(name);
      out.push(`cache ${name}: ${(await cache.keys()).map((request) => request.url).join(' ')}`);
    }
    return out.join('\n');
  });
}

/** Types marks into the sight-in form's rows (adding rows as needed). */
async function typeMarks(page: Page, marks: { distance: number; scaleMm: number }[]) {
  for (const [index, mark] of marks.entries()) {
    if ((await page.getByTestId(`mark-distance-${index}`).count()) === 0) await page.getByTestId('mark-add').click();
    await page.getByTestId(`mark-distance-${index}`).fill(String(mark.distance));
    await page.getByTestId(`mark-reading-${index}`).fill(String(mark.scaleMm));
  }
}

/** The persisted cache is saved at most every 0.5 s: give it time before the signal goes. */
const letItSave = (page: Page) => page.waitForTimeout(1500);

it('opens what the phone has seen with no signal, keeps a new sight-in on the phone and sends it once when back online', async () => {
  const { context, page } = await newPage(stack, PHONE);
  await signUpInContext(context, stack.baseUrl, 'Wren Aldous');
  const nickname = `Cold Creek slider ${Date.now().toString(36)}`;
  const { bowId, sightInId } = await bowWithBuild(context, nickname, true);

  // One online visit: the bench, the bow, the sight-in (its fit) and its tape.
  // Each page.goto loads the app afresh: give each page its moment to save what it fetched.
  await page.goto('/');
  await page.getByText(nickname).first().waitFor({ timeout: 20_000 });
  await workerReady(page);
  await letItSave(page);
  await page.goto(`/bows/${bowId}`);
  await page.getByTestId('start-sight-in').waitFor();
  await letItSave(page);
  await page.goto(`/sight-ins/${sightInId}`);
  await page.getByTestId('predicted-marks').waitFor();
  await letItSave(page);
  await page.goto(`/sight-ins/${sightInId}/tape`);
  await page.getByTestId('tape-preview').waitFor();
  await letItSave(page);

  // No signal: a reload opens the bench from the phone, with the notice.
  await context.setOffline(true);
  await page.goto('/');
  await page.getByText(nickname).first().waitFor({ timeout: 20_000 });
  const notice = page.getByTestId('offline-notice');
  await notice.getByText(/^Offline — showing what this phone last saw, at \d{1,2}:\d\d( [AP]M)?\.$/).waitFor();
  await bothSizes(page, 'offline-bench', () => page.getByText(nickname).first().waitFor());

  // The sight-in with its marks and fit, and its tape preview (drawn by math/ in the browser).
  await page.goto(`/sight-ins/${sightInId}`);
  await page.getByTestId('predicted-marks').waitFor({ timeout: 20_000 });
  expect(await page.getByTestId('mark-distance-2').inputValue()).toBe('60');
  await page.getByTestId('fit-summary').waitFor();
  await page.goto(`/sight-ins/${sightInId}/tape`);
  await page.getByTestId('tape-preview').waitFor({ timeout: 20_000 });
  await shot(page, 'offline-tape');

  // A new sight-in with three marks, offline: the live fit, then kept on the phone.
  await page.goto(`/bows/${bowId}/sight-ins/new`);
  await page.getByTestId('mark-distance-0').waitFor({ timeout: 20_000 });
  await page.getByTestId('sight-in-unit').getByRole('radio', { name: 'Yards' }).click();
  const offlineMarks = knownMarks([20, 30, 50]);
  await typeMarks(page, offlineMarks);
  await page.getByTestId('predicted-marks').waitFor();
  await page
    .getByTestId('fit-strip-figures')
    .getByText(/\d+ fps · RMS \d+\.\d\d mm/)
    .waitFor();
  await page.getByTestId('sight-in-save').click();
  await page.getByTestId('sight-in-kept').getByText('On this phone, not sent yet').waitFor();
  await page
    .getByTestId('outbox-item-0')
    .getByText(/^On this phone, not sent yet/)
    .waitFor();
  await page.getByTestId('predicted-marks').waitFor();
  await bothSizes(page, 'offline-waiting', () => page.getByTestId('outbox-item-0').waitFor());

  // It survives a reload (kept in IndexedDB), still waiting; nothing reached the server.
  await page.reload();
  await page
    .getByTestId('outbox-item-0')
    .getByText(/^On this phone, not sent yet/)
    .waitFor({ timeout: 20_000 });
  expect(
    await page
      .getByTestId('outbox-item-0')
      .getByText(/New sight-in · .* · 3 marks/)
      .count(),
  ).toBe(1);
  const before = await api<{ bow: { sightIns: unknown[] } }>(context, 'GET', `/api/bows/${bowId}`);
  expect(before.body.bow.sightIns).toHaveLength(1);

  // Back online: it is sent (in order, with its idempotency key) and leaves the list.
  await context.setOffline(false);
  await page.getByTestId('outbox-panel').waitFor({ state: 'detached', timeout: 30_000 });
  const after = await api<{ bow: { sightIns: { id: number; date: string }[] } }>(context, 'GET', `/api/bows/${bowId}`);
  expect(after.body.bow.sightIns).toHaveLength(2);
  const sent = after.body.bow.sightIns.find((sightIn) => sightIn.id !== sightInId)!;
  const stored = await api<{ sightIn: { marks: { distance: number; scaleMm: number }[] } }>(context, 'GET', `/api/sight-ins/${sent.id}`);
  expect(stored.body.sightIn.marks.map((mark) => [mark.distance, mark.scaleMm])).toEqual(
    offlineMarks.map((mark) => [mark.distance, mark.scaleMm]),
  );
  expect(await page.getByTestId('offline-notice').count()).toBe(0);
  // A few more resend ticks change nothing: still exactly two sight-ins.
  await page.waitForTimeout(1500);
  expect((await api<{ bow: { sightIns: unknown[] } }>(context, 'GET', `/api/bows/${bowId}`)).body.bow.sightIns).toHaveLength(2);
  expect(pageErrors(page)).toEqual([]);
  await context.close();
});

it('shows a waiting sight-in the server refuses (its bow deleted meanwhile) with the reason, and keeps it to copy or discard', async () => {
  const { context, page } = await newPage(stack, PHONE);
  await signUpInContext(context, stack.baseUrl, 'Tamsin Orrell');
  const nickname = `Birch Hollow slider ${Date.now().toString(36)}`;
  const { bowId } = await bowWithBuild(context, nickname, false);
  await page.goto(`/bows/${bowId}/sight-ins/new`);
  await page.getByTestId('mark-distance-0').waitFor({ timeout: 20_000 });
  await workerReady(page);
  await letItSave(page);

  await context.setOffline(true);
  await page.reload();
  await page.getByTestId('mark-distance-0').waitFor({ timeout: 20_000 });
  await page.getByTestId('sight-in-unit').getByRole('radio', { name: 'Yards' }).click();
  await typeMarks(page, knownMarks([20, 60]));
  await page.getByTestId('sight-in-save').click();
  await page.getByTestId('outbox-item-0').waitFor();

  // Meanwhile the bow is deleted (from another device: here, the API).
  expect((await api(context, 'DELETE', `/api/bows/${bowId}`)).status).toBe(204);

  await context.setOffline(false);
  const item = page.getByTestId('outbox-item-0');
  await item.getByText('Refused by the server', { exact: false }).waitFor({ timeout: 30_000 });
  await page
    .getByTestId('outbox-reason-0')
    .getByText(/^Why: .*not found/i)
    .waitFor();
  // Kept: what was typed can be shown (and copied), and stays after a reload.
  await page.getByTestId('outbox-show-0').click();
  expect(await page.getByTestId('outbox-body-0').textContent()).toContain('"scaleMm"');
  await page.reload();
  await page.getByTestId('outbox-item-0').getByText('Refused by the server', { exact: false }).waitFor({ timeout: 20_000 });
  await bothSizes(page, 'offline-refused', () => page.getByTestId('outbox-reason-0').waitFor());
  // The server holds no sight-in from it.
  expect((await api(context, 'GET', `/api/bows/${bowId}`)).status).toBe(404);

  // Discarding asks first, then the item is gone for good.
  await page.getByTestId('outbox-discard-0').click();
  await page.getByTestId('outbox-discard-confirm-0').click();
  await page.getByTestId('outbox-panel').waitFor({ state: 'detached' });
  expect(await deviceContents(page)).not.toContain('"scaleMm"');
  expect(pageErrors(page)).toEqual([]);
  await context.close();
});

for (const where of ['online', 'offline'] as const) {
  it(`signing out ${where} leaves nothing of the account readable on the device`, async () => {
    const { context, page } = await newPage(stack, PHONE);
    const { email } = await signUpInContext(context, stack.baseUrl, 'Ilse Marrow');
    const nickname = `Juniper Bench slider ${where} ${Date.now().toString(36)}`;
    const { bowId, sightInId } = await bowWithBuild(context, nickname, true);
    await page.goto('/');
    await page.getByText(nickname).first().waitFor({ timeout: 20_000 });
    await workerReady(page);
    await letItSave(page);
    await page.goto(`/sight-ins/${sightInId}`);
    await page.getByTestId('predicted-marks').waitFor();
    await letItSave(page);
    // The device holds the records now (that is what opens offline) …
    expect(await deviceContents(page)).toContain(nickname);

    if (where === 'offline') {
      // … and a sight-in kept offline, which signing out discards with the rest.
      await context.setOffline(true);
      await page.goto(`/bows/${bowId}/sight-ins/new`);
      await page.getByTestId('mark-distance-0').waitFor({ timeout: 20_000 });
      await typeMarks(page, knownMarks([25, 55]));
      await page.getByTestId('sight-in-save').click();
      await page.getByTestId('outbox-item-0').waitFor();
    }
    await page.goto('/account');
    await page.getByRole('button', { name: 'Sign out' }).click();
    if (where === 'offline') {
      // Signing out first says what it would delete (components/auth/sign-out-button.tsx).
      const guard = page.getByTestId('sign-out-guard');
      await guard.getByText('1 item on this phone is not sent yet; signing out deletes it.').waitFor();
      await page.getByRole('button', { name: 'Sign out anyway' }).click();
    }
    await page.getByLabel('E-mail').waitFor({ timeout: 20_000 });
    await page.waitForTimeout(800);
    const left = await deviceContents(page);
    expect(left).not.toContain(nickname);
    expect(left).not.toContain(email);
    expect(left).not.toContain('Sorrel Flats');
    expect(left).not.toMatch(/\/api\//);

    // A reload (still offline, or online) does not bring the archer back.
    await page.reload();
    await page.getByLabel('E-mail').waitFor({ timeout: 20_000 });
    if (where === 'offline') {
      await context.setOffline(false);
      await page.goto('/');
      await page.getByLabel('E-mail').waitFor({ timeout: 20_000 });
      // The server's sign-in session was ended once the signal came back: nobody is signed in.
      expect((await api(context, 'GET', '/api/me')).status).toBe(401);
    }
    await screenshot(page, `offline-signed-out-${where}`);
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
}
