/**
 * As a new archer would: sign up, land on the Bench, sign out, sign back in.
 * Screenshots at phone (390×844) and desktop (1280×800) size.
 */
import { DESKTOP, PHONE, newPage, pageErrors, screenshot, stackForFile } from '../helpers/browser';
import { uniqueEmail } from '../helpers/api';

const stack = stackForFile();

for (const size of [PHONE, DESKTOP]) {
  it(`signs up, sees the Bench, signs out and back in (${size.width}×${size.height})`, async () => {
    const { context, page } = await newPage(stack, size);
    const email = uniqueEmail('e2e');
    const password = 'a long enough password';

    await page.goto('/');
    await page.getByLabel('E-mail').waitFor();
    await screenshot(page, 'sign-in');
    await page.getByText('Create an account', { exact: false }).first().click();
    await page.getByLabel('Name').waitFor();

    // Bad input first: the form says what is wrong and nothing is sent.
    await page.getByLabel('Name').fill('Tamsin Greave');
    await page.getByLabel('E-mail').fill('not-an-address');
    await page.getByLabel('Password').fill('short');
    await page.getByRole('button', { name: /create account/i }).click();
    await page.getByText('Enter a valid e-mail address').waitFor();
    await page.getByText('Password must be at least 10 characters').waitFor();
    await screenshot(page, 'sign-up-errors');

    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: /create account/i }).click();

    await page
      .getByText(/add your first bow/i)
      .first()
      .waitFor({ timeout: 15_000 });
    await screenshot(page, 'bench-empty');

    await page
      .getByRole('link', { name: /account/i })
      .first()
      .click();
    await page.getByText(email).waitFor();
    await screenshot(page, 'account');
    // Units are saved as soon as they are picked, and survive a reload.
    const saved = page.waitForResponse((r) => r.url().endsWith('/api/me') && r.request().method() === 'PATCH');
    await page.getByTestId('unit-distanceUnit').getByRole('radio', { name: 'Metres', exact: true }).click();
    expect((await saved).status()).toBe(200);
    // The device cache is written within 0.1 s of new data (components/offline): let it land before reloading.
    await page.waitForTimeout(600);
    await page.reload();
    await page.getByTestId('unit-distanceUnit').getByRole('radio', { name: 'Metres', exact: true, checked: true }).waitFor();
    await page.getByRole('button', { name: /sign out/i }).click();
    await page.getByLabel('E-mail').waitFor();

    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('the wrong password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is wrong.').waitFor();

    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page
      .getByText(/add your first bow/i)
      .first()
      .waitFor({ timeout: 15_000 });

    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }, 90_000);
}
