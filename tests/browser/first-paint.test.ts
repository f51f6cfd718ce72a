/**
 * The first paint of the web app: the static first screen in index.html
 * (server/tools/web-export.ts) shows the name and what Pinwright is for while
 * the script is still on its way, and goes once the app has rendered its
 * first screen (components/shell/first-screen.tsx), leaving the real form
 * usable. A cold load of the Bench asks for its bows alongside the sign-in
 * check, not after it (app/(app)/_layout.tsx).
 */
import { PRODUCT_LEAD } from '@/components/shell/product-lead';
import type { Page } from 'playwright-core';
import { DESKTOP, PHONE, newPage, pageErrors, screenshot, signUpInContext, stackForFile } from '../helpers/browser';

const stack = stackForFile();

describe.each([
  ['phone', PHONE],
  ['desktop', DESKTOP],
])('first paint (%s)', (label, size) => {
  it('shows the static first screen while the script is held back, then the sign-in form in its place', async () => {
    const { context, page } = await newPage(stack, size);
    try {
      // Hold the entry script back, as a slow signal would.
      let release: () => void = () => {};
      const released = new Promise<void>((resolve) => (release = resolve));
      await page.route(/\/_expo\/static\/js\/web\/entry-[0-9a-f]{32}\.js$/, async (route) => {
        await released;
        await route.continue();
      });
      // 'commit': DOMContentLoaded waits for the deferred script, which is held back.
      await page.goto('/sign-in', { waitUntil: 'commit' });
      const shell = page.locator('#pw-first-paint');
      await shell.waitFor({ state: 'visible' });
      expect(await shell.getByText('Pinwright', { exact: true }).isVisible()).toBe(true);
      expect(await shell.getByText(PRODUCT_LEAD).isVisible()).toBe(true);
      expect(await shell.getByRole('status').textContent()).toBe('Opening…');
      expect(await page.locator('form, input').count()).toBe(0);
      await screenshot(page, `first-paint-shell-${label}`);

      release();
      const email = page.getByLabel('E-mail').first();
      await email.waitFor({ state: 'visible', timeout: 30_000 });
      await shell.waitFor({ state: 'detached', timeout: 10_000 });
      // Nothing covers the form: it takes typing.
      await email.fill('someone@example.com');
      expect(await email.inputValue()).toBe('someone@example.com');
      await screenshot(page, `first-paint-after-${label}`);
      expect(pageErrors(page)).toEqual([]);
    } finally {
      await context.close();
    }
  }, 60_000);
});

describe('first data of the Bench', () => {
  it('asks for the bows while the sign-in check is still unanswered, and shows the Bench', async () => {
    const { context, page } = await newPage(stack, PHONE);
    try {
      await signUpInContext(context, stack.baseUrl);
      // Hold the sign-in check's answer until the bow list has been asked for (or 15 s pass).
      let bowsAsked: () => void = () => {};
      let giveUp: ReturnType<typeof setTimeout> | undefined;
      const asked = new Promise<boolean>((resolve) => {
        bowsAsked = () => resolve(true);
        giveUp = setTimeout(() => resolve(false), 15_000);
      });
      let askedBeforeAnswer: boolean | undefined;
      page.on('request', (request) => {
        if (new URL(request.url()).pathname === '/api/bows') bowsAsked();
      });
      await page.route('**/api/me', async (route) => {
        askedBeforeAnswer ??= await asked;
        await route.continue();
      });
      await page.goto('/');
      await page.getByText('No bows on your bench yet').waitFor({ timeout: 30_000 });
      clearTimeout(giveUp);
      expect(askedBeforeAnswer).toBe(true);
      expect(pageErrors(page)).toEqual([]);
    } finally {
      await context.close();
    }
  }, 60_000);

  it('signed out, moves from the Bench to sign-in without an error', async () => {
    const { context, page } = await newPage(stack, PHONE);
    try {
      await page.goto('/');
      await page.getByLabel('E-mail').first().waitFor({ timeout: 30_000 });
      expect(new URL(page.url()).pathname).toBe('/sign-in');
      expect(await page.getByText(/could not/i).count()).toBe(0);
      expect(pageErrors(page)).toEqual([]);
    } finally {
      await context.close();
    }
  }, 60_000);
});

/** Waits up to 10 s for the tab's title, then states what it is. */
async function expectTitle(page: Page, title: string) {
  await page.waitForFunction((wanted) => document.title === wanted, title, { timeout: 10_000 }).catch(() => undefined);
  expect(await page.title()).toBe(title);
}

describe('tab titles and unknown addresses', () => {
  it('names the page in the tab, back to the earlier name on going back, and shows our own page for an address that matches none', async () => {
    const { context, page } = await newPage(stack, PHONE);
    try {
      await page.goto('/sign-in');
      await page.getByLabel('E-mail').first().waitFor({ timeout: 30_000 });
      await expectTitle(page, 'Sign in · Pinwright');

      await page.goto('/no-such-page');
      await page.getByText('There is no page here').waitFor({ timeout: 30_000 });
      await expectTitle(page, 'Page not found · Pinwright');

      await signUpInContext(context, stack.baseUrl);
      await page.goto('/');
      await page.getByText('No bows on your bench yet').waitFor({ timeout: 30_000 });
      await expectTitle(page, 'Bench · Pinwright');
      // Within the app, not a new page load: the Bench's title must come back on going back.
      await page.getByRole('link', { name: 'Account' }).first().click();
      await page.getByRole('heading', { name: 'Account' }).first().waitFor({ timeout: 30_000 });
      await expectTitle(page, 'Account · Pinwright');
      await page.goBack();
      await page.getByText('No bows on your bench yet').waitFor({ timeout: 30_000 });
      await expectTitle(page, 'Bench · Pinwright');
      expect(pageErrors(page)).toEqual([]);
    } finally {
      await context.close();
    }
  }, 90_000);
});

describe.each([
  ['phone', PHONE],
  ['desktop', DESKTOP],
])('a screen whose code cannot be fetched (%s)', (label, size) => {
  it('says so plainly, and Try again opens that screen once the signal is back', async () => {
    // No service worker: it would keep the screens' code and answer for the network.
    const context = await stack.browser.newContext({ viewport: size, baseURL: stack.baseUrl, serviceWorkers: 'block' });
    const page = await context.newPage();
    const problems: string[] = [];
    page.on('pageerror', (err) => problems.push(String(err)));
    try {
      await signUpInContext(context, stack.baseUrl);
      let signal = false;
      await page.route(/\/_expo\/static\/js\/web\/workshop-screens-[0-9a-f]{32}\.js$/, (route) =>
        signal ? route.continue() : route.abort('internetdisconnected'),
      );
      await page.goto('/');
      await page.getByText('No bows on your bench yet').waitFor({ timeout: 30_000 });
      await page.getByRole('link', { name: 'Account' }).first().click();
      await page.getByText('This page could not be opened').waitFor({ timeout: 30_000 });
      expect(await page.getByText('Pinwright could not fetch this page. Check your signal, then try again.').isVisible()).toBe(true);
      await screenshot(page, `screen-code-unreachable-${label}`);
      signal = true;
      await page.getByRole('button', { name: 'Try again' }).click();
      await page.getByRole('heading', { name: 'Account' }).first().waitFor({ timeout: 30_000 });
      expect(new URL(page.url()).pathname).toBe('/account');
      expect(await page.getByText('This page could not be opened').count()).toBe(0);
      expect(problems).toEqual([]);
    } finally {
      await context.close();
    }
  }, 90_000);
});
