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
import { closeDatabase } from '@/server/db';
import { uniqueEmail } from './api';
import { chromiumOptions } from './chromium';

export { chromiumOptions };

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
  const browser = await chromium.launch(chromiumOptions);
  return {
    baseUrl: `http://127.0.0.1:${port}`,
    browser,
    close: async () => {
      await browser.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await closeDatabase();
    },
  };
}

/** A fresh browser context (own cookies) with a page at phone or desktop size. */
export async function newPage(
  stack: Stack,
  size: { width: number; height: number } = PHONE,
): Promise<{ context: BrowserContext; page: Page }> {
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

/**
 * Starts the stack before the file's tests (60 s allowed) and closes it after
 * them; returns the stack, filled in once beforeAll has run.
 * Example: `const stack = stackForFile();` then `newPage(stack)` inside a test
 */
export function stackForFile(): Stack {
  const stack = {} as Stack;
  beforeAll(async () => {
    Object.assign(stack, await startStack());
  }, 60_000);
  afterAll(async () => {
    await stack.close?.();
  });
  return stack;
}

export interface FullScreenshotOptions {
  /** Tallest window (px) the full-length shot may use; default no limit. */
  maxHeightPx?: number;
  /** Wait (ms) after making the window tall, before the shot. */
  settleMs: number;
  /** Wait (ms) after restoring the window. */
  restoreMs: number;
  /** Also save a page taller than `whenTallerThanPx` in parts of `heightPx` (<name>-full-<width>w-part<n>.png). */
  parts?: { heightPx: number; whenTallerThanPx: number };
}

/**
 * The page at its viewport size (`screenshot`), and when the app's scroll
 * container holds more, its whole length too (<name>-full-<width>w.png): the
 * window is made as tall as the content for one shot, then restored.
 * Example: `await fullScreenshot(page, 'bench', { settleMs: 200, restoreMs: 100 })`
 */
export async function fullScreenshot(page: Page, name: string, options: FullScreenshotOptions): Promise<void> {
  await screenshot(page, name);
  const size = page.viewportSize()!;
  const extra = await page.evaluate(() => {
    let most = 0;
    for (const el of Array.from(document.querySelectorAll('div'))) {
      const overflow = getComputedStyle(el).overflowY;
      if ((overflow === 'auto' || overflow === 'scroll') && el.scrollHeight > el.clientHeight + 1)
        most = Math.max(most, el.scrollHeight - el.clientHeight);
    }
    return most;
  });
  if (extra <= 0) return;
  const height = Math.min(size.height + extra, options.maxHeightPx ?? Infinity);
  await page.setViewportSize({ width: size.width, height });
  await page.waitForTimeout(options.settleMs);
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}-full-${size.width}w.png`) });
  const parts = options.parts;
  if (parts) {
    for (let top = 0, part = 1; top < height && height > parts.whenTallerThanPx; top += parts.heightPx, part += 1) {
      await page.screenshot({
        path: path.join(SCREENSHOT_DIR, `${name}-full-${size.width}w-part${part}.png`),
        clip: { x: 0, y: top, width: size.width, height: Math.min(parts.heightPx, height - top) },
      });
    }
  }
  await page.setViewportSize(size);
  await page.waitForTimeout(options.restoreMs);
}
