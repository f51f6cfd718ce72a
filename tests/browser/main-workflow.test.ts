/**
 * The main workflow as a new archer walks it: sign up, add a bow with its
 * sight radius and peep height, add an arrow build (total grains and FOC shown
 * as they type), start a sight-in with marks at 20 and 60 yd, see the
 * predicted marks for 10–100 yd and the chart, save, open the tape, download
 * its SVG (ticks checked against the sight-in's stored marks) and open the
 * print sheet. Screenshots of every screen at 390×844 and 1280×800.
 */
import fs from 'node:fs';
import { DOMParser } from '@xmldom/xmldom';
import type { Page } from 'playwright-core';
import { uniqueEmail } from '../helpers/api';
import { DESKTOP, PHONE, fullScreenshot, newPage, pageErrors, stackForFile } from '../helpers/browser';

const stack = stackForFile();

/** The page at its viewport size and, when the app's scroll container holds more, its whole length (fullScreenshot). */
const screenshot = (page: Page, name: string) =>
  fullScreenshot(page, name, { maxHeightPx: 12000, settleMs: 250, restoreMs: 150, parts: { heightPx: 1400, whenTallerThanPx: 1600 } });

/** Parses "413.7" out of a figure's text. */
const numberIn = (text: string | null) => Number((text ?? '').replace(/[^\d.-]/g, ''));

// Invented sight-in: marks at 20 and 60 yd for R 820 mm, h 110 mm, a 414 gr,
// 6.5 mm arrow (readings of the order the drag model gives for ~285 fps).
const NEAR = { distance: '20', reading: '14.9' };
const FAR = { distance: '60', reading: '32.6' };

