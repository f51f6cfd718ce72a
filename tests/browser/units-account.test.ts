/**
 * A yards archer, from sign-up: the first choice brings inches, feet and °F;
 * the bow form, build form, sight-in details and field card take values in
 * those units (and limits are stated in them), and the API stores mm, m and
 * °C. The sight-in date takes the US numeric form and the browser's picker.
 * Then the account basics: change the password (another sign-in ends), and
 * delete the account. An administrator's role change asked about and
 * acknowledged; the audit log naming bows and narrowed to one. Screenshots at
 * 390×844 and 1280×800.
 *
 * Reference values: 1 in = 25.4 mm, 1 ft = 0.3048 m (international yard and
 * pound agreement, 1959); °C = (°F − 32) × 5/9 (definition of the scales).
 */
import type { BrowserContext, Page } from 'playwright-core';
import { User } from '@/server/models';
import { recordAudit } from '@/server/services/audit-service';
import { uniqueEmail } from '../helpers/api';
import { DESKTOP, PHONE, fullScreenshot, pageErrors, stackForFile, type Stack } from '../helpers/browser';

const stack = stackForFile();

const shot = (page: Page, name: string) => fullScreenshot(page, name, { maxHeightPx: 9000, settleMs: 250, restoreMs: 150 });
const near = (actual: number, expected: number, tolerance = 1e-6) => expect(Math.abs(actual - expected)).toBeLessThan(tolerance);

/** A context in the US locale (month-first dates), with page errors collected. */
async function usPage(size: { width: number; height: number }): Promise<{ context: BrowserContext; page: Page }> {
  const context = await (stack as Stack).browser.newContext({
    viewport: size,
    baseURL: stack.baseUrl,
    locale: 'en-US',
    acceptDownloads: true,
  });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('pageerror', (err) => problems.push(String(err)));
  (page as Page & { problems?: string[] }).problems = problems;
  return { context, page };
}

const api = async (context: BrowserContext, path: string) => (await context.request.get(`${stack.baseUrl}${path}`)).json();

