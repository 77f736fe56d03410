import { closeBrowser, newPage } from './browser';
import { STEWARD, seriousA11yViolations, signIn, waitForChart } from './flows';

const EQUATION = 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)';

describe('an engineer evaluates a reaction (end to end)', () => {
  afterAll(closeBrowser);

  it('checks the equation live, evaluates it over a range, and saves it to the account', async () => {
    const { context, page } = await newPage();
    try {
      await signIn(page, STEWARD, undefined, '/reactions');
      await page.waitForURL(/\/reactions/);

      await page.getByRole('textbox', { name: 'Equation' }).fill('CH4(g) + O2(g) -> CO2(g) + H2O(g)');
      await page.locator('#equation-check').getByText('Balanced').waitFor({ timeout: 15_000 });
      expect(await page.locator('.kx-terms li').count()).toBe(4);

      await page.getByRole('textbox', { name: 'Equation' }).fill(EQUATION);
      await page.getByLabel('From (K)').fill('298.15');
      await page.getByLabel('To (K)').fill('1500');
      await page.getByLabel('Step (K)').fill('100');
      await page.getByRole('button', { name: 'Evaluate' }).click();
      await page.waitForURL(/equation=/);

      const rows = page.locator('.kx-reaction-table tr.mat-mdc-row');
      await rows.first().waitFor({ timeout: 15_000 });
      // 298.15 K, then 400 K to 1500 K every 100 K.
      expect(await rows.count()).toBe(13);
      const first = (await rows.first().locator('td').allTextContents()).map((text) => text.trim());
      expect(first[0]).toBe('298.15');
      // JANAF 1998 / CODATA 1989: ΔrH°(298.15 K) = −802.3 kJ/mol for methane burning to water vapour;
      // the ± part shows only where every input states an uncertainty.
      expect(first[1]).toMatch(/^-80[12]\.\d+( ± .+)?$/);
      expect(await page.locator('kx-caution-notice').first().textContent()).toContain('Screening estimate only.');
      await waitForChart(page);
      expect(await page.locator('kx-line-chart canvas').count()).toBe(2);

      const rise = page.locator('kx-adiabatic-rise-form');
      await rise.getByLabel('Mass heated (kg)').fill('100');
      await rise.getByRole('button', { name: 'Estimate the rise' }).click();
      await rise.getByRole('status').waitFor();
      expect(await rise.getByRole('status').textContent()).toContain('K');
      expect(await rise.locator('kx-caution-notice').count()).toBe(1);

      await page.getByLabel('Name', { exact: true }).fill('Methane combustion, e2e');
      await page.getByRole('button', { name: 'Save to my account' }).click();
      await page.getByText('Saved. Find it under').waitFor();
      expect(await seriousA11yViolations(page)).toEqual([]);

      await page.goto('/account');
      const saved = page.getByRole('link', { name: 'Methane combustion, e2e' }).first();
      await saved.waitFor({ timeout: 15_000 });
      await saved.click();
      await page.waitForURL(/\/reactions\?equation=/);
      await page.locator('.kx-reaction-table tr.mat-mdc-row').first().waitFor({ timeout: 15_000 });
      expect(await page.getByRole('textbox', { name: 'Equation' }).inputValue()).toBe(EQUATION);
    } finally {
      await context.close();
    }
  }, 90_000);
});