for (const size of [PHONE, DESKTOP]) {
  it(`signs up, adds a bow, a build and a sight-in, opens the tape, downloads it and opens the print sheet (${size.width}×${size.height})`, async () => {
    const { context, page } = await newPage(stack, size);
    await page.addInitScript(() => {
      // The print dialog cannot be driven headless; count the calls instead.
      (window as unknown as { printCalls: number }).printCalls = 0;
      window.print = () => {
        (window as unknown as { printCalls: number }).printCalls += 1;
      };
    });

    // Sign up.
    await page.goto('/sign-up');
    await page.getByLabel('Name').waitFor();
    await page.getByLabel('Name').fill('Orla Venn');
    await page.getByLabel('E-mail').fill(uniqueEmail('workflow'));
    await page.getByLabel('Password').fill('a long enough password');
    await page.getByRole('button', { name: /create account/i }).click();
    await page
      .getByText(/add your first bow/i)
      .first()
      .waitFor({ timeout: 15_000 });
    // Yards at sign-up brings inches for lengths; this archer measures in millimetres (account page).
    await page.goto('/account');
    await page.getByTestId('unit-lengthUnit').getByRole('radio', { name: 'Millimetres' }).click();
    await page.getByTestId('units-saved').waitFor();
    // The device cache is saved 100 ms after a change (components/offline/query-persistence.ts); reloading sooner would restore the old units.
    await page.waitForTimeout(1200);
    await page.goto('/');
    await page
      .getByText(/add your first bow/i)
      .first()
      .waitFor({ timeout: 15_000 });

    // Add a bow: bad input first (nothing saved), then its sight radius and peep height.
    await page
      .getByText(/add your first bow/i)
      .first()
      .click();
    await page.getByLabel('Nickname').waitFor();
    await screenshot(page, 'bow-new');
    await page.getByTestId('bow-save').click();
    await page.getByText('Enter the nickname').waitFor();
    await page.getByText('Enter the sight radius').waitFor();
    await screenshot(page, 'bow-new-errors');
    await page.getByLabel('Nickname').fill('Tarn ridge slider');
    await page.getByLabel('Draw weight').fill('62');
    await page.getByLabel('Draw length').fill('711');
    await page.getByLabel('Sight radius').fill('820');
    await page.getByLabel('Peep height').fill('110');
    await page.getByTestId('bow-save').click();
    await page.waitForURL(/\/bows\/\d+$/);
    const bowId = Number(new URL(page.url()).pathname.split('/').pop());
    await page.getByTestId('bow-setup').getByText('820 mm').waitFor();
    await screenshot(page, 'bow-empty');

    // Add a build: the totals appear as the parts are typed.
    await page.getByTestId('add-build').click();
    await page.getByLabel('Build name').waitFor();
    await page.getByLabel('Build name').fill('Ash heavy 414');
    await page.getByLabel('Grains per inch').fill('9.5');
    await page.getByLabel('Cut length').fill('723.9');
    await page.getByLabel('Diameter').fill('6.5');
    await page.getByLabel('Point', { exact: true }).fill('100');
    await page.getByLabel('Insert', { exact: true }).fill('16');
    await page.getByLabel('Nock', { exact: true }).fill('9');
    await page.getByLabel('Each vane').fill('6');
    await page.getByLabel('Balance point').fill('419.1');
    await page.getByLabel('Chronographed speed').fill('285');
    // 9.5 gpi × 28.5 in (723.9 mm / 25.4) + 100 + 16 + 9 + 3 × 6 = 413.75 gr (arithmetic of the parts).
    await page
      .getByTestId('total-grains')
      .getByText(/^413\.[78]$/)
      .waitFor();
    expect(Math.abs(numberIn(await page.getByTestId('total-grains').textContent()) - 413.75)).toBeLessThan(0.06);
    // FOC = 100 × (419.1 − 723.9/2) / 723.9 = 7.89 % (common practice formula, no published source).
    expect(Math.abs(numberIn(await page.getByTestId('foc').textContent()) - 7.89)).toBeLessThan(0.06);
    await page.getByText(/Energy figures are estimates, not a legal determination/).waitFor();
    await screenshot(page, 'build-new');
    await page.getByTestId('build-save').click();
    await page.waitForURL(new RegExp(`/bows/${bowId}$`));
    await page.getByText('Ash heavy 414').first().waitFor();

    // Start a sight-in and enter the marks.
    await page.getByTestId('start-sight-in').click();
    await page.getByTestId('mark-distance-0').waitFor();
    await page.getByTestId('sight-in-unit').getByRole('radio', { name: 'Yards' }).click();
    await page.getByLabel('Place').fill('Kestrel Hollow range');
    await page.getByTestId('mark-distance-0').fill(NEAR.distance);
    await page.getByTestId('mark-reading-0').fill(NEAR.reading);
    await page.getByTestId('mark-distance-1').fill(FAR.distance);
    await page.getByTestId('mark-reading-1').fill(FAR.reading);
    await page.getByTestId('predicted-marks').waitFor();
    for (let distance = 10; distance <= 100; distance += 10) await page.getByTestId(`predicted-${distance}`).waitFor();
    await page.getByTestId('fit-chart').locator('svg').first().waitFor();
    await screenshot(page, 'sight-in-new');
    await page.getByTestId('sight-in-save').click();
    await page.waitForURL(/\/sight-ins\/\d+$/);
    const sightInId = Number(new URL(page.url()).pathname.split('/').pop());
    await page.getByTestId('open-tape').waitFor();
    await screenshot(page, 'sight-in-saved');

    // The bow now lists the sight-in.
    await page.goto(`/bows/${bowId}`);
    await page.getByTestId('bow-readiness').waitFor();
    await screenshot(page, 'bow');

    // The tape.
    await page.goto(`/sight-ins/${sightInId}`);
    await page.getByTestId('open-tape').click();
    await page.waitForURL(new RegExp(`/sight-ins/${sightInId}/tape`));
    await page.getByTestId('tape-preview').waitFor();
    await page
      .getByTestId('tape-caution')
      .getByText(/Print at actual size \(100 %, no fit-to-page\)/)
      .waitFor();
    await screenshot(page, 'tape');
    await page.getByTestId('tape-save').click();
    await page.getByText('Layout saved.').waitFor();

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('download-svg').click()]);
    const svgText = fs.readFileSync((await download.path())!, 'utf8');
    const svg = new DOMParser().parseFromString(svgText, 'image/svg+xml');
    const root = svg.documentElement!;
    expect(root.getAttribute('width')).toMatch(/mm$/);
    const ticks = Array.from(svg.getElementsByTagName('line')).filter((line) => line.getAttribute('data-distance') !== null);
    const offsetOf = (distance: number) => {
      const tick = ticks.find((line) => Number(line.getAttribute('data-distance')) === distance);
      if (!tick) throw new Error(`no tick at ${distance}`);
      return Number(tick.getAttribute('y1'));
    };
    // The sight-in as the API stores it: with two marks the fit passes through both, so the
    // 20 → 60 yd tick spacing equals the difference of the stored readings (tape at 100 %).
    const stored = await context.request.get(`${stack.baseUrl}/api/sight-ins/${sightInId}`);
    const marks = (await stored.json()).sightIn.marks as { distance: number; scaleMm: number }[];
    const near = marks.find((mark) => mark.distance === 20)!;
    const far = marks.find((mark) => mark.distance === 60)!;
    expect(Math.abs(offsetOf(60) - offsetOf(20) - (far.scaleMm - near.scaleMm))).toBeLessThan(0.01);
    // Every yard has a tick, in order down the tape.
    const distances = ticks.map((line) => Number(line.getAttribute('data-distance')));
    expect(distances).toEqual(Array.from({ length: distances.length }, (_, i) => distances[0] + i));

    // The print sheet: at true size on its paper, print dialog opened once it loaded.
    await page.getByTestId('tape-print').click();
    await page.waitForURL(/\/print\/sheet\?/);
    const sheet = page.getByTestId('print-sheet');
    await sheet.waitFor();
    await page.waitForFunction(() => (window as unknown as { printCalls: number }).printCalls > 0, undefined, { timeout: 10_000 });
    const natural = await sheet.evaluate((img: HTMLImageElement) => ({ width: img.naturalWidth, css: img.style.width }));
    expect(natural.width).toBeGreaterThan(0);
    // On screen the preview shrinks to fit (min(100%, paper width)); printed, it is the paper's true size.
    // Chromium may serialise the mm width in px: 1 in = 96 px = 25.4 mm (CSS Values and Units, absolute lengths).
    const widthMatch = natural.css.match(/^min\(100%, ([\d.]+)(mm|px)\)$/);
    expect(widthMatch).not.toBeNull();
    const previewWidthMm = widthMatch![2] === 'mm' ? Number(widthMatch![1]) : (Number(widthMatch![1]) * 25.4) / 96;
    expect([210, 215.9].some((paperMm) => Math.abs(paperMm - previewWidthMm) < 0.1)).toBe(true);
    const pageRule = await page.evaluate(
      () =>
        Array.from(document.querySelectorAll('style'))
          .map((style) => style.textContent ?? '')
          .find((css) => css.includes('@page')) ?? '',
    );
    expect(pageRule).toMatch(/@page \{ size: (A4|letter); margin: 0; \}/);
    expect(pageRule).toMatch(/\.pw-sheet \{[^}]*width: (210|215\.9)mm !important; height: (297|279\.4)mm !important/);
    await screenshot(page, 'print-sheet');

    // Back on the Bench, the bow's card shows its readiness at a glance, and opens the bow.
    await page.goto('/');
    const card = page.getByTestId(`bow-card-${bowId}`);
    await card.getByText('Two-mark fit').waitFor();
    await card.getByText('Tape saved', { exact: true }).waitFor();
    await screenshot(page, 'bench');
    await card.click();
    await page.waitForURL(new RegExp(`/bows/${bowId}$`));
    await page
      .getByTestId(`tape-row-${(await (await context.request.get(`${stack.baseUrl}/api/bows/${bowId}`)).json()).bow.tapes[0].id}`)
      .waitFor();
    await screenshot(page, 'bow-complete');

    // Edit the set-up: a peep moved up a little; only that field changes.
    await page.getByTestId('bow-edit').first().click();
    await page.waitForURL(new RegExp(`/bows/${bowId}/edit$`));
    await page.getByLabel('Peep height').fill('112');
    await screenshot(page, 'bow-edit');
    await page.getByTestId('bow-save').click();
    await page.waitForURL(new RegExp(`/bows/${bowId}$`));
    await page.getByTestId('bow-setup').getByText('112 mm').waitFor();
    await page.getByTestId('bow-setup').getByText('820 mm').waitFor();

    // Delete asks first, names what goes with it, and then the Bench is empty again.
    await page.getByRole('button', { name: 'Delete this bow' }).click();
    const confirm = page.getByTestId('bow-delete-confirm');
    await confirm.getByText(/1 build, 1 sight-in, 1 tape/).waitFor();
    await screenshot(page, 'bow-delete-confirm');
    await confirm.getByRole('button', { name: 'Keep it' }).click();
    await page.getByRole('button', { name: 'Delete this bow' }).click();
    await page.getByTestId('bow-delete-confirm').getByRole('button', { name: 'Delete for good' }).click();
    await page
      .getByText(/add your first bow/i)
      .first()
      .waitFor();
    expect((await context.request.get(`${stack.baseUrl}/api/bows/${bowId}`)).status()).toBe(404);

    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }, 180_000);
}