it('takes inches, feet and °F from a yards archer and stores mm, m and °C (390×844, then 1280×800)', async () => {
  const { context, page } = await usPage(PHONE);
  const email = uniqueEmail('units');
  const password = 'a long enough password';

  // Sign up: yards is the first choice, and brings the rest.
  await page.goto('/sign-up');
  await page.getByLabel('Name').waitFor();
  await page.getByLabel('Name').fill('Halvard Brenn');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByTestId('sign-up-units').getByRole('radio', { name: 'Yards' }).waitFor();
  await shot(page, 'units-sign-up');
  await page.getByRole('button', { name: /create account/i }).click();
  await page
    .getByText(/add your first bow/i)
    .first()
    .waitFor({ timeout: 15_000 });
  const { user } = await api(context, '/api/me');
  expect(user).toMatchObject({
    distanceUnit: 'yd',
    lengthUnit: 'in',
    altitudeUnit: 'ft',
    temperatureUnit: 'F',
    speedUnit: 'fps',
    massUnit: 'gr',
  });

  // The bow form: lengths in inches; a limit is stated in inches.
  await page.goto('/bows/new');
  await page.getByLabel('Nickname').waitFor();
  await page.getByLabel('Nickname').fill('Brenn timber slider');
  await page.getByLabel('Draw weight').fill('64');
  await page.getByLabel('Draw length').fill('28.5');
  await page.getByLabel('Sight radius').fill('12');
  await page.getByLabel('Peep height').fill('4.5');
  await page.getByTestId('bow-save').click();
  await page.getByText('Sight radius must be at least 15.75 in').waitFor();
  expect(await page.getByText(/Draw length must/).count()).toBe(0);
  await shot(page, 'units-bow-form-error');
  // A unit typed after the number is taken as typed: 838.2 mm = 33 in.
  await page.getByLabel('Sight radius').fill('838.2 mm');
  await page.getByTestId('bow-save').click();
  await page.waitForURL(/\/bows\/\d+$/);
  const bowId = Number(new URL(page.url()).pathname.split('/').pop());
  const { bow } = await api(context, `/api/bows/${bowId}`);
  near(bow.drawLengthMm, 723.9); // 28.5 × 25.4
  near(bow.sightRadiusMm, 838.2);
  near(bow.peepHeightMm, 114.3); // 4.5 × 25.4
  near(bow.tapeWidthMm, 8); // the default 8 mm, shown as 0.315 in, comes back as 8 mm
  await page.getByTestId('bow-setup').getByText('33.00 in').waitFor();

  // The build form: cut length and diameter in inches, weights in grains, speed in fps.
  await page.getByTestId('add-build').click();
  await page.getByLabel('Build name').waitFor();
  await page.getByLabel('Build name').fill('Brenn elk 450');
  await page.getByLabel('Grains per inch').fill('9.5');
  await page.getByLabel('Cut length').fill('40');
  await page.getByLabel('Diameter').fill('0.246');
  await page.getByLabel('Point', { exact: true }).fill('125');
  await page.getByLabel('Insert', { exact: true }).fill('16');
  await page.getByLabel('Nock', { exact: true }).fill('9');
  await page.getByLabel('Each vane').fill('6');
  await page.getByLabel('Chronographed speed').fill('282');
  await page.getByTestId('build-save').click();
  // 900 mm = 35.43 in (rounded down so the stated limit is itself accepted).
  await page.getByText('Cut length must be at most 35.43 in').waitFor();
  await shot(page, 'units-build-form-error');
  await page.getByLabel('Cut length').fill('28.5');
  await page.getByTestId('build-save').click();
  await page.waitForURL(new RegExp(`/bows/${bowId}$`));
  const { bow: withBuild } = await api(context, `/api/bows/${bowId}`);
  const build = withBuild.builds[0];
  near(build.cutLengthMm, 723.9);
  near(build.diameterMm, 6.2484); // 0.246 × 25.4
  near(build.pointGr, 125);
  near(build.speedFps, 282);
  await page.getByTestId('start-sight-in').waitFor();

  // The sight-in: the date picked on the browser's calendar, then typed month-first; altitude in feet, temperature in °F.
  await page.getByTestId('start-sight-in').click();
  await page.getByTestId('mark-distance-0').waitFor();
  await page.getByTestId('sight-in-date-picker').fill('2026-11-28');
  expect(await page.getByTestId('sight-in-date').inputValue()).toBe('2026-11-28');
  await page.getByTestId('sight-in-date').fill('12/02/2026');
  await page.getByText('Read as 2 December 2026 (month first); if you meant 12 February 2026, enter it as YYYY-MM-DD').waitFor();
  expect(await page.getByTestId('sight-in-date-picker').inputValue()).toBe('2026-12-02');
  await page.getByLabel('Place').fill('Skarvheim range');
  await page.getByTestId('sight-in-altitude').fill('20000');
  await page.getByTestId('sight-in-temperature').fill('41');
  await page.getByTestId('sight-in-unit').getByRole('radio', { name: 'Yards' }).click();
  await page.getByTestId('mark-distance-0').fill('20');
  await page.getByTestId('mark-reading-0').fill('14.9');
  await page.getByTestId('mark-distance-1').fill('60');
  await page.getByTestId('mark-reading-1').fill('32.6');
  await page.getByTestId('sight-in-save').click();
  // 5000 m = 16404.2 ft, stated rounded down.
  await page.getByText('Altitude must be at most 16404 ft').waitFor();
  // The live fit's own limit (5500 m) is stated in feet too.
  await page.getByText('Enter the altitude between -1640 and 18044 ft').first().waitFor();
  await shot(page, 'units-sight-in-error');
  await page.getByTestId('sight-in-altitude').fill('9200');
  await page.getByTestId('sight-in-save').click();
  await page.waitForURL(/\/sight-ins\/\d+$/);
  const sightInId = Number(new URL(page.url()).pathname.split('/').pop());
  const { sightIn } = await api(context, `/api/sight-ins/${sightInId}`);
  expect(sightIn.date).toBe('2026-12-02');
  near(sightIn.altitudeM, 2804.16); // 9200 × 0.3048
  near(sightIn.temperatureC, 5); // (41 − 32) × 5/9

  // The field card: the hunt's altitude and temperature in feet and °F, asked of the server in m and °C.
  await page.goto(`/sight-ins/${sightInId}/field-card`);
  await page.getByTestId('field-card-altitude').waitFor();
  await page.getByText('Sight-in air: 9200 ft, 41 °F. Leave the altitude empty for that air.').waitFor();
  const asked = page.waitForRequest(
    (request) =>
      /\/field-card\?/.test(request.url()) && /altitudeM=3048(&|$)/.test(request.url()) && /temperatureC=-10(&|$)/.test(request.url()),
  );
  await page.getByTestId('field-card-altitude').fill('10000'); // 3048 m
  await page.getByTestId('field-card-temperature').fill('14'); // −10 °C
  await asked;
  await page.getByTestId('field-card-altitude').fill('30000');
  await page.getByText('Enter an altitude between -1640 and 16404 ft').waitFor();
  await page.getByTestId('field-card-altitude').fill('10000');
  await shot(page, 'units-field-card');

  // The account page: every unit choice, and the same screens at desktop size.
  await page.goto('/account');
  await page.getByTestId('unit-altitudeUnit').getByRole('radio', { name: 'Feet' }).waitFor();
  await shot(page, 'units-account');
  await page.setViewportSize(DESKTOP);
  await page.goto('/bows/new');
  await page.getByLabel('Nickname').waitFor();
  await page.getByTestId('bow-save').click();
  await page.getByText('Enter the sight radius').waitFor();
  await shot(page, 'units-bow-form');
  await page.goto(`/sight-ins/${sightInId}`);
  await page.getByTestId('sight-in-altitude').waitFor();
  expect(await page.getByTestId('sight-in-altitude').inputValue()).toBe('9200');
  expect(await page.getByTestId('sight-in-temperature').inputValue()).toBe('41');
  await shot(page, 'units-sight-in');
  await page.goto('/account');
  await page.getByTestId('unit-altitudeUnit').waitFor();
  await shot(page, 'units-account');
  expect(pageErrors(page)).toEqual([]);
  await context.close();
}, 120_000);

