/**
 * Sharing a bow, as the people would do it: an archer invites a technician
 * from the bow; an administrator finds the e-mail in the development mail
 * reader (the technician has no account yet to read it with), the technician
 * follows its link, creates a technician account from the invitation
 * and adds a level check on the shared bow; the archer sees it in the bow's
 * log and ends the share; the technician's next look at the bow is refused.
 * Then the account basics around it: a password reset from the e-mailed
 * link, the administrator's accounts and audit log, and importing marks from
 * a CSV file with its preview. Screenshots at phone (390×844) and desktop
 * (1280×800) size.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { User } from '@/server/models';
import { CSRF, uniqueEmail } from '../helpers/api';
import { DESKTOP, PHONE, newPage, pageErrors, screenshot, signUpInContext, stackForFile } from '../helpers/browser';
import { bowBody, buildBody, knownMarks } from '../api/bow-fixtures';

const stack = stackForFile();

/** A bow with a build and a sight-in, through the API in the archer's browser context. */
async function makeBow(context: BrowserContext, nickname: string): Promise<number> {
  return (await makeBowWithSightIn(context, nickname)).bowId;
}

async function makeBowWithSightIn(context: BrowserContext, nickname: string): Promise<{ bowId: number; sightInId: number }> {
  const post = async (path: string, data: unknown) => {
    const res = await context.request.post(`${stack.baseUrl}${path}`, { headers: CSRF, data });
    if (res.status() !== 201) throw new Error(`${path}: ${res.status()} ${await res.text()}`);
    return res.json();
  };
  const { bow } = await post('/api/bows', bowBody({ nickname }));
  const { build } = await post(`/api/bows/${bow.id}/builds`, buildBody());
  const { sightIn } = await post(`/api/bows/${bow.id}/sight-ins`, {
    buildId: build.id,
    date: '2026-11-02',
    placeLabel: 'Alder Flats range',
    marks: knownMarks([20, 40, 60]),
  });
  return { bowId: bow.id, sightInId: sightIn.id };
}

const steps = [
  ['setup', 'pass'],
  ['first-axis', 'pass'],
  ['second-axis', 'adjusted'],
  ['third-axis', 'pass'],
  ['range', 'skipped'],
] as const;

/** Works a started check through every step and finishes it (phone: one step a screen; desktop: all at once). */
async function workCheck(page: Page) {
  for (const [step, result] of steps) {
    await page.getByTestId(`${step}-result-${result}`).click();
    if (result === 'adjusted') await page.getByTestId(`${step}-adjustment`).fill('Turned the sight bubble a quarter turn');
    const saved = page.waitForResponse((res) => res.request().method() === 'PATCH' && res.url().includes('/api/checks/'));
    await page.getByTestId(`${step}-save`).click();
    expect((await saved).status()).toBe(200);
  }
  // The phone's last step saves and finishes; the desktop has a separate finish button.
  await page.getByTestId('check-outcome').or(page.getByTestId('finish-check')).first().waitFor();
  if (!(await page.getByTestId('check-outcome').isVisible())) {
    await page.waitForFunction(() => document.querySelector('[data-testid="finish-check"]')?.getAttribute('aria-disabled') !== 'true');
    await page.getByTestId('finish-check').click();
  }
  await page.getByTestId('check-outcome').waitFor();
}