it('gives a visitor a tape from two marks, with a prompt to sign up', async () => {
  for (const size of [PHONE, DESKTOP]) {
    const { context, page } = await newPage(stack, size);
    await page.goto('/try');
    await page.getByTestId('try-sight-radius').waitFor();
    await page.getByTestId('try-sight-radius').fill('820');
    await page.getByTestId('try-peep-height').fill('110');
    await page.getByTestId('try-near-reading').fill(NEAR.reading);
    await page.getByTestId('try-far-reading').fill(FAR.reading);
    await page.getByTestId('tape-preview').waitFor();
    await page.getByText('Create an account').waitFor();
    await screenshot(page, 'try');
    // An impossible gap is named in plain words.
    await page.getByTestId('try-far-reading').fill('15.1');
    await page.getByText('These marks cannot be fitted').waitFor();
    await screenshot(page, 'try-impossible');
    await page.getByTestId('try-far-reading').fill(FAR.reading);
    await page.getByTestId('tape-preview').waitFor();
    // Print goes through /api/try/sheet.svg: the sheet shows at true size on its paper.
    await page.addInitScript(() => {
      window.print = () => undefined;
    });
    await page.getByTestId('try-print').click();
    await page.waitForURL(/\/print\/sheet\?source=try/);
    const sheet = page.getByTestId('print-sheet');
    await sheet.waitFor();
    await page.waitForFunction(
      () => ((document.querySelector('[data-testid="print-sheet"]') as HTMLImageElement | null)?.naturalWidth ?? 0) > 0,
    );
    expect(await sheet.getAttribute('data-paper')).toBe('letter');
    await screenshot(page, 'try-print-sheet');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }
}, 120_000);

