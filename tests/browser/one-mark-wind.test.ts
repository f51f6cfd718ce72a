/**
 * One mark and a chronographed speed, and the crosswind table, as an archer
 * meets them: a bow whose build has a chronographed speed, a sight-in with a
 * single 20 yd mark; its sight-in screen and tape say plainly that every other
 * distance is an estimate from one mark (never a sighted tape) and where to
 * shoot next; its field card shows the crosswind drift and hold with the wind
 * caution. Screenshots at 390×844 and 1280×800.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { bowBody, buildBody, knownMarks, knownSight } from '../api/bow-fixtures';
import { DESKTOP, PHONE, fullScreenshot, newPage, pageErrors, signUpInContext, stackForFile } from '../helpers/browser';

const stack = stackForFile();
const CSRF = { 'X-Pinwright-Csrf': '1' };

const screenshot = (page: Page, name: string) => fullScreenshot(page, name, { maxHeightPx: 9000, settleMs: 300, restoreMs: 150 });

/** A fresh archer with one bow, a build with a chronographed speed, and a sight-in of one mark at 20 yd (all invented). */
async function oneMarkSightIn(context: BrowserContext): Promise<number> {
  await signUpInContext(context, stack.baseUrl, 'Wind Archer');
  const post = async (url: string, data: unknown) => {
    const res = await context.request.post(`${stack.baseUrl}${url}`, { headers: CSRF, data });
    if (res.status() !== 201) throw new Error(`${url}: ${res.status()} ${await res.text()}`);
    return res.json();
  };
  const { bow } = await post('/api/bows', bowBody({ nickname: 'Fenwick slider' }));
  const { build } = await post(`/api/bows/${bow.id}/builds`, buildBody({ name: 'Marsh 500', speedFps: knownSight.speedFps }));
  const { sightIn } = await post(`/api/bows/${bow.id}/sight-ins`, {
    buildId: build.id,
    date: '2026-11-28',
    placeLabel: 'Reed flats',
    marks: knownMarks([20]),
  });
  return sightIn.id as number;
}

for (const size of [PHONE, DESKTOP]) {
  const tag = `${size.width}x${size.height}`;
  it(`shows a one-mark tape as an estimate and the field card's crosswind table (${tag})`, async () => {
    const { context, page } = await newPage(stack, size);
    const sightInId = await oneMarkSightIn(context);

    // The sight-in: the fit says it is an estimate from one mark, and where to shoot next.
    await page.goto(`/sight-ins/${sightInId}`);
    await page.getByText('Estimate from one mark').first().waitFor();
    const advice = await page.getByTestId('fit-warnings').textContent();
    expect(advice).toMatch(/no other distance has been sighted/);
    expect(advice).toMatch(/Shoot \d+ yd next/);
    await screenshot(page, 'one-mark-sight-in');

    // The tape: flagged as an estimate from one mark, never a sighted tape; the drawn tape says so along its edge.
    await page.goto(`/sight-ins/${sightInId}/tape`);
    const flag = page.getByTestId('tape-one-mark');
    await flag.waitFor();
    expect(await flag.textContent()).toMatch(/Estimate from one mark: not a sighted tape.*Only 20 yd is sighted.*Shoot \d+ yd next/);
    await page.getByTestId('tape-preview').locator('svg').first().waitFor();
    await screenshot(page, 'one-mark-tape');
    const svg = await context.request.get(`${stack.baseUrl}/api/sight-ins/${sightInId}/tape.svg?from=20&to=80`);
    expect(svg.status()).toBe(200);
    expect(await svg.text()).toContain('aria-label="ESTIMATE FROM ONE MARK');

    // The field card: the crosswind table, drift in in and cm and the hold in mm, with its caution.
    await page.goto(`/sight-ins/${sightInId}/field-card`);
    await page.getByTestId('field-card-wind').waitFor();
    const box = await page.getByTestId('field-card-wind-10-60').textContent();
    expect(box).toMatch(/^[\d.]+ in[\d.]+ cm↔ [\d.]+$/);
    // 10 mph at 60 yd, full value: several inches for a hunting arrow near 280 fps (math: crosswindDriftM).
    const inches = Number(/^([\d.]+) in/.exec(box!)![1]);
    expect(inches).toBeGreaterThan(2);
    expect(inches).toBeLessThan(8);
    expect(await page.getByTestId('field-card-wind-caution').textContent()).toMatch(/only practice in wind confirms them/);
    await page.getByTestId('field-card-preview').locator('svg').first().waitFor();
    await screenshot(page, 'field-card-wind');
    const card = await context.request.get(`${stack.baseUrl}/api/sight-ins/${sightInId}/field-card.svg`);
    expect(await card.text()).toContain('data-wind="15"');

    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }, 120_000);
}
