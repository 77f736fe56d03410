import type { Page } from 'playwright-core';

import { closeBrowser, newPage, screenshot } from './browser';
import { STEWARD, seriousA11yViolations, signIn, waitForChart } from './flows';

interface MainPage {
  readonly name: string;
  readonly url: string;
  readonly signedIn?: boolean;
  /** What shows that the page has finished loading. */
  readonly ready: (page: Page) => Promise<unknown>;
}

const MAIN_PAGES: readonly MainPage[] = [
  { name: 'home', url: '/', ready: (page) => page.getByText('Service status').waitFor() },
  { name: 'search', url: '/search?elements=C,H,O', ready: (page) => page.locator('table.kx-results-table tr.mat-mdc-row').first().waitFor() },
  {
    name: 'species',
    url: '/search?q=H2O',
    ready: async (page) => {
      await page.locator('table.kx-results-table tr.mat-mdc-row a', { hasText: /water/i }).first().click();
      await page.waitForURL(/\/species\//);
      // Water vapour: the phase with a heat-capacity polynomial, so the plots have curves to draw.
      const url = new URL(page.url());
      url.searchParams.set('phase', 'g');
      await page.goto(url.pathname + url.search);
      await page.locator('.kx-property-table tr.mat-mdc-row').first().waitFor();
      await waitForChart(page, 'kx-property-plots');
    },
  },
  {
    name: 'reactions',
    url: `/reactions?equation=${encodeURIComponent('CO(g) + H2O(g) -> CO2(g) + H2(g)')}&tMin=298.15&tMax=1500`,
    ready: async (page) => {
      await page.locator('.kx-reaction-table tr.mat-mdc-row').first().waitFor();
      await waitForChart(page);
    },
  },
  { name: 'sign-in', url: '/sign-in', ready: (page) => page.getByRole('heading', { name: 'Sign in' }).waitFor() },
  { name: 'account', url: '/account', signedIn: true, ready: (page) => page.getByRole('heading', { name: 'API keys' }).waitFor() },
];

describe('main pages at both widths in both themes (end to end)', () => {
  afterAll(closeBrowser);

  for (const width of [1280, 390]) {
    for (const colorScheme of ['light', 'dark'] as const) {
      it(`renders every main page at ${width} px in the ${colorScheme} theme without serious accessibility faults`, async () => {
        const { context, page } = await newPage({ width, height: width > 600 ? 900 : 844, colorScheme });
        try {
          for (const main of MAIN_PAGES) {
            if (main.signedIn) {
              await signIn(page, STEWARD, undefined, main.url);
            } else {
              await page.goto(main.url);
            }
            await main.ready(page);
            const overflow = await page.evaluate(() => {
              const root = (globalThis as unknown as { document: { documentElement: { scrollWidth: number; clientWidth: number } } }).document.documentElement;
              return root.scrollWidth - root.clientWidth;
            });
            expect(overflow).withContext(`${main.name} is no wider than the window`).toBeLessThanOrEqual(1);
            expect(await seriousA11yViolations(page)).withContext(main.name).toEqual([]);
            await screenshot(page, `${main.name}-${width}-${colorScheme}`);
          }
        } finally {
          await context.close();
        }
      }, 180_000);
    }
  }
});
