/**
 * Before a trip with a bow of two arrow builds: each build's card shows its
 * own latest tape against its own sight-ins (never the other build's), and
 * two sight-ins of one day are told apart by the time. Predict's button says
 * what is missing while it cannot run. Screenshots at phone (390×844) and
 * desktop (1280×800) size.
 */
import type { BrowserContext } from 'playwright-core';
import { CSRF } from '../helpers/api';
import { DESKTOP, PHONE, fullScreenshot, newPage, pageErrors, signUpInContext, stackForFile } from '../helpers/browser';
import { bowBody, buildBody, knownMarks } from '../api/bow-fixtures';

const stack = stackForFile();

async function post(context: BrowserContext, path: string, data: unknown) {
  const res = await context.request.post(`${stack.baseUrl}${path}`, { headers: CSRF, data });
  if (res.status() !== 201) throw new Error(`${path}: ${res.status()} ${await res.text()}`);
  return res.json();
}

for (const size of [PHONE, DESKTOP]) {
  it(`keeps each build's tape with its own sight-ins before a trip (${size.width}×${size.height})`, async () => {
    const { context, page } = await newPage(stack, size);
    await signUpInContext(context, stack.baseUrl, `Trip Archer ${size.width}`);
    const { bow } = await post(context, '/api/bows', bowBody({ nickname: 'Basin slider' }));
    const heavy = (await post(context, `/api/bows/${bow.id}/builds`, buildBody({ name: 'Elk heavy', speedFps: null }))).build;
    const light = (await post(context, `/api/bows/${bow.id}/builds`, buildBody({ name: 'Practice light', pointGr: 85, speedFps: null })))
      .build;
    const sightIn = async (buildId: number, date: string, placeLabel: string, distances: number[]) =>
      (await post(context, `/api/bows/${bow.id}/sight-ins`, { buildId, date, placeLabel, marks: knownMarks(distances) })).sightIn;
    const heavyOld = await sightIn(heavy.id, '2026-11-01', 'Larch Hollow range', [20, 40, 60]);
    await post(context, `/api/sight-ins/${heavyOld.id}/tapes`, { fromDistance: 20, toDistance: 60 });
    await sightIn(heavy.id, '2026-11-25', 'Quarry Bend', [20, 40, 60]);
    await sightIn(light.id, '2026-11-28', 'Larch Hollow range', [20, 30, 40]);
    const lightLate = await sightIn(light.id, '2026-11-28', 'Larch Hollow range', [20, 30, 40, 50]);
    await post(context, `/api/sight-ins/${lightLate.id}/tapes`, { fromDistance: 20, toDistance: 50 });

    await page.goto(`/bows/${bow.id}/readiness`);
    const heavyCard = page.getByTestId(`readiness-build-${heavy.id}`);
    const lightCard = page.getByTestId(`readiness-build-${light.id}`);
    await heavyCard.waitFor();
    await lightCard.waitFor();
    // Each tape is named with its own build's sight-in; light's is its latest, heavy's is older.
    expect(await page.getByTestId(`readiness-build-${light.id}-tape`).innerText()).toMatch(
      /28 Nov 2026, \d\d:\d\d UTC · Larch Hollow range · Practice light( \(\d of 2\))? \(this build’s latest\)/,
    );
    expect(await page.getByTestId(`readiness-build-${heavy.id}-tape`).innerText()).toMatch(
      /1 Nov 2026 · Larch Hollow range · Elk heavy\.$/,
    );
    const heavyWarnings = await page.getByTestId(`readiness-build-${heavy.id}-warnings`).innerText();
    expect(heavyWarnings).toContain('print one from the latest marks (25 Nov 2026 · Quarry Bend · Elk heavy)');
    expect(heavyWarnings).not.toContain('Practice light');
    expect(await lightCard.innerText()).not.toMatch(/older sight-in/);
    await fullScreenshot(page, 'trip-two-builds', { maxHeightPx: 6000, settleMs: 300, restoreMs: 150 });

    // The two sight-ins of 28 Nov differ in the bow's list too.
    await page.goto(`/bows/${bow.id}`);
    const rows = page.locator('[data-testid^="sight-in-row-"]', { hasText: '28 Nov 2026' });
    await rows.first().waitFor();
    const titles = await rows.allInnerTexts();
    expect(titles).toHaveLength(2);
    expect(titles[0]).not.toBe(titles[1]);

    // Predict cannot run without two chronographed builds: the button is disabled and says why.
    await page.goto(`/bows/${bow.id}/predict`);
    await page
      .getByTestId('predict-missing')
      .getByText(/Chronograph two builds/)
      .waitFor();
    expect(await page.getByTestId('predict-submit').getAttribute('aria-disabled')).toBe('true');
    await fullScreenshot(page, 'predict-missing', { maxHeightPx: 6000, settleMs: 300, restoreMs: 150 });

    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }, 120_000);
}