for (const size of [PHONE, DESKTOP]) {
  it(`invites a technician, who accepts from the e-mail and adds a level check; the archer revokes (${size.width}×${size.height})`, async () => {
    const tag = `${size.width}`;
    const archerName = `Sigrun Vale ${tag}`;
    const nickname = `Larch Ridge slider ${tag}`;
    const techEmail = uniqueEmail('tech');

    // The archer invites the technician from the bow.
    const archer = await newPage(stack, size);
    await signUpInContext(archer.context, stack.baseUrl, archerName);
    const bowId = await makeBow(archer.context, nickname);
    await archer.page.goto(`/bows/${bowId}`);
    await archer.page.getByTestId('open-sharing').click();
    await archer.page.getByTestId('bow-sharing').waitFor();
    await archer.page.getByText('Nobody. This bow’s records are yours alone.').waitFor();
    await archer.page.getByLabel('Technician’s e-mail').fill(techEmail);
    await archer.page.getByTestId('send-invite').click();
    await archer.page.getByTestId('invite-sent').waitFor();
    await archer.page.getByText('Invited, not yet accepted').waitFor();
    await screenshot(archer.page, 'share-invited');

    // The development mailbox shows an account only its own mail; the technician has no
    // account yet, so an administrator reads the invitation there, and the technician
    // opens its link in their own browser, as they would from their mail program.
    const mailbox = await newPage(stack, size);
    await signUpInContext(mailbox.context, stack.baseUrl, `Mailbox Admin ${tag}`).then(({ email }) =>
      User.update({ role: 'admin' }, { where: { email } }),
    );
    await mailbox.page.goto('/dev-mail');
    const subject = `${archerName} shared a bow with you on Pinwright`;
    await mailbox.page.getByText(subject).first().click();
    await mailbox.page
      .getByTestId('mail-text')
      .getByText(new RegExp(`"${nickname}"`))
      .waitFor();
    await screenshot(mailbox.page, 'share-mail');
    const inviteLink = await mailbox.page.getByTestId('mail-open-link').getAttribute('href');
    expect(inviteLink).toMatch(/^\/invite\?token=/);
    await mailbox.context.close();
    const tech = await newPage(stack, size);
    // Signed out, the mailbox asks for a sign-in and shows nothing.
    await tech.page.goto('/dev-mail');
    await tech.page.getByTestId('mail-sign-in').waitFor();
    expect(await tech.page.getByText(subject).count()).toBe(0);
    await screenshot(tech.page, 'dev-mail-signed-out');
    await tech.page.goto(inviteLink!);
    await tech.page.waitForURL(/\/invite\?token=/);
    await tech.page.getByText(`${archerName} would like you to see the records of the bow “${nickname}”`, { exact: false }).waitFor();
    await screenshot(tech.page, 'share-invite-page');

    // No account yet: create a technician account from the invitation.
    expect(await tech.page.getByLabel('E-mail').inputValue()).toBe(techEmail);
    await tech.page.getByLabel('Name').fill(`Bram Kettleby ${tag}`);
    await tech.page.getByLabel('Password').fill('a long enough password');
    await tech.page.getByTestId('create-tech').click();
    await tech.page.getByTestId('invite-accepted').waitFor();
    await screenshot(tech.page, 'share-accepted');

    // The bow is under Clients; the technician adds a level check on it.
    await tech.page.goto('/clients');
    await tech.page.getByTestId(`client-bow-${bowId}`).waitFor();
    await screenshot(tech.page, 'share-clients');
    await tech.page.getByTestId(`client-bow-${bowId}`).click();
    await tech.page.getByTestId('shared-with-you').waitFor();
    // Whose bow it is, and none of the archer-only actions (the server would refuse them).
    await tech.page.getByTestId('shared-with-you').getByText(`Shared with you by ${archerName}.`).waitFor();
    await tech.page
      .getByTestId('shared-with-you')
      .getByText(`only ${archerName} can change or delete their records`, { exact: false })
      .waitFor();
    await tech.page.getByTestId('bow-setup').waitFor();
    expect(await tech.page.getByTestId('bow-edit').count()).toBe(0);
    // A technician may add an arrow build (a new, attributed record), never edit the archer's.
    expect(await tech.page.getByTestId('add-build').count()).toBe(1);
    expect(await tech.page.getByText('Delete this bow').count()).toBe(0);
    await screenshot(tech.page, 'share-tech-bow');
    await tech.page.getByTestId('open-level').click();
    await tech.page.getByTestId('start-check').click();
    await tech.page.waitForURL(/\/checks\/\d+$/);
    await workCheck(tech.page);
    await screenshot(tech.page, 'share-tech-check');

    // The archer sees the technician's check in the bow's log, and ends the share.
    await archer.page.reload();
    const log = archer.page.getByTestId('bow-audit');
    await log.getByText('Added a level check: at the bench').waitFor();
    await log.getByText(`By Bram Kettleby ${tag} (technician)`).first().waitFor();
    await archer.page.getByText('Active', { exact: true }).waitFor();
    await screenshot(archer.page, 'share-archer-log');
    // The Account page lists the bow as shared, and leads back to its sharing page.
    await archer.page.goto('/account');
    await archer.page.getByTestId('account-shares').getByText(nickname).waitFor();
    await screenshot(archer.page, 'share-account');
    await archer.page.getByTestId('account-shares').getByText('Manage').click();
    await archer.page.getByTestId('bow-sharing').waitFor();
    await archer.page.getByRole('button', { name: 'End the share' }).click();
    await archer.page.getByText(`End the share with Bram Kettleby ${tag}?`).waitFor();
    await screenshot(archer.page, 'share-revoke-confirm');
    await archer.page
      .getByTestId(/^confirm-revoke-/)
      .getByRole('button', { name: 'End the share' })
      .click();
    await archer.page.getByText('Nobody. This bow’s records are yours alone.').waitFor();
    await archer.page.getByText(/^Ended: Bram Kettleby/).waitFor();

    // The archer's level page shows the check the technician did.
    await archer.page.goto(`/bows/${bowId}/level`);
    await archer.page.getByText(`Bram Kettleby ${tag}`, { exact: false }).first().waitFor();

    // The technician's next request is refused: the bow is gone from their view.
    await tech.page.goto(`/bows/${bowId}`);
    await tech.page.getByText('The bow could not be loaded').waitFor();
    await screenshot(tech.page, 'share-revoked');
    await tech.page.goto('/clients');
    await tech.page.getByText('No shared bows yet').waitFor();

    expect(pageErrors(archer.page)).toEqual([]);
    expect(pageErrors(tech.page)).toEqual([]);
    await archer.context.close();
    await tech.context.close();
  }, 240_000);
}

