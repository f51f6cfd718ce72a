/**
 * Accessibility check of the main screens at phone size (390×844) with
 * axe-core (@axe-core/playwright 4.10), against the WCAG 2.0/2.1 A and AA
 * rules it carries: no serious or critical violation on sign-in, the Bench,
 * a bow, a sight-in, its tape, its field card, the comparison of builds, the
 * level screen and the account. The demo scenario's bows (invented) give each
 * screen real content: charts, tables and scrolling regions.
 */
import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { User } from '@/server/models';
import { seedBows } from '@/server/seed/bows';
import { seedLevel } from '@/server/seed/level';
import { PHONE, newPage, pageErrors, screenshot, signUpInContext, stackForFile } from '../helpers/browser';

const stack = stackForFile();

/** Serious and critical violations on the page as it stands, each as "rule: target (summary)". */
async function seriousViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page: page as never }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return results.violations
    .filter((violation) => violation.impact === 'serious' || violation.impact === 'critical')
    .flatMap((violation) =>
      violation.nodes.map(
        (node) => `${violation.id}: ${node.target.join(' ')} (${node.failureSummary?.split('\n')[1]?.trim() ?? violation.help})`,
      ),
    );
}

it('finds no serious or critical axe-core violation on the main screens at 390×844', async () => {
  const { context, page } = await newPage(stack, PHONE);
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').waitFor();
  const found: Record<string, string[]> = { 'sign-in': await seriousViolations(page) };

  const { email } = await signUpInContext(context, stack.baseUrl, 'Axe Archer');
  const user = (await User.findOne({ where: { email } }))!;
  await seedBows(user);
  await seedLevel(user);
  const bows = (await (await context.request.get(`${stack.baseUrl}/api/bows`)).json()).bows as { id: number; nickname: string }[];
  const bowId = bows.find((bow) => bow.nickname === 'Timberline slider')!.id;
  const detail = (await (await context.request.get(`${stack.baseUrl}/api/bows/${bowId}`)).json()).bow as { sightIns: { id: number }[] };
  const sightInId = detail.sightIns[0].id;

  const screens: [string, string, (page: Page) => Promise<unknown>][] = [
    ['bench', '/', (p) => p.getByTestId(`bow-card-${bowId}`).waitFor()],
    ['bow', `/bows/${bowId}`, (p) => p.getByTestId('open-compare').waitFor()],
    ['sight-in', `/sight-ins/${sightInId}`, (p) => p.getByTestId('fit-chart-marks').waitFor()],
    ['tape', `/sight-ins/${sightInId}/tape`, (p) => p.getByTestId('tape-preview').waitFor()],
    ['field-card', `/sight-ins/${sightInId}/field-card`, (p) => p.getByTestId('field-card-table').waitFor()],
    ['compare', `/bows/${bowId}/compare`, (p) => p.getByTestId('compare-chart-img').waitFor()],
    [
      'level',
      `/bows/${bowId}/level`,
      (p) =>
        p
          .getByText(/Last check/)
          .first()
          .waitFor(),
    ],
    ['account', '/account', (p) => p.getByText(email).waitFor()],
  ];
  for (const [name, path, ready] of screens) {
    await page.goto(path);
    await ready(page);
    // Let fonts and charts settle before the check.
    await page.waitForTimeout(300);
    found[name] = await seriousViolations(page);
    if (found[name].length > 0) await screenshot(page, `a11y-${name}`);
  }

  // The charts state what they show in words, not only as a picture.
  await page.goto(`/sight-ins/${sightInId}`);
  const label = await page.getByTestId('fit-chart-marks').getAttribute('aria-label');
  expect(label).toMatch(/^Chart: Reading against distance\. Your marks: \d+ yd at [\d.]+ mm/);
  expect(label).toMatch(/The fitted curve: /);
  // The field card's table scrolls sideways and is reachable by keyboard, with a name.
  await page.goto(`/sight-ins/${sightInId}/field-card`);
  const scroller = page.getByLabel('Marks for slopes (scrolls sideways)');
  expect(await scroller.getAttribute('tabindex')).toBe('0');

  expect(found).toEqual(Object.fromEntries(Object.keys(found).map((name) => [name, []])));
  expect(pageErrors(page)).toEqual([]);
  await context.close();
}, 180_000);