for (const size of [PHONE, DESKTOP]) {
  it(`changes the password (another sign-in ends) and deletes the account (${size.width}×${size.height})`, async () => {
    const { context, page } = await usPage(size);
    const email = uniqueEmail('account');
    const password = 'first password here';
    const made = await context.request.post(`${stack.baseUrl}/api/auth/sign-up`, {
      headers: { 'X-Pinwright-Csrf': '1' },
      data: { name: 'Sigrun Dale', email, password, distanceUnit: 'm' },
    });
    expect(made.status()).toBe(201);
    // Another browser signed in to the same account.
    const other = await stack.browser.newContext({ baseURL: stack.baseUrl });
    expect(
      (
        await other.request.post(`${stack.baseUrl}/api/auth/sign-in`, { headers: { 'X-Pinwright-Csrf': '1' }, data: { email, password } })
      ).status(),
    ).toBe(200);

    await page.goto('/account');
    await page.getByTestId('password-change').waitFor();
    await page.getByLabel('Current password').fill('not the password');
    await page.getByLabel('New password').fill('second password here');
    await page.getByTestId('password-change-save').click();
    await page.getByText('That password is not right').waitFor();
    await page.getByLabel('Current password').fill(password);
    await page.getByTestId('password-change-save').click();
    await page.getByText('Password changed. Your 1 other sign-in was ended; this one stays.').waitFor();
    await page.getByTestId('password-changed').scrollIntoViewIfNeeded();
    await shot(page, 'account-password-changed');
    expect((await other.request.get(`${stack.baseUrl}/api/me`)).status()).toBe(401);
    expect((await context.request.get(`${stack.baseUrl}/api/me`)).status()).toBe(200);
    await other.close();

    // Download everything: one JSON file.
    const download = page.waitForEvent('download');
    await page.getByTestId('account-export').click();
    const file = await download;
    expect(file.suggestedFilename()).toMatch(/\.json$/);

    // Delete: what goes is said first; a wrong password deletes nothing.
    await page.getByTestId('account-delete-start').click();
    await page.getByTestId('account-delete-confirm').waitFor();
    await page.getByTestId('account-delete-password').fill('not it');
    await page.getByTestId('account-delete-confirm-button').click();
    await page.getByText('That password is not right').waitFor();
    await page.getByTestId('account-delete-confirm').scrollIntoViewIfNeeded();
    await shot(page, 'account-delete-confirm');
    await page.getByTestId('account-delete-password').fill('second password here');
    await page.getByTestId('account-delete-confirm-button').click();
    await page.waitForURL(/\/sign-in/);
    const signIn = await context.request.post(`${stack.baseUrl}/api/auth/sign-in`, {
      headers: { 'X-Pinwright-Csrf': '1' },
      data: { email, password: 'second password here' },
    });
    expect(signIn.status()).toBe(401);
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }, 90_000);
}

