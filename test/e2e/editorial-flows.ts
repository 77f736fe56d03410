import { readFileSync } from 'node:fs';
import type { Download, Locator, Page } from 'playwright-core';

import { appUrl } from './browser';
import { DEMO_PASSWORD, seriousA11yViolations, signIn } from './flows';

/** The demo sign-ins of the editorial workflow (seeds-demo/demo-accounts.ts). */
export const DEMO = {
  reader: 'reader@kelvindex.test',
  steward: 'steward@kelvindex.test',
  reviewer: 'reviewer@kelvindex.test',
  reviewer2: 'reviewer2@kelvindex.test',
  editor: 'editor@kelvindex.test',
  admin: 'admin@kelvindex.test',
} as const;

export type DemoRole = keyof typeof DEMO;

/** Signs in as a demo role through the sign-in page, landing on `path`. */
export async function signInAs(page: Page, who: DemoRole, path = '/'): Promise<void> {
  await signIn(page, DEMO[who], DEMO_PASSWORD, path);
  await page.waitForURL((url) => url.pathname === path.split('?')[0], { timeout: 15_000 });
}

/** An access token for reading state through the API beside the browser (checks that nothing was written). */
export async function apiToken(who: DemoRole): Promise<string> {
  const response = await fetch(`${appUrl()}/api/v1/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: DEMO[who], password: DEMO_PASSWORD }),
  });
  if (!response.ok) {
    throw new Error(`sign-in of ${who} answered ${response.status}`);
  }
  return ((await response.json()) as { accessToken: string }).accessToken;
}

/** GET a JSON answer of the API, optionally as a signed-in user. */
export async function apiGet<T>(path: string, token?: string): Promise<T> {
  const response = await fetch(`${appUrl()}/api/v1${path}`, { headers: token ? { authorization: `Bearer ${token}` } : {} });
  if (!response.ok) {
    throw new Error(`GET ${path} answered ${response.status}`);
  }
  return (await response.json()) as T;
}

/** Fails with the violations' descriptions when axe-core finds a serious or critical fault on the page. */
export async function expectAccessible(page: Page, name: string): Promise<void> {
  expect(await seriousA11yViolations(page)).withContext(`accessibility of ${name}`).toEqual([]);
}

/** Picks `option` in the Material select labelled `label`. */
export async function choose(page: Page | Locator, label: string, option: string | RegExp): Promise<void> {
  await page.getByRole('combobox', { name: label }).click();
  const root = 'page' in page ? page.page() : page;
  await root.getByRole('option', { name: option }).first().click();
}

/** Types into an autocomplete field and picks the first option matching `option`. */
export async function autocomplete(scope: Page | Locator, label: string, text: string, option: RegExp): Promise<void> {
  const field = scope.getByRole('combobox', { name: label, exact: true });
  await field.fill(text);
  const root = 'page' in scope ? scope.page() : scope;
  await root.getByRole('option', { name: option }).first().click();
}

/** The workflow state shown in the page header. */
export function stateBadge(page: Page): Locator {
  return page.locator('kx-proposal-state').first();
}

/** Waits until the header shows `state` (e.g. "Submitted"). */
export async function expectState(page: Page, state: string): Promise<void> {
  await stateBadge(page).filter({ hasText: new RegExp(`^\\s*${state}\\s*$`) }).waitFor({ timeout: 15_000 });
}

/** The card of the first item of a proposal on the editor or review page. */
export function itemCard(page: Page, position = 1): Locator {
  return page.locator('article').filter({ has: page.locator('span', { hasText: new RegExp(`^${position}\\. `) }) }).first();
}

/** Text of a downloaded file. */
export async function downloadedText(download: Download): Promise<string> {
  const path = await download.path();
  if (!path) {
    throw new Error('the download was not saved');
  }
  return readFileSync(path, 'utf8');
}

/** What holds the keyboard focus: its tag, role, accessible name (aria-label or label text or text) and classes. */
export interface KeyboardTarget {
  readonly tag: string;
  readonly role: string;
  readonly name: string;
  readonly classes: string;
  readonly type: string;
}

export async function focusedTarget(page: Page): Promise<KeyboardTarget> {
  // Runs in the page; typed loosely because the e2e build has no DOM library.
  return page.evaluate(() => {
    type Element = {
      tagName: string;
      className: unknown;
      textContent: string | null;
      getAttribute(name: string): string | null;
      labels?: { textContent: string | null }[] | null;
    };
    const document = (globalThis as unknown as { document: { activeElement: Element | null; getElementById(id: string): Element | null } }).document;
    const element = document.activeElement;
    if (!element) {
      return { tag: '', role: '', name: '', classes: '', type: '' };
    }
    const labelledBy = element.getAttribute('aria-labelledby');
    const label =
      element.labels && element.labels.length > 0
        ? element.labels[0].textContent
        : labelledBy
          ? labelledBy
              .split(/\s+/)
              .map((id) => document.getElementById(id)?.textContent ?? '')
              .join(' ')
          : null;
    return {
      tag: element.tagName.toLowerCase(),
      role: element.getAttribute('role') ?? '',
      name: (element.getAttribute('aria-label') ?? label ?? element.textContent ?? '').replace(/\s+/g, ' ').replace('*', '').trim(),
      classes: typeof element.className === 'string' ? element.className : '',
      type: element.getAttribute('type') ?? '',
    };
  });
}

/** Presses Tab until `matches` holds for the focused element; fails after `limit` presses. */
export async function tabTo(page: Page, matches: (target: KeyboardTarget) => boolean, limit = 80): Promise<KeyboardTarget> {
  for (let presses = 0; presses < limit; presses++) {
    await page.keyboard.press('Tab');
    const target = await focusedTarget(page);
    if (matches(target)) {
      return target;
    }
  }
  throw new Error(`No element matched after ${limit} presses of Tab`);
}

/** A unique tag for this run, so a rerun against the same database never meets its own records. */
export function runTag(): string {
  return `${Date.now().toString(36)}${Math.floor(Math.random() * 1296).toString(36)}`;
}

/** Waits for the Angular app to have rendered the page's main heading. */
export async function heading(page: Page, name: string | RegExp): Promise<void> {
  await page.getByRole('heading', { level: 1, name }).waitFor({ timeout: 15_000 });
}

/** Polls `condition` every 100 ms until it holds; fails with `what` after `timeoutMs`. */
export async function waitUntil(condition: () => Promise<boolean>, what: string, timeoutMs = 15_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await condition()) {
      return;
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`Timed out waiting until ${what}`);
}
