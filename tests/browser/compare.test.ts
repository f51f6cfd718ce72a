/**
 * Builds and the field card as an archer uses them before a mountain hunt:
 * on the demo scenario's hunting bow (seeded for a fresh account), compare
 * its two sighted builds (chart, marks by distance with differences, figures),
 * predict a heavier build, and open a sight-in's field card for 2,700 m.
 * Screenshots at 390×844 and 1280×800.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { User } from '@/server/models';
import { seedBows } from '@/server/seed/bows';
import { buildBody, knownMarks } from '../api/bow-fixtures';
import {
  DESKTOP,
  PHONE,
  fullScreenshot,
  newPage,
  pageErrors,
  screenshot as viewportShot,
  signUpInContext,
  stackForFile,
} from '../helpers/browser';

const stack = stackForFile();

/** The page at its viewport size and, when the app's scroll container holds more, its whole length (fullScreenshot). */
const screenshot = (page: Page, name: string) => fullScreenshot(page, name, { maxHeightPx: 9000, settleMs: 300, restoreMs: 150 });

/** A fresh archer with the demo scenario's bows, builds and sight-ins (invented), signed in in `context`. */
async function archerWithDemoBows(context: BrowserContext): Promise<{ bowId: number; basinSightInId: number }> {
  const { email } = await signUpInContext(context, stack.baseUrl, 'Compare Archer');
  const user = await User.findOne({ where: { email } });
  await seedBows(user!);
  const bows = (await (await context.request.get(`${stack.baseUrl}/api/bows`)).json()).bows as { id: number; nickname: string }[];
  const bowId = bows.find((bow) => bow.nickname === 'Timberline slider')!.id;
  const detail = (await (await context.request.get(`${stack.baseUrl}/api/bows/${bowId}`)).json()).bow as {
    sightIns: { id: number; placeLabel: string }[];
  };
  return { bowId, basinSightInId: detail.sightIns.find((sightIn) => sightIn.placeLabel.startsWith('Greywether'))!.id };
}

/** The id of the first build button on the compare screen. */
async function firstPickId(page: Page): Promise<string> {
  const testId = await page.locator('[data-testid^="compare-pick-"]').first().getAttribute('data-testid');
  return testId!.replace('compare-pick-', '');
}

const numberIn = (text: string | null) => Number((text ?? '').replace('−', '-').replace(/[^\d.-]/g, ''));

for (const size of [PHONE, DESKTOP]) {
  const tag = `${size.width}x${size.height}`;
  it(`compares two builds, predicts a heavier one and opens the field card for 2,700 m (${tag})`, async () => {
    const { context, page } = await newPage(stack, size);
    await page.addInitScript(() => {
      // The print dialog cannot be driven headless; count the calls instead.
      (window as unknown as { printCalls: number }).printCalls = 0;
      window.print = () => {
        (window as unknown as { printCalls: number }).printCalls += 1;
      };
    });
    const { bowId, basinSightInId } = await archerWithDemoBows(context);

    // From the bow screen to the comparison: the two sighted builds are chosen already.
    await page.goto(`/bows/${bowId}`);
    await page.getByTestId('open-compare').waitFor();
    await viewportShot(page, 'compare-bow-links');
    await page.getByTestId('open-compare').click();
    await page.getByTestId('compare-results').waitFor();
    await page.getByTestId('compare-chart').locator('svg path').first().waitFor();
    const picks = page.getByRole('checkbox', { checked: true });
    expect(await picks.count()).toBe(2);
    // The elk build (chosen first) is the reference; the faster practice build needs a smaller reading at 40 yd.
    const diff = await page.getByTestId('compare-diff-40-1').textContent();
    expect(diff).toMatch(/mm\s+[+−][\d.]+ yd/);
    expect(numberIn(diff!.split('mm')[0])).toBeLessThan(0);
    const figures = await page.getByTestId('compare-figures').textContent();
    expect(figures).toMatch(/Elk heavy/);
    expect(figures).toMatch(/fps/);
    expect(figures).toMatch(/ft·lbf/);
    await expect(page.getByText('no legal determination', { exact: false }).count()).resolves.toBeGreaterThan(0);
    await screenshot(page, 'compare-builds');
    await page.getByTestId('compare-print-button').click();
    expect(await page.evaluate(() => (window as unknown as { printCalls: number }).printCalls)).toBe(1);
    // What the printer gets: the comparison alone, no navigation or controls.
    await page.emulateMedia({ media: 'print' });
    await viewportShot(page, 'compare-builds-print');
    expect(await page.getByTestId('compare-pick-' + (await firstPickId(page))).isVisible()).toBe(false);
    await page.emulateMedia({ media: 'screen' });

    // Predict a heavier point on the elk build.
    await page.goto(`/bows/${bowId}/predict`);
    await page.getByTestId('predict-point').waitFor();
    await page.getByTestId('predict-point').fill('200');
    await page.getByTestId('predict-submit').click();
    await page.getByTestId('predict-result').waitFor();
    expect(await page.getByTestId('predict-caution').textContent()).toMatch(/PREDICTED — not sighted/);
    const speed = numberIn(await page.getByTestId('predict-speed').textContent());
    // Heavier than the elk build (276 fps chronographed): slower.
    expect(speed).toBeGreaterThan(230);
    expect(speed).toBeLessThan(276);
    await page.getByTestId('predicted-tape-preview').waitFor();
    await screenshot(page, 'predict-build');

    // The field card of the basin sight-in, for 2,700 m.
    await page.goto(`/sight-ins/${basinSightInId}`);
    await page.getByTestId('open-field-card').click();
    await page.getByTestId('field-card-table').waitFor();
    await page.getByTestId('field-card-altitude').fill('2700');
    await page.getByText('Marks for 2700 m, standard temperature').first().waitFor();
    const cell = await page.getByTestId('field-card-cell--30-40').textContent();
    expect(cell).toMatch(/≈ \d+\.\d/);
    expect(await page.getByTestId('field-card-cautions').textContent()).toMatch(/confirm on real terrain/);
    await page.getByTestId('field-card-preview').locator('svg').first().waitFor();
    await screenshot(page, 'field-card');
    await page.getByTestId('field-card-print').click();
    // (Each page load starts the count again.)
    expect(await page.evaluate(() => (window as unknown as { printCalls: number }).printCalls)).toBe(1);
    // The print-only card is exactly 100 × 150 mm (CSS mm: 96 px per 25.4 mm).
    const printed = await page
      .locator('.pw-card-print img')
      .evaluate((img) => (img as HTMLImageElement).style.width + ' ' + (img as HTMLImageElement).style.height);
    expect(printed).toBe('100mm 150mm');
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('.pw-card-print img').isVisible()).toBe(true);
    await viewportShot(page, 'field-card-print');
    await page.emulateMedia({ media: 'screen' });
    const pdf = await context.request.get(`${stack.baseUrl}/api/sight-ins/${basinSightInId}/field-card.pdf?altitudeM=2700`);
    expect(pdf.status()).toBe(200);

    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }, 120_000);
}

