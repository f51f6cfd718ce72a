/**
 * The first paint of the web app: the static first screen in index.html
 * (server/tools/web-export.ts) shows the name and what Pinwright is for while
 * the script is still on its way, and goes once the app has rendered its
 * first screen (components/shell/first-screen.tsx), leaving the real form
 * usable.
 */
import { DESKTOP, PHONE, newPage, pageErrors, screenshot, stackForFile } from '../helpers/browser';

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
      expect(await shell.getByText('Sight tapes, sight-ins and level checks for compound bows.').isVisible()).toBe(true);
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
