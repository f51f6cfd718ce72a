/**
 * The try page's downloads: with no account, the SVG tape and the PDF sheet
 * are POSTed to /api/try/* through apiFetch (components/try/save-posted-file.web.ts)
 * and saved by the browser under their file names.
 */
import fs from 'node:fs';
import { PHONE, newPage, pageErrors, stackForFile } from '../helpers/browser';

const stack = stackForFile();

it('downloads the try page’s SVG tape and PDF sheet', async () => {
  const { context, page } = await newPage(stack, PHONE);
  await page.goto('/try');
  await page.getByTestId('try-sight-radius').waitFor();
  await page.getByTestId('try-sight-radius').fill('820');
  await page.getByTestId('try-peep-height').fill('110');
  // Invented marks: 20 yd at 14.9 mm, 60 yd at 32.6 mm (the page's default distances).
  await page.getByTestId('try-near-reading').fill('14.9');
  await page.getByTestId('try-far-reading').fill('32.6');
  await page.getByTestId('tape-preview').waitFor();
  const [svg] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download SVG' }).click()]);
  expect(svg.suggestedFilename()).toBe('pinwright-tape.svg');
  expect(fs.readFileSync((await svg.path())!, 'utf8')).toContain('<svg');
  const [pdf] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download PDF' }).click()]);
  expect(pdf.suggestedFilename()).toBe('pinwright-sheet.pdf');
  expect(
    fs
      .readFileSync((await pdf.path())!)
      .subarray(0, 5)
      .toString(),
  ).toBe('%PDF-');
  expect(pageErrors(page)).toEqual([]);
  await context.close();
}, 120_000);
