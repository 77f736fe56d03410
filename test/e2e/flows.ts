import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';

/** Demo sign-ins from seeds-demo/demo-accounts.ts. */
export const DEMO_PASSWORD = 'kelvindex-demo';
export const STEWARD = 'steward@kelvindex.test';
export const READER = 'reader@kelvindex.test';

const AXE_SCRIPT = path.resolve('node_modules/axe-core/axe.min.js');
let axeSource: string | undefined;

interface AxeViolation {
  id: string;
  impact: 'minor' | 'moderate' | 'serious' | 'critical' | null;
  help: string;
  nodes: { target: string[] }[];
}

/**
 * Runs axe-core on the page as it is now and returns the serious and critical violations, each
 * as one readable line, so that a failing expectation says what to fix.
 */
export async function seriousA11yViolations(page: Page): Promise<string[]> {
  // Evaluated through the browser's debugging protocol rather than a <script> tag, so the app's
  // Content-Security-Policy stays fully in force while axe runs.
  axeSource ??= readFileSync(AXE_SCRIPT, 'utf8');
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const axe = (globalThis as unknown as { axe: { run: (options: object) => Promise<{ violations: unknown[] }> } }).axe;
    const result = await axe.run({ resultTypes: ['violations'] });
    return result.violations;
  });
  return (violations as AxeViolation[])
    .filter((violation) => violation.impact === 'serious' || violation.impact === 'critical')
    .map((violation) => `${violation.impact} ${violation.id}: ${violation.help} at ${violation.nodes.map((node) => node.target.join(' ')).join(', ')}`);
}

/** Signs in through the sign-in page and waits until the app has left it. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD, returnUrl = '/'): Promise<void> {
  await page.goto(`/sign-in?returnUrl=${encodeURIComponent(returnUrl)}`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: 15_000 });
}

/** What has the keyboard focus, for keyboard-only flows, and whether the focus can be seen. */
export interface FocusedElement {
  readonly tag: string;
  /** aria-label, or the form control name of an input. */
  readonly label: string;
  readonly text: string;
  /** An outline, a focus ring (box-shadow), Material's focus indicator or a focused form field shows it. */
  readonly focusVisible: boolean;
}

export async function focused(page: Page): Promise<FocusedElement> {
  // Runs in the page; typed loosely because the e2e build has no DOM library.
  return page.evaluate(() => {
    type Styles = { outlineStyle: string; outlineWidth: string; boxShadow: string; borderStyle: string; display: string; content: string };
    type Element = {
      tagName: string;
      textContent: string | null;
      getAttribute(name: string): string | null;
      closest(selector: string): unknown;
      querySelector(selector: string): Element | null;
    };
    const global = globalThis as unknown as { document: { activeElement: Element | null }; getComputedStyle(element: Element, pseudo?: string): Styles };
    const element = global.document.activeElement;
    if (!element) {
      return { tag: '', label: '', text: '', focusVisible: false };
    }
    const own = global.getComputedStyle(element);
    // Material draws its focus ring on ::before of the element or of its .mat-focus-indicator child.
    const ringShown = (host: Element | null) => {
      if (!host) return false;
      const ring = global.getComputedStyle(host, '::before');
      return ring.display !== 'none' && ring.borderStyle !== 'none' && ring.content !== 'none';
    };
    const focusVisible =
      (own.outlineStyle !== 'none' && own.outlineWidth !== '0px') ||
      own.boxShadow !== 'none' ||
      ringShown(element) ||
      ringShown(element.querySelector(':scope > .mat-focus-indicator')) ||
      element.closest('.mat-focused') !== null;
    return {
      tag: element.tagName.toLowerCase(),
      label: element.getAttribute('aria-label') ?? element.getAttribute('formcontrolname') ?? '',
      text: (element.textContent ?? '').trim(),
      focusVisible,
    };
  });
}

/** Presses Tab until `matches` holds for the focused element; fails after `limit` presses. */
export async function tabUntil(
  page: Page,
  matches: (element: FocusedElement) => boolean,
  limit = 60,
): Promise<FocusedElement> {
  for (let presses = 0; presses < limit; presses++) {
    await page.keyboard.press('Tab');
    const element = await focused(page);
    if (matches(element)) {
      return element;
    }
  }
  throw new Error(`No element matched after ${limit} presses of Tab`);
}

/** Waits until a Chart.js plot in the page has been drawn (the chart marks itself ready). */
export async function waitForChart(page: Page, within = 'body'): Promise<void> {
  await page.locator(`${within} kx-line-chart[data-chart-state="ready"] canvas`).first().waitFor({ timeout: 15_000 });
}