it('shows a fixed multi-pin sight the gap of each pin beside its tape', async () => {
  const { context, page } = await newPage(stack, DESKTOP);
  const email = uniqueEmail('pins');
  const signUp = await context.request.post(`${stack.baseUrl}/api/auth/sign-up`, {
    headers: { 'X-Pinwright-Csrf': '1' },
    data: { name: 'Brannoc Hale', email, password: 'a long enough password' },
  });
  expect(signUp.status()).toBe(201);
  const post = async (path: string, data: unknown) => {
    const res = await context.request.post(`${stack.baseUrl}${path}`, { headers: { 'X-Pinwright-Csrf': '1' }, data });
    if (res.status() !== 201) throw new Error(`${path}: ${res.status()} ${await res.text()}`);
    return res.json();
  };
  const { bow } = await post('/api/bows', {
    nickname: 'Fenmoor five-pin',
    hand: 'left',
    drawWeightLb: 58,
    drawLengthMm: 700,
    sightKind: 'fixed-multi-pin',
    sightRadiusMm: 820,
    peepHeightMm: 110,
    pinDistances: [20, 30, 40, 50, 60],
    pinDistanceUnit: 'yd',
  });
  const { build } = await post(`/api/bows/${bow.id}/builds`, {
    name: 'Birch 414',
    grainsPerInch: 9.5,
    cutLengthMm: 723.9,
    diameterMm: 6.5,
    pointGr: 100,
    insertGr: 16,
    nockGr: 9,
    vaneWeightGr: 6,
  });
  const { sightIn } = await post(`/api/bows/${bow.id}/sight-ins`, {
    buildId: build.id,
    date: '2026-11-28',
    marks: [
      { distance: 20, unit: 'yd', scaleMm: 14.9 },
      { distance: 60, unit: 'yd', scaleMm: 32.6 },
    ],
  });

  await page.goto(`/sight-ins/${sightIn.id}/tape`);
  const table = page.getByTestId('pin-gaps');
  await table.waitFor();
  // Two marks and no chronograph: the fit passes through both, so the 60 yd pin sits
  // 32.6 − 14.9 = 17.70 mm below the 20 yd pin (arithmetic of the stored readings).
  await page.getByTestId('pin-20').getByText('0.00 mm').waitFor();
  await page.getByTestId('pin-60').getByText('17.70 mm').waitFor();
  const gaps = await Promise.all(
    [30, 40, 50, 60].map(async (distance) =>
      numberIn(await page.getByTestId(`pin-${distance}`).locator('[role="cell"]').nth(3).textContent()),
    ),
  );
  // The gaps add up to the spread of the pins.
  expect(Math.abs(gaps.reduce((sum, gap) => sum + gap, 0) - 17.7)).toBeLessThan(0.03);
  // Each pin's gap is larger than the one above it (the arrow drops faster with range).
  gaps.slice(1).forEach((gap, i) => expect(gap).toBeGreaterThan(gaps[i]));
  await page.getByTestId('tape-preview').waitFor();
  await screenshot(page, 'tape-pins');
  expect(pageErrors(page)).toEqual([]);
  await context.close();
}, 60_000);

