/**
 * Browser test harness: the real server (in-process, on a free port, real
 * MariaDB) serving the exported web app from dist/, driven by Debian's
 * Chromium through playwright-core. Never `playwright install`.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { createApp } from '@/server/app';
import { sequelize } from '@/server/db';
import { uniqueEmail } from './api';

export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1280, height: 800 };
export const SCREENSHOT_DIR = path.resolve(__dirname, '../artifacts/screenshots');

export type Stack = { baseUrl: string; browser: Browser; close: () => Promise<void> };

/** Start the app on 127.0.0.1 (free port) and a headless Chromium. */
export async function startStack(): Promise<Stack> {
  if (!fs.existsSync(path.resolve(__dirname, '../../dist/index.html'))) {
    throw new Error('dist/ has no web export: run `npm test` (it builds it) or `npm run export:web`');
  }
  const app = createApp({ sessionExpiryTimer: false });
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    baseUrl: `http://127.0.0.1:${port}`,
    browser,
    close: async () => {
      await browser.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await sequelize.close();
    },
  };
}

/** A fresh browser context (own cookies) with a page at phone or desktop size. */
export async function newPage(stack: Stack, size: { width: number; height: number } = PHONE): Promise<{ context: BrowserContext; page: Page }> {
  const context = await stack.browser.newContext({ viewport: size, baseURL: stack.baseUrl, acceptDownloads: true });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('pageerror', (err) => problems.push(String(err)));
  (page as Page & { problems?: string[] }).problems = problems;
  return { context, page };
}

/** Uncaught page errors seen so far (tests assert there are none). */
export function pageErrors(page: Page): string[] {
  return (page as Page & { problems?: string[] }).problems ?? [];
}

/** Save a screenshot under tests/artifacts/screenshots/<name>-<width>x<height>.png. */
export async function screenshot(page: Page, name: string): Promise<string> {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const size = page.viewportSize();
  const file = path.join(SCREENSHOT_DIR, `${name}-${size?.width}x${size?.height}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/** Sign up through the API inside the page's context, so the page shares the session cookie. */
export async function signUpInContext(context: BrowserContext, baseUrl: string, name = 'Browser Archer') {
  const email = uniqueEmail('browser');
  const password = 'correct horse battery';
  const res = await context.request.post(`${baseUrl}/api/auth/sign-up`, {
    headers: { 'X-Pinwright-Csrf': '1' },
    data: { name, email, password },
  });
  if (res.status() !== 201) throw new Error(`sign-up failed: ${res.status()} ${await res.text()}`);
  return { email, password };
}
