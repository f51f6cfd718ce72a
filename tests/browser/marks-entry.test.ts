/**
 * Entering marks at the range, one-handed: on a phone each mark is one
 * compact row (distance, reading, arrows; the note folded behind a tap) with
 * the numeric keypad and 48 px targets, and the live fit's key figures stay in
 * view while the fifth mark is typed; a reading that falls with distance is
 * named on its own row and saving it asks first. Screenshots of five marks at
 * 390×844 and 1280×800.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { bowBody, buildBody, knownMarks } from '../api/bow-fixtures';
import { DESKTOP, PHONE, fullScreenshot, newPage, pageErrors, signUpInContext, stackForFile } from '../helpers/browser';

const stack = stackForFile();
jest.setTimeout(180_000);

const shot = (page: Page, name: string) => fullScreenshot(page, name, { maxHeightPx: 6000, settleMs: 250, restoreMs: 150 });

async function bowWithBuild(context: BrowserContext): Promise<number> {
  const headers = { 'X-Pinwright-Csrf': '1' };
  const bow = await (
    await context.request.post(`${stack.baseUrl}/api/bows`, { headers, data: bowBody({ nickname: 'Quillback slider' }) })
  ).json();
  await context.request.post(`${stack.baseUrl}/api/bows/${bow.bow.id}/builds`, { headers, data: buildBody({ name: 'Quillback heavy' }) });
  return bow.bow.id;
}

/** Five marks from the known sight (tests/api/bow-fixtures: 280 fps), as an archer reads them. */
const fiveMarks = knownMarks([20, 30, 40, 50, 60]);

for (const size of [PHONE, DESKTOP]) {
  it(`takes five marks in compact rows with the fit in view, and names a falling reading on its row (${size.width}×${size.height})`, async () => {
    const { context, page } = await newPage(stack, size);
    await signUpInContext(context, stack.baseUrl, 'Odile Fenwick');
    const bowId = await bowWithBuild(context);
    await page.goto(`/bows/${bowId}/sight-ins/new`);
    await page.getByTestId('mark-distance-0').waitFor({ timeout: 20_000 });
    await page.getByTestId('sight-in-unit').getByRole('radio', { name: 'Yards' }).click();

    for (const [index, mark] of fiveMarks.entries()) {
      if ((await page.getByTestId(`mark-distance-${index}`).count()) === 0) await page.getByTestId('mark-add').click();
      await page.getByTestId(`mark-distance-${index}`).fill(String(mark.distance));
      await page.getByTestId(`mark-reading-${index}`).fill(String(mark.scaleMm));
      await page.getByTestId(`mark-arrows-${index}`).fill('3');
    }
    await page.getByTestId('predicted-marks').waitFor();
    // Numeric keypad on every number cell.
    for (const id of ['mark-distance-4', 'mark-reading-4']) expect(await page.getByTestId(id).getAttribute('inputmode')).toBe('decimal');
    expect(await page.getByTestId('mark-arrows-4').getAttribute('inputmode')).toBe('numeric');

    if (size === PHONE) {
      // One compact row per mark: five rows fit in well under one screen (each was a ~530 px card).
      const rows = await Promise.all([0, 1, 2, 3, 4].map(async (index) => (await page.getByTestId(`mark-row-${index}`).boundingBox())!));
      for (const row of rows) expect(row.height).toBeLessThan(110);
      expect(rows[4].y + rows[4].height - rows[0].y).toBeLessThan(520);
      // Tap targets at least 48 px (WCAG 2.5.5 asks 44; theme.layout.minTap is 48).
      for (const id of ['mark-distance-4', 'mark-reading-4', 'mark-arrows-4', 'mark-more-4', 'mark-add']) {
        const box = (await page.getByTestId(id).boundingBox())!;
        expect(box.height).toBeGreaterThanOrEqual(47.5);
      }
      // The note and Remove are folded behind a tap.
      expect(await page.getByTestId('mark-note-4').count()).toBe(0);
      await page.getByTestId('mark-more-4').click();
      await page.getByTestId('mark-note-4').waitFor();
      await page.getByTestId('mark-remove-4').waitFor();
      await page.getByTestId('mark-more-4').click();
      // Typing the fifth mark: the live fit's figures are on screen at the same time.
      await page.getByTestId('mark-reading-4').focus();
      await page.getByTestId('mark-reading-4').scrollIntoViewIfNeeded();
      const strip = (await page.getByTestId('fit-strip').boundingBox())!;
      const field = (await page.getByTestId('mark-reading-4').boundingBox())!;
      expect(strip.y).toBeGreaterThanOrEqual(0);
      expect(strip.y + strip.height).toBeLessThanOrEqual(size.height);
      expect(field.y + field.height).toBeLessThanOrEqual(size.height);
      expect(await page.getByTestId('fit-strip-figures').textContent()).toMatch(/^\d+ fps · RMS \d+\.\d\d mm( · next \d+ yd)?$/);
      await page.screenshot({ path: `tests/artifacts/screenshots/marks-five-typing-${size.width}x${size.height}.png` });
    }
    await shot(page, 'marks-five');

    // The typo: 20/30/40 yd at 15.0/19.0/17.0 mm.
    await page.getByTestId('mark-distance-0').fill('20');
    await page.getByTestId('mark-reading-0').fill('15.0');
    await page.getByTestId('mark-distance-1').fill('30');
    await page.getByTestId('mark-reading-1').fill('19.0');
    await page.getByTestId('mark-distance-2').fill('40');
    await page.getByTestId('mark-reading-2').fill('17.0');
    for (const index of [4, 3]) {
      if (size === PHONE) await page.getByTestId(`mark-more-${index}`).click();
      await page.getByTestId(`mark-remove-${index}`).click();
    }
    const problem = page.getByTestId('mark-row-2').getByTestId('mark-problem-2');
    await problem.getByText(/^Mark 3 \(40 yd\): 17 mm is less than the 30 yd mark’s 19 mm/).waitFor();
    expect(await page.getByTestId('mark-problem-1').count()).toBe(0);
    await page
      .getByTestId('fit-advice-left-out')
      .getByText(/The fit leaves out mark 3/)
      .waitFor();
    expect(
      await page
        .locator('[data-testid^="fit-advice-chronograph"], [data-testid^="fit-advice-drag"], [data-testid^="fit-advice-sight-radius"]')
        .count(),
    ).toBe(0);
    await page.getByTestId('sight-in-save').click();
    await page.getByTestId('falling-confirm').waitFor();
    await shot(page, 'marks-falling');
    // Nothing was saved before the archer confirms.
    const bow = await (await context.request.get(`${stack.baseUrl}/api/bows/${bowId}`)).json();
    expect(bow.bow.sightIns).toHaveLength(0);
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
}
