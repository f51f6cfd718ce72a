/**
 * The technician's bench, as the people would use it: an archer shares a bow
 * with a technician; the technician's home is their clients and the bows
 * shared with them (not "Add your first bow"); they open the bow and add an
 * arrow build, which the archer then sees as added by the technician.
 * Screenshots at phone (390×844) and desktop (1280×800) size.
 */
import type { BrowserContext } from 'playwright-core';
import { Share, User } from '@/server/models';
import { CSRF } from '../helpers/api';
import { DESKTOP, PHONE, newPage, pageErrors, screenshot, signUpInContext, stackForFile } from '../helpers/browser';
import { bowBody, buildBody, knownMarks } from '../api/bow-fixtures';

const stack = stackForFile();

async function post(context: BrowserContext, path: string, data: unknown) {
  const res = await context.request.post(`${stack.baseUrl}${path}`, { headers: CSRF, data });
  if (res.status() !== 201) throw new Error(`${path}: ${res.status()} ${await res.text()}`);
  return res.json();
}

for (const size of [PHONE, DESKTOP]) {
  it(`shows a technician their clients' bows as home, and the build they add as theirs to the archer (${size.width}×${size.height})`, async () => {
    const tag = `${size.width}`;
    const archerName = `Runa Fellgate ${tag}`;
    const techName = `Corvin Ashdown ${tag}`;
    const nickname = `Hollow Creek slider ${tag}`;

    const archer = await newPage(stack, size);
    const archerAccount = await signUpInContext(archer.context, stack.baseUrl, archerName);
    const { bow } = await post(archer.context, '/api/bows', bowBody({ nickname }));
    const { build } = await post(archer.context, `/api/bows/${bow.id}/builds`, buildBody({ name: 'Archer heavy' }));
    await post(archer.context, `/api/bows/${bow.id}/sight-ins`, {
      buildId: build.id,
      date: '2026-11-20',
      placeLabel: 'Hollow Creek range',
      marks: knownMarks([20, 40, 60]),
    });

    const tech = await newPage(stack, size);
    const techAccount = await signUpInContext(tech.context, stack.baseUrl, techName);
    const techUser = (await User.findOne({ where: { email: techAccount.email } }))!;
    await techUser.update({ role: 'tech', lengthUnit: 'mm' });
    const archerUser = (await User.findOne({ where: { email: archerAccount.email } }))!;
    await Share.create({
      bowId: bow.id,
      archerId: archerUser.id,
      techId: techUser.id,
      invitedEmail: techAccount.email,
      state: 'active',
      acceptedAt: new Date(),
      revokedAt: null,
    });

    // Home: the clients and their bows, never "Add your first bow".
    await tech.page.goto('/');
    await tech.page.getByTestId('tech-bench').waitFor();
    await tech.page.getByTestId(`client-bow-${bow.id}`).waitFor();
    await tech.page.getByText(archerName).first().waitFor();
    expect(await tech.page.getByText(/add your first bow/i).count()).toBe(0);
    await screenshot(tech.page, 'technician-bench');

    // The technician opens the bow and adds a build: a new entry, attributed.
    await tech.page.getByTestId(`client-bow-${bow.id}`).click();
    await tech.page.waitForURL(new RegExp(`/bows/${bow.id}$`));
    await tech.page.getByTestId('add-build').click();
    await tech.page.waitForURL(new RegExp(`/bows/${bow.id}/builds/new$`));
    await tech.page.getByText(/shown to them as added by you/).waitFor();
    await tech.page.getByLabel('Build name', { exact: true }).fill('Shop test 480');
    await tech.page.getByLabel('Grains per inch', { exact: true }).fill('9.5');
    await tech.page.getByLabel('Cut length', { exact: true }).fill('730');
    await tech.page.getByLabel('Diameter', { exact: true }).fill('6.2');
    await tech.page.getByLabel('Point', { exact: true }).fill('100');
    await screenshot(tech.page, 'technician-new-build');
    const saved = tech.page.waitForResponse((res) => res.request().method() === 'POST' && res.url().endsWith(`/api/bows/${bow.id}/builds`));
    await tech.page.getByTestId('build-save').click();
    expect((await saved).status()).toBe(201);
    await tech.page.waitForURL(new RegExp(`/bows/${bow.id}$`));
    await tech.page.getByText('Shop test 480').first().waitFor();

    // The archer sees it on the bow, with who added it; their own build carries no note.
    await archer.page.goto(`/bows/${bow.id}`);
    const techRow = archer.page.locator('[data-testid^="build-row-"]', { hasText: 'Shop test 480' });
    await techRow.getByText(new RegExp(`added by ${techName}`)).waitFor();
    const ownRow = archer.page.locator('[data-testid^="build-row-"]', { hasText: 'Archer heavy' });
    expect(await ownRow.getByText(/added by/).count()).toBe(0);
    await screenshot(archer.page, 'technician-build-archer-view');

    expect(pageErrors(tech.page)).toEqual([]);
    expect(pageErrors(archer.page)).toEqual([]);
    await tech.context.close();
    await archer.context.close();
  }, 120_000);
}