it('keeps the distance column in view while four builds scroll sideways on a phone (390x844)', async () => {
  const { context, page } = await newPage(stack, PHONE);
  const { bowId } = await archerWithDemoBows(context);
  const headers = { 'X-Pinwright-Csrf': '1' };
  // Two more sighted builds (invented), so four are compared.
  const ids: number[] = [];
  for (const [name, pointGr] of [
    ['Heavy point test', 150],
    ['Light point test', 75],
  ] as const) {
    const made = await context.request.post(`${stack.baseUrl}/api/bows/${bowId}/builds`, { headers, data: buildBody({ name, pointGr }) });
    expect(made.status()).toBe(201);
    const buildId = (await made.json()).build.id as number;
    const sighted = await context.request.post(`${stack.baseUrl}/api/bows/${bowId}/sight-ins`, {
      headers,
      data: { buildId, date: '2026-11-20', placeLabel: 'Test lane', marks: knownMarks([20, 40, 60]) },
    });
    expect(sighted.status()).toBe(201);
    ids.push(buildId);
  }
  const builds = (await (await context.request.get(`${stack.baseUrl}/api/bows/${bowId}`)).json()).bow.builds as { id: number }[];
  await page.goto(`/bows/${bowId}/compare?builds=${builds.map((build) => build.id).join(',')}`);
  const table = page.getByTestId('compare-marks');
  await table.waitFor();
  expect(await table.locator('[role="columnheader"]').count()).toBe(5); // the distance column and four builds
  const cell = page.getByTestId('compare-row-40').locator('[role="rowheader"]');
  const before = (await cell.boundingBox())!;
  // Scroll the table sideways as far as it goes: the builds move, the distance stays put.
  const moved = await table.evaluate((node) => {
    const scroller = node.parentElement!.parentElement!;
    scroller.scrollLeft = scroller.scrollWidth;
    return scroller.scrollLeft;
  });
  expect(moved).toBeGreaterThan(0);
  await page.waitForTimeout(100);
  const after = (await cell.boundingBox())!;
  expect(Math.abs(after.x - before.x)).toBeLessThanOrEqual(1); // held over the table's 1 px border
  expect(await cell.textContent()).toBe('40');
  await table.scrollIntoViewIfNeeded();
  await viewportShot(page, 'compare-four-builds-scrolled');
  expect(pageErrors(page)).toEqual([]);
  await context.close();
}, 120_000);
