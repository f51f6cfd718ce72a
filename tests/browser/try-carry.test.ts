/**
 * The try page on a phone and a desktop: each input has its own label, the
 * "confirm at" warnings name only distances on the tape, and what the visitor
 * typed is carried into the account they then create, as its first bow and
 * sight-in (after the few bow and arrow details the try page never asked).
 * Screenshots at phone (390×844) and desktop (1280×800) size.
 */
import { uniqueEmail } from '../helpers/api';
import { DESKTOP, PHONE, fullScreenshot, newPage, pageErrors, screenshot, stackForFile } from '../helpers/browser';

const fullShot = (page: Parameters<typeof screenshot>[0], name: string) =>
  fullScreenshot(page, name, { maxHeightPx: 9000, settleMs: 300, restoreMs: 150 });

const stack = stackForFile();

for (const size of [PHONE, DESKTOP]) {
  it(`carries the try page's bow and marks into a new account (${size.width}×${size.height})`, async () => {
    const { context, page } = await newPage(stack, size);
    await page.goto('/sign-in');
    // The sign-in page says what Pinwright does, and the try page is one tap away.
    await page.getByText(/turns a few marks sighted in at the range into a sight tape/).waitFor();
    await screenshot(page, 'sign-in');
    await page.getByTestId('sign-in-try').click();
    await page.waitForURL(/\/try$/);

    // Every input has a label of its own.
    await page.getByLabel('Sight radius').fill('820');
    await page.getByLabel('Peep height').fill('110');
    await page.getByLabel('Reading at 20 yd').fill('14.9');
    await page.getByLabel('Reading at 60 yd').fill('32.6');
    expect(await page.getByLabel('Its reading').count()).toBe(0);
    await page.getByTestId('tape-preview').waitFor();

    // The tape runs 20–80 yd: no warning names 10, 90 or 100 yd, and the predicted marks stay on the tape.
    const result = page.getByTestId('try-result');
    const words = await result.innerText();
    expect(words).not.toMatch(/\b(10|90|100) yd\b/);
    const rows = await page
      .locator('[data-testid^="predicted-"]')
      .evaluateAll((els) => els.map((el) => el.getAttribute('data-testid')).filter((id) => /^predicted-\d+$/.test(id ?? '')));
    expect(rows.length).toBeGreaterThan(0);
    for (const id of rows) {
      const distance = Number(id!.replace('predicted-', ''));
      expect(distance).toBeGreaterThanOrEqual(20);
      expect(distance).toBeLessThanOrEqual(80);
    }
    // The predicted-marks table fits its card: its Status column is not cut off.
    const fits = await page.getByTestId('predicted-marks').evaluate((table) => table.scrollWidth <= table.clientWidth + 1);
    expect(fits).toBe(true);
    await fullShot(page, 'try-filled');

    // Create an account from the try page: the bench offers to keep what was typed.
    await page.getByTestId('try-keep').click();
    await page.waitForURL(/\/sign-up$/);
    // The sign-in screen stays mounted behind: only the visible sign-up fields.
    const field = (label: string) => page.getByLabel(label, { exact: true }).filter({ visible: true });
    await field('Name').fill(`Ysolde Brightwater ${size.width}`);
    await field('E-mail').fill(uniqueEmail('carry'));
    await field('Password').fill('correct horse battery');
    await page
      .getByRole('button', { name: /create account/i })
      .filter({ visible: true })
      .click();
    await page.getByTestId('bench-keep-try').waitFor({ timeout: 15_000 });
    await page
      .getByTestId('bench-keep-try')
      .getByText(/20 yd at 14.9 mm, 60 yd at 32.6 mm/)
      .waitFor();
    await screenshot(page, 'bench-keep-try');
    await page.getByTestId('bench-keep-try-open').click();
    await page.getByTestId('keep-try-screen').waitFor();

    // What the try page had is filled in; a missing field is named and nothing is saved.
    expect(await page.getByTestId('keep-sight-radius').inputValue()).toBe('820');
    expect(await page.getByTestId('keep-peep-height').inputValue()).toBe('110');
    await page.getByTestId('keep-save').click();
    await page.getByTestId('keep-problem').waitFor();
    await page.getByText('Enter the draw weight', { exact: false }).first().waitFor();
    const bows = await context.request.get(`${stack.baseUrl}/api/bows`);
    expect((await bows.json()).bows).toEqual([]);

    await page.getByTestId('keep-draw-weight').fill('62');
    await page.getByTestId('keep-draw-length').fill('724');
    await page.getByTestId('keep-gpi').fill('9.3');
    await page.getByTestId('keep-cut-length').fill('720');
    await page.getByTestId('keep-diameter').fill('6.5');
    await page.getByTestId('keep-point').fill('125');
    await fullShot(page, 'keep-try');
    await page.getByTestId('keep-save').click();
    await page.waitForURL(/\/sight-ins\/\d+$/, { timeout: 20_000 });
    await page.getByTestId('mark-authors').waitFor({ timeout: 20_000 });

    // The new account's first bow and sight-in carry the typed measurements and both marks.
    const list = (await (await context.request.get(`${stack.baseUrl}/api/bows`)).json()).bows;
    expect(list).toHaveLength(1);
    const detail = (await (await context.request.get(`${stack.baseUrl}/api/bows/${list[0].id}`)).json()).bow;
    expect(detail.sightRadiusMm).toBeCloseTo(820, 6);
    expect(detail.peepHeightMm).toBeCloseTo(110, 6);
    expect(detail.sightIns).toHaveLength(1);
    const sightIn = (await (await context.request.get(`${stack.baseUrl}/api/sight-ins/${detail.sightIns[0].id}`)).json()).sightIn;
    expect(sightIn.marks.map((mark: { distance: number; scaleMm: number }) => [mark.distance, mark.scaleMm])).toEqual([
      [20, 14.9],
      [60, 32.6],
    ]);
    await fullShot(page, 'keep-try-sight-in');

    // Carried once: the bench no longer offers it.
    await page.goto('/');
    await page.getByTestId(`bow-card-${list[0].id}`).waitFor();
    expect(await page.getByTestId('bench-keep-try').count()).toBe(0);
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }, 120_000);
}