for (const size of [PHONE, DESKTOP]) {
  it(`resets a password from the e-mail, runs the admin pages and imports marks from CSV (${size.width}×${size.height})`, async () => {
    const tag = `${size.width}`;

    // Forgot password → the e-mail → a new password.
    const archer = await newPage(stack, size);
    const { email } = await signUpInContext(archer.context, stack.baseUrl, `Oswin Brae ${tag}`);
    const visitor = await newPage(stack, size);
    await visitor.page.goto('/sign-in');
    await visitor.page.getByText('Forgot your password?').click();
    await visitor.page.getByLabel('E-mail').fill(email);
    await visitor.page.getByRole('button', { name: 'Send the link' }).click();
    await visitor.page.getByTestId('forgot-sent').waitFor();
    await screenshot(visitor.page, 'password-forgot');
    // The archer reads the e-mail where they are still signed in (the development
    // mailbox shows an account the mail sent to its own address) and follows the link.
    await archer.page.goto('/dev-mail');
    await archer.page.getByText(`To ${email}`, { exact: false }).first().click();
    await archer.page.getByTestId('mail-text').getByText(`Hello Oswin Brae ${tag},`).waitFor();
    await screenshot(archer.page, 'password-mail');
    await archer.page.getByTestId('mail-open-link').click();
    await archer.page.waitForURL(/\/reset-password\?token=/);
    await archer.page.getByLabel('New password', { exact: true }).fill('a fresh long passphrase');
    await archer.page.getByLabel('New password again').fill('a different passphrase');
    await archer.page.getByRole('button', { name: 'Change the password' }).click();
    await archer.page.getByText('The two passwords are not the same').waitFor();
    await archer.page.getByLabel('New password again').fill('a fresh long passphrase');
    await archer.page.getByRole('button', { name: 'Change the password' }).click();
    await archer.page.getByTestId('reset-done').waitFor();
    await screenshot(archer.page, 'password-reset');
    // The archer's open session ended with the reset; the new password signs in.
    await archer.page.goto('/');
    await archer.page.getByLabel('E-mail').waitFor();
    await archer.page.getByLabel('E-mail').fill(email);
    await archer.page.getByLabel('Password').fill('a fresh long passphrase');
    await archer.page.getByRole('button', { name: 'Sign in' }).click();
    await archer.page
      .getByText(/add your first bow/i)
      .first()
      .waitFor();

    // Marks from a CSV file: the preview names each row's problem; then all are added.
    const { sightInId } = await makeBowWithSightIn(archer.context, `Import slider ${tag}`);
    await archer.page.goto(`/sight-ins/${sightInId}`);
    await archer.page.getByTestId('import-marks').click();
    await archer.page.getByTestId('marks-import').waitFor();
    const good = knownMarks([30, 50]);
    await archer.page
      .getByTestId('csv-paste')
      .fill(`distance,reading,arrows,note\n30,${good[0].scaleMm},3,calm\nfifty,${good[1].scaleMm},,\n`);
    await archer.page.getByTestId('check-csv').click();
    await archer.page.getByText('The distance “fifty” is not a number').waitFor();
    await archer.page.getByTestId('import-rows').scrollIntoViewIfNeeded();
    await screenshot(archer.page, 'import-preview');
    await archer.page
      .getByTestId('csv-paste')
      .fill(`distance,reading,arrows,note\n30,${good[0].scaleMm},3,calm\n50,${good[1].scaleMm},,"gusty, left to right"\n`);
    await archer.page.getByTestId('check-csv').click();
    await archer.page.getByText('All 2 rows are ready. Nothing is saved until you add them.').waitFor();
    await archer.page.getByTestId('save-csv').click();
    await archer.page.getByTestId('import-done').waitFor();
    await archer.page.getByTestId('import-done').scrollIntoViewIfNeeded();
    await screenshot(archer.page, 'import-done');

    // The administrator finds the archer, makes them a technician, and reads the log.
    const admin = await newPage(stack, size);
    const adminAccount = await signUpInContext(admin.context, stack.baseUrl, `Runa Admin ${tag}`);
    await User.update({ role: 'admin' }, { where: { email: adminAccount.email } });
    await admin.page.goto('/admin');
    await admin.page.getByTestId('admin-accounts').waitFor();
    await admin.page.getByLabel('Search').fill(email);
    const row = admin.page.locator('[data-testid^="account-"]').filter({ hasText: email });
    await row.waitFor();
    await row.getByRole('radio', { name: 'Technician' }).click();
    // A role change is asked about first, then acknowledged.
    await row.getByRole('button', { name: 'Change the role' }).click();
    await row.getByText(`Saved: Oswin Brae ${tag} is now a technician.`).waitFor();
    await row.getByRole('radio', { name: 'Technician', checked: true }).waitFor();
    await screenshot(admin.page, 'admin-accounts');
    await admin.page.getByTestId('admin-audit-tab').click();
    await admin.page.getByTestId('admin-audit').waitFor();
    await admin.page.getByText(`Changed the role of Oswin Brae ${tag} <${email}> from archer to tech`).waitFor();
    await screenshot(admin.page, 'admin-audit');
    expect((await User.findOne({ where: { email } }))?.role).toBe('tech');

    for (const page of [archer.page, visitor.page, admin.page]) expect(pageErrors(page)).toEqual([]);
    await archer.context.close();
    await visitor.context.close();
    await admin.context.close();
  }, 240_000);
}