for (const size of [PHONE, DESKTOP]) {
  it(`asks before an admin changes a role, says it was saved, and narrows the audit log to a bow (${size.width}×${size.height})`, async () => {
    const { context, page } = await usPage(size);
    const adminEmail = uniqueEmail('admin');
    const made = await context.request.post(`${stack.baseUrl}/api/auth/sign-up`, {
      headers: { 'X-Pinwright-Csrf': '1' },
      data: { name: 'Ottilie Admin', email: adminEmail, password: 'an admin password' },
    });
    await User.update({ role: 'admin' }, { where: { id: (await made.json()).user.id } });
    // An archer with a bow, and entries about it in the log.
    const tag = `Gorse${Date.now().toString(36)}${size.width}`;
    const archer = await stack.browser.newContext({ baseURL: stack.baseUrl });
    const signed = await archer.request.post(`${stack.baseUrl}/api/auth/sign-up`, {
      headers: { 'X-Pinwright-Csrf': '1' },
      data: { name: `Ysolde ${tag}`, email: uniqueEmail('archer'), password: 'an archer password' },
    });
    const archerId = (await signed.json()).user.id as number;
    const bowRes = await archer.request.post(`${stack.baseUrl}/api/bows`, {
      headers: { 'X-Pinwright-Csrf': '1' },
      data: {
        nickname: `${tag} slider`,
        hand: 'right',
        drawWeightLb: 60,
        drawLengthMm: 720,
        sightKind: 'single-pin-slider',
        sightRadiusMm: 820,
        peepHeightMm: 110,
      },
    });
    expect(bowRes.status()).toBe(201);
    const bowId = (await bowRes.json()).bow.id as number;
    await recordAudit({
      actorId: archerId,
      action: 'invited',
      bowId,
      recordType: 'share',
      recordId: null,
      summary: 'Invited a technician to work on the bow',
    });
    await archer.close();

    await page.goto('/admin');
    await page.getByTestId('account-search').fill(tag);
    await page.getByTestId(`account-${archerId}`).waitFor();
    await page.getByTestId(`role-${archerId}`).getByRole('radio', { name: 'Technician' }).click();
    const confirm = page.getByTestId(`role-confirm-${archerId}`);
    await confirm.getByText(`Make Ysolde ${tag} a technician?`).waitFor();
    // Nothing is changed until the change is confirmed.
    expect((await User.findByPk(archerId))?.role).toBe('archer');
    await shot(page, 'admin-role-confirm');
    await confirm.getByRole('button', { name: 'Change the role' }).click();
    await page.getByTestId(`role-saved-${archerId}`).getByText(`Saved: Ysolde ${tag} is now a technician.`).waitFor();
    expect((await User.findByPk(archerId))?.role).toBe('tech');
    await shot(page, 'admin-role-saved');

    // The log names the bow and its archer; "Only …" narrows it to that bow.
    await page.goto('/admin/audit');
    await page.getByText(`on ${tag} slider (Ysolde ${tag}’s)`).first().waitFor();
    await page
      .getByRole('button', { name: `Only ${tag} slider` })
      .first()
      .click();
    await page.getByTestId('audit-clear-bow').getByText(`Bow: ${tag} slider ✕`).waitFor();
    await page.getByTestId('audit-total').getByText('1 entry').waitFor();
    await shot(page, 'admin-audit-filtered');
    await page.getByTestId('audit-kind').getByRole('radio', { name: 'Accounts' }).click();
    await page.getByText('Nothing has been recorded that matches.').waitFor();
    await page.getByTestId('audit-clear-bow').click();
    await page.getByText(`account Ysolde ${tag}`).first().waitFor();
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }, 90_000);
}
