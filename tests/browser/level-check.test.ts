/**
 * The level check as an archer walks it on a phone: start a check, work the
 * steps (with a reading, an adjustment and a photo), leave midway and resume,
 * finish; log a new string; see the Bench show the bow as due. Then the wide
 * layouts and the before-a-trip sheet. Screenshots at 390×844 and 1280×800.
 */
import zlib from 'node:zlib';
import type { BrowserContext, Page } from 'playwright-core';
import { CSRF } from '../helpers/api';
import { User } from '@/server/models';
import { seedBows } from '@/server/seed/bows';
import { seedLevel } from '@/server/seed/level';
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

/** A small real PNG (PNG spec, ISO/IEC 15948): a green bubble-coloured block. */
function png(width = 40, height = 30): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(zlib.crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8;
  header[9] = 2;
  const row = Buffer.concat([Buffer.from([0]), ...Array.from({ length: width }, () => Buffer.from([0x24, 0x60, 0x3a]))]);
  const pixels = zlib.deflateSync(Buffer.concat(Array.from({ length: height }, () => row)));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', pixels),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

async function makeBow(context: BrowserContext, nickname: string): Promise<number> {
  const res = await context.request.post(`${stack.baseUrl}/api/bows`, {
    headers: CSRF,
    data: {
      nickname,
      hand: 'right',
      drawWeightLb: 62,
      drawLengthMm: 711,
      sightKind: 'single-pin-slider',
      sightRadiusMm: 840,
      peepHeightMm: 112,
      sightDescription: 'Single-pin slider',
    },
  });
  if (res.status() !== 201) throw new Error(`bow: ${res.status()} ${await res.text()}`);
  return (await res.json()).bow.id;
}

/** The page at its viewport size and, when the app's scroll container holds more, its whole length (fullScreenshot). */
const screenshot = (page: Page, name: string) => fullScreenshot(page, name, { settleMs: 200, restoreMs: 100 });

/** Runs `body`; on a failure, saves what the page showed (debug-<name>) before rethrowing. */
async function recording(page: Page, name: string, body: () => Promise<void>) {
  try {
    await body();
  } catch (error) {
    await viewportShot(page, `debug-${name}`).catch(() => {});
    const text = await page.evaluate(() => document.body.innerText.slice(0, 1500)).catch(() => '');
    throw new Error(`${(error as Error).message}\n--- page at ${page.url()} ---\n${text}`);
  }
}

/** The step shown on a phone: its heading. */
const stepHeading = (page: Page, title: string) => page.getByRole('heading', { name: title, exact: true });

async function choose(page: Page, step: string, result: 'pass' | 'adjusted' | 'fail' | 'skipped') {
  await page.getByTestId(`${step}-result-${result}`).click();
}

it('walks a check on a phone, resumes it midway, logs a string change and sees the Bench show due', async () => {
  const { context, page } = await newPage(stack, PHONE);
  await signUpInContext(context, stack.baseUrl, 'Ilsa Brackwater');
  const bowId = await makeBow(context, 'Ridgeback slider');

  await page.goto(`/bows/${bowId}/level`);
  await page.getByTestId('level-state-none').waitFor();
  await page.getByText('Never checked.').waitFor();
  await screenshot(page, 'level-never-checked');

  await page.getByTestId('start-check').click();
  await page.waitForURL(/\/checks\/\d+$/);
  const checkUrl = page.url();
  await stepHeading(page, 'Set-up').waitFor();
  await page.getByTestId('level-caution').waitFor();
  await page.getByTestId('diagram-setup').waitFor();
  // Compact on a phone: the how-to words one tap away (the step's caution stays).
  expect(await page.getByText('Level means', { exact: true }).count()).toBe(0);
  await page.getByTestId('setup-how').click();
  await page.getByText('Level means', { exact: true }).waitFor();
  await screenshot(page, 'check-step-1-how');
  await page.getByTestId('setup-how').click();
  await screenshot(page, 'check-step-1');

  // Saving without a result says so, and stays on the step.
  await page.getByTestId('setup-save').click();
  await page.getByText('Choose a result: pass, adjusted, fail or skipped').waitFor();
  await choose(page, 'setup', 'pass');
  await page.getByTestId('setup-save').click();

  // First axis: adjusted, with a reading; the note is asked for.
  await stepHeading(page, 'First axis').waitFor();
  await choose(page, 'first-axis', 'adjusted');
  await page.getByTestId('first-axis-reading').fill('1.5');
  await page.getByTestId('first-axis-save').click();
  await page.getByText('Say what you adjusted').waitFor();
  await page.getByTestId('first-axis-adjustment').fill('Shimmed the sight bar at the mount');
  await screenshot(page, 'check-step-2-adjusted');
  await page.getByTestId('first-axis-save').click();

  // Second axis: a photo of the bubble (the extras folded on a phone, one tap away), then pass.
  await stepHeading(page, 'Second axis').waitFor();
  expect(await page.getByTestId('second-axis-reading').count()).toBe(0);
  await page.getByTestId('second-axis-extras').click();
  await page.getByTestId('second-axis-photo-input').setInputFiles({ name: 'bubble.png', mimeType: 'image/png', buffer: png() });
  await page.getByTestId('second-axis-photo-image').waitFor();
  await choose(page, 'second-axis', 'pass');
  await screenshot(page, 'check-step-3-photo');
  // Folded again, the extras keep what was added and the fold says so.
  await page.getByTestId('second-axis-extras').click();
  await page.getByTestId('second-axis-extras').getByText('▸ Reading, note and photo (filled in)').waitFor();
  expect(await page.getByTestId('second-axis-photo-image').count()).toBe(0);
  await page.getByTestId('second-axis-save').click();
  await stepHeading(page, 'Third axis').waitFor();

  // Leave midway, then resume from the bow's level screen: it opens at the third axis.
  await page.goto(`/bows/${bowId}/level`);
  await page.getByTestId('resume-card').waitFor();
  await page.getByText('3 of 5 steps done').waitFor();
  await screenshot(page, 'level-resume');
  await page.getByTestId('resume-check').click();
  await page.waitForURL(checkUrl);
  await stepHeading(page, 'Third axis').waitFor();
  await screenshot(page, 'check-resumed');
  // One-handed: with the how-to and the extras folded, the four results and the save button sit in one screen
  // (scrolled to the results, all in view above the 64 px tab bar), each at least 48 px tall.
  await page.getByTestId('third-axis-result-pass').scrollIntoViewIfNeeded();
  const targets = ['pass', 'adjusted', 'fail', 'skipped']
    .map((result) => `third-axis-result-${result}`)
    .concat('third-axis-extras', 'third-axis-save');
  for (const id of targets) {
    const box = (await page.getByTestId(id).boundingBox())!;
    expect(box.y).toBeGreaterThanOrEqual(56); // below the app bar
    expect(box.y + box.height).toBeLessThanOrEqual(PHONE.height - 64);
    expect(box.height).toBeGreaterThanOrEqual(48);
  }
  // What was saved before leaving is still there.
  await page.getByTestId('strip-first-axis').click();
  await stepHeading(page, 'First axis').waitFor();
  expect(await page.getByTestId('first-axis-adjustment').inputValue()).toBe('Shimmed the sight bar at the mount');
  await page.getByTestId('strip-third-axis').click();

  await choose(page, 'third-axis', 'pass');
  await page.getByTestId('third-axis-save').click();
  await stepHeading(page, 'At the range').waitFor();
  await choose(page, 'range', 'skipped');
  await page.getByRole('button', { name: 'Save and finish' }).click();
  await page.getByTestId('check-outcome').waitFor();
  await page.getByTestId('check-outcome-state').getByText('Level verified').waitFor();
  await page.getByText(/range confirmation .* is recommended/).waitFor();
  await screenshot(page, 'check-complete');

  // A new string, logged today after the check: the bow is due.
  await page.goto(`/bows/${bowId}/level`);
  await recording(page, 'after-complete', () => page.getByTestId('level-state-verified').waitFor({ timeout: 10_000 }));
  await page.getByTestId('log-change').click();
  await page.getByTestId('change-submit').click();
  await page.getByText(/^Choose what changed/).waitFor();
  await page.getByTestId('change-kind').getByRole('radio', { name: 'String' }).click();
  await page.getByTestId('change-note').fill('New string, 20 twists');
  await screenshot(page, 'level-log-change');
  await page.getByTestId('change-submit').click();
  await page.getByText('Change logged').waitFor();
  await page.getByTestId('level-state-due').waitFor();
  await page.getByTestId('level-reason').getByText('New string the same day as, and after, the last check.').waitFor();
  await screenshot(page, 'level-due');

  await page.goto('/');
  const card = page.getByTestId(`bow-card-${bowId}`);
  await card.waitFor();
  await card.getByText('Check due').waitFor();
  await screenshot(page, 'bench-due');

  // The Bow screen shows the state and why, and links here.
  await card.click();
  await page.getByTestId('bow-readiness').getByText('New string the same day as, and after, the last check.').waitFor();
  await page.getByTestId('open-level').waitFor();

  await page.goto(`/bows/${bowId}/readiness`);
  await page
    .getByTestId('readiness-warnings')
    .getByText(/Level: New string/)
    .waitFor();
  await screenshot(page, 'readiness');

  expect(pageErrors(page)).toEqual([]);
  await context.close();
}, 180_000);

it('shows every step at once on a wide screen, and the level and trip pages side by side', async () => {
  const { context, page } = await newPage(stack, DESKTOP);
  await signUpInContext(context, stack.baseUrl, 'Ilsa Brackwater');
  const bowId = await makeBow(context, 'Fenwater hunter');

  await page.goto(`/bows/${bowId}/level`);
  await page.getByTestId('start-check').click();
  await page.waitForURL(/\/checks\/\d+$/);
  for (const title of ['Set-up', 'First axis', 'Second axis', 'Third axis', 'At the range']) await stepHeading(page, title).waitFor();
  await screenshot(page, 'check-all-steps');

  const finish = page.getByTestId('finish-check');
  expect(await finish.getAttribute('aria-disabled')).toBe('true');
  for (const step of ['setup', 'first-axis', 'second-axis', 'third-axis', 'range']) {
    await choose(page, step, step === 'third-axis' ? 'fail' : 'pass');
    const saved = page.waitForResponse((res) => res.request().method() === 'PATCH' && res.url().includes('/api/checks/'));
    await page.getByTestId(`${step}-save`).click();
    expect((await saved).status()).toBe(200);
  }
  await page.waitForFunction(() => document.querySelector('[data-testid="finish-check"]')?.getAttribute('aria-disabled') !== 'true');
  await finish.click();
  await page.getByTestId('check-outcome').waitFor();
  await page.getByTestId('check-outcome-state').getByText('Level failed').waitFor();
  await screenshot(page, 'check-complete-failed');

  await page.goto(`/bows/${bowId}/level`);
  await recording(page, 'after-failed', () => page.getByTestId('level-state-failed').waitFor({ timeout: 10_000 }));
  await page.getByText('The last check left the third axis failing.').waitFor();
  await screenshot(page, 'level-failed');

  await page.goto(`/bows/${bowId}/readiness`);
  await page.getByTestId('readiness-level').waitFor();
  await screenshot(page, 'readiness');
  await page.emulateMedia({ media: 'print' });
  await screenshot(page, 'readiness-print');
  await page.emulateMedia({ media: 'screen' });

  expect(pageErrors(page)).toEqual([]);
  await context.close();
}, 180_000);

it('shows the demo scenario: one bow verified and one due on the Bench, and a full trip sheet', async () => {
  const { context, page } = await newPage(stack, DESKTOP);
  const { email } = await signUpInContext(context, stack.baseUrl, 'Marit Demo Copy');
  const archer = (await User.findOne({ where: { email } }))!;
  await seedBows(archer);
  await seedLevel(archer);

  await page.goto('/');
  await page.getByText('Timberline slider').waitFor();
  await page.getByText('Verified', { exact: true }).waitFor();
  await page.getByText('Check due', { exact: true }).waitFor();
  await screenshot(page, 'bench-demo');

  await page.getByText('Cedar five-pin').click();
  await page.getByTestId('open-level').click();
  await page.getByTestId('level-state-due').waitFor();
  await page.getByText('New string 12 days after the last check.').first().waitFor();
  await screenshot(page, 'level-demo-due');

  await page.getByTestId('open-readiness').click();
  await page.locator('[data-testid^="readiness-build-"][data-testid$="-longest"]').first().waitFor();
  await screenshot(page, 'readiness-demo');
  await page.emulateMedia({ media: 'print' });
  await screenshot(page, 'readiness-demo-print');
  await page.emulateMedia({ media: 'screen' });

  await page.setViewportSize(PHONE);
  await page.locator('[data-testid^="readiness-build-"][data-testid$="-longest"]').first().waitFor();
  await screenshot(page, 'readiness-demo');

  expect(pageErrors(page)).toEqual([]);
  await context.close();
}, 120_000);
