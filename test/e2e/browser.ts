import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import path from 'node:path';

/** Debian's Chromium, driven by playwright-core; no browser is ever downloaded. */
const CHROMIUM = process.env.CHROME_BIN ?? '/usr/bin/chromium';
const FLAGS = ['--disable-gpu', '--disable-dev-shm-usage', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'];

let browser: Browser | undefined;

export async function launchBrowser(): Promise<Browser> {
  browser ??= await chromium.launch({ executablePath: CHROMIUM, args: FLAGS, headless: true });
  return browser;
}

export async function closeBrowser(): Promise<void> {
  await browser?.close();
  browser = undefined;
}

export const appUrl = (): string => process.env.APP_URL ?? 'http://127.0.0.1:4300';

export async function newPage(options: { width?: number; height?: number; colorScheme?: 'light' | 'dark' } = {}): Promise<{ context: BrowserContext; page: Page }> {
  const b = await launchBrowser();
  const context = await b.newContext({
    viewport: { width: options.width ?? 1280, height: options.height ?? 900 },
    colorScheme: options.colorScheme ?? 'light',
    baseURL: appUrl(),
  });
  const page = await context.newPage();
  return { context, page };
}

/** Screenshots land in test-output/screenshots (git-ignored) for a person to look at. */
export async function screenshot(page: Page, name: string): Promise<void> {
  const dir = path.resolve('test-output/screenshots');
  mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}