it('takes lengths in inches from an archer who prefers them, and stores millimetres', async () => {
  const { context, page } = await newPage(stack, PHONE);
  const signUp = await context.request.post(`${stack.baseUrl}/api/auth/sign-up`, {
    headers: { 'X-Pinwright-Csrf': '1' },
    data: { name: 'Wren Alder', email: uniqueEmail('inches'), password: 'a long enough password' },
  });
  expect(signUp.status()).toBe(201);
  const units = await context.request.patch(`${stack.baseUrl}/api/me`, {
    headers: { 'X-Pinwright-Csrf': '1' },
    data: { lengthUnit: 'in' },
  });
  expect(units.status()).toBe(200);

  await page.goto('/bows/new');
  await page.getByLabel('Nickname').waitFor();
  await page.getByText('Lengths in inches; change the unit on your account page.').waitFor();
  await page.getByLabel('Nickname').fill('Cobble creek hunter');
  await page.getByLabel('Draw weight').fill('55');
  await page.getByLabel('Draw length').fill('28');
  // Too short a sight radius: the message gives the limit in the unit typed (400 mm = 15.748 in, rounded up).
  await page.getByLabel('Sight radius').fill('12');
  await page.getByLabel('Peep height').fill('4.25');
  await page.getByTestId('bow-save').click();
  await page.getByText('Sight radius must be at least 15.75 in').waitFor();
  await screenshot(page, 'bow-new-inches');
  await page.getByLabel('Sight radius').fill('33');
  await page.getByTestId('bow-save').click();
  await page.waitForURL(/\/bows\/\d+$/);
  const bowId = Number(new URL(page.url()).pathname.split('/').pop());
  const { bow } = await (await context.request.get(`${stack.baseUrl}/api/bows/${bowId}`)).json();
  // 1 in = 25.4 mm exactly (international yard and pound, 1959).
  expect(Math.abs(bow.sightRadiusMm - 838.2)).toBeLessThan(1e-9);
  expect(Math.abs(bow.peepHeightMm - 107.95)).toBeLessThan(1e-9);
  expect(Math.abs(bow.drawLengthMm - 711.2)).toBeLessThan(1e-9);
  // The tape width left at its default (shown as 0.315 in) is stored as the 8 mm it stands for.
  expect(Math.abs(bow.tapeWidthMm - 8)).toBeLessThan(1e-9);
  await page.getByTestId('bow-setup').getByText('33.00 in').waitFor();
  expect(pageErrors(page)).toEqual([]);
  await context.close();
}, 60_000);
