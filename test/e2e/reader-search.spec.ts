import { readFileSync } from 'node:fs';

import { closeBrowser, newPage, screenshot } from './browser';
import { seriousA11yViolations, waitForChart } from './flows';

const RESULT_ROWS = 'table.kx-results-table tr.mat-mdc-row';

describe('a reader looks up values (end to end)', () => {
  afterAll(closeBrowser);

  it('searches by formula, opens the species, reads a plot and exports the table as CSV', async () => {
    const { context, page } = await newPage();
    try {
      await page.goto('/search');
      await page.getByLabel('Formula, name or identifier').fill('CH4');
      await page.getByRole('button', { name: 'Search', exact: true }).click();
      await page.waitForURL(/\/search\?q=CH4/);
      await page.locator(RESULT_ROWS).first().waitFor({ timeout: 15_000 });
      expect(await page.locator(RESULT_ROWS).allTextContents()).toContain(jasmine.stringMatching(/methane/i));
      expect(await seriousA11yViolations(page)).toEqual([]);

      // The whole search is in the URL: opening it again gives the same table.
      const shared = page.url();
      await page.goto(shared);
      await page.locator(RESULT_ROWS).first().waitFor();

      await page.goto('/search?q=N2');
      await page.locator(RESULT_ROWS).first().waitFor();
      await page.locator(`${RESULT_ROWS} a`, { hasText: /nitrogen/i }).first().click();
      await page.waitForURL(/\/species\//);
      await page.getByRole('heading', { level: 1 }).waitFor();
      expect(await page.locator('.kx-identity').textContent()).toContain('g/mol');

      await waitForChart(page, 'kx-property-plots');
      expect(await page.locator('kx-property-plots canvas').count()).toBe(4);
      const plotted = await page.locator('kx-property-plots canvas').first().evaluate((canvas) => {
        const c = canvas as unknown as { width: number; height: number; getContext(kind: '2d'): { getImageData(x: number, y: number, w: number, h: number): { data: Uint8ClampedArray } } };
        const pixels = c.getContext('2d').getImageData(0, 0, c.width, c.height).data;
        let drawn = 0;
        for (let index = 3; index < pixels.length; index += 4) {
          if (pixels[index] > 0) drawn++;
        }
        return drawn;
      });
      expect(plotted).toBeGreaterThan(1000);
      expect(await page.locator('kx-property-plots').textContent()).toContain('valid from 200 K to 6000 K');

      await page.locator('.kx-property-table tr.mat-mdc-row').first().waitFor();
      const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download CSV' }).click()]);
      expect(download.suggestedFilename()).toMatch(/^kelvindex-N2-g-.+\.csv$/);
      const csv = readFileSync((await download.path())!, 'utf8');
      expect(csv.split('\r\n')[0]).toContain('T (K)');
      expect(csv.split('\r\n')[1]).toContain('298.15');
      expect(await seriousA11yViolations(page)).toEqual([]);
    } finally {
      await context.close();
    }
  }, 60_000);

  it('searches by elements, "only these" narrowing "contain these"', async () => {
    const { context, page } = await newPage();
    try {
      await page.goto('/search?elements=C,H,O');
      await page.locator(RESULT_ROWS).first().waitFor({ timeout: 15_000 });
      const containing = await page.locator(`${RESULT_ROWS} td:first-child`).allTextContents();
      expect(containing.join(' ')).toMatch(/methanol/i);

      await page.getByRole('radio', { name: 'only these' }).click();
      await page.waitForURL(/elementsMode=only/);
      await page.locator(RESULT_ROWS).first().waitFor();
      const only = (await page.locator(`${RESULT_ROWS} td:first-child`).allTextContents()).join(' ');
      expect(only).toMatch(/ethanol/i);
      expect(only).not.toMatch(/ammonia|nitrogen/i);

      await page.getByRole('textbox', { name: 'Elements' }).fill('C, O');
      await page.waitForURL(/elements=C,O/);
      await page.locator(RESULT_ROWS).first().waitFor();
      expect((await page.locator(`${RESULT_ROWS} td:nth-child(2)`).allTextContents()).map((text) => text.trim())).toEqual(
        jasmine.arrayContaining(['CO', 'CO2']),
      );
    } finally {
      await context.close();
    }
  }, 60_000);

  it('prints how fast the search page becomes interactive', async () => {
    const { context, page } = await newPage();
    try {
      await page.goto('/search?q=H2O', { waitUntil: 'commit' });
      await page.locator(RESULT_ROWS).first().waitFor({ timeout: 15_000 });
      const timing = await page.evaluate(() => {
        const performance = (globalThis as unknown as {
          performance: { now(): number; getEntriesByType(type: string): { domInteractive: number; domContentLoadedEventEnd: number; loadEventEnd: number }[] };
        }).performance;
        const [navigation] = performance.getEntriesByType('navigation');
        return {
          domInteractive: navigation.domInteractive,
          domContentLoaded: navigation.domContentLoadedEventEnd,
          loadEventEnd: navigation.loadEventEnd,
          resultsShown: performance.now(),
        };
      });
      console.log(
        `search page timing (ms from navigation start): domInteractive ${timing.domInteractive.toFixed(0)}, ` +
          `DOMContentLoaded ${timing.domContentLoaded.toFixed(0)}, loadEventEnd ${timing.loadEventEnd.toFixed(0)}, ` +
          `results table shown ${timing.resultsShown.toFixed(0)} (target: interactive within 1500)`,
      );
      expect(timing.domInteractive).toBeGreaterThan(0);
      expect(timing.resultsShown).toBeGreaterThanOrEqual(timing.domInteractive);
      await screenshot(page, 'search-timing-1280-light');
    } finally {
      await context.close();
    }
  }, 60_000);
});
