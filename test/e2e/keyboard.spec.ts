import { closeBrowser, newPage } from './browser';
import { DEMO_PASSWORD, STEWARD, focused, tabUntil } from './flows';

describe('keyboard-only use (end to end)', () => {
  afterAll(closeBrowser);

  it('skips to the content, searches, and opens a species without a mouse', async () => {
    const { context, page } = await newPage();
    try {
      await page.goto('/search');
      await page.keyboard.press('Tab');
      expect((await focused(page)).text).toBe('Skip to content');
      await page.keyboard.press('Enter');
      expect((await focused(page)).tag).toBe('main');

      await tabUntil(page, (element) => element.tag === 'input' && element.label === 'q');
      await page.keyboard.type('H2O');
      await page.keyboard.press('Escape');
      await page.keyboard.press('Enter');
      await page.waitForURL(/q=H2O/);
      await page.locator('table.kx-results-table tr.mat-mdc-row').first().waitFor({ timeout: 15_000 });

      const link = await tabUntil(page, (element) => element.tag === 'a' && /water/i.test(element.text), 80);
      expect(link.focusVisible).withContext('focus on the result link is visible').toBeTrue();
      await page.keyboard.press('Enter');
      await page.waitForURL(/\/species\//);
      await page.getByRole('heading', { level: 1 }).waitFor();

      const cite = await tabUntil(page, (element) => element.tag === 'button' && element.label.startsWith('Cite the recommended'), 80);
      expect(cite.focusVisible).withContext('focus on the cite button is visible').toBeTrue();
      await page.keyboard.press('Enter');
      await page.getByRole('dialog').waitFor();
      await page.keyboard.press('Escape');
      await page.getByRole('dialog').waitFor({ state: 'detached' });
    } finally {
      await context.close();
    }
  }, 90_000);

  it('signs in and evaluates a reaction without a mouse', async () => {
    const { context, page } = await newPage();
    try {
      await page.goto('/sign-in?returnUrl=%2Freactions');
      await tabUntil(page, (element) => element.label === 'email');
      await page.keyboard.type(STEWARD);
      await page.keyboard.press('Tab');
      await page.keyboard.type(DEMO_PASSWORD);
      await page.keyboard.press('Enter');
      await page.waitForURL(/\/reactions/, { timeout: 15_000 });

      const equation = await tabUntil(page, (element) => element.label === 'equation');
      expect(equation.focusVisible).withContext('focus on the equation field is visible').toBeTrue();
      await page.keyboard.type('H2(g) + 0.5 O2(g) -> H2O(g)');
      await page.keyboard.press('Enter');
      await page.waitForURL(/equation=/);
      await page.locator('.kx-reaction-table tr.mat-mdc-row').first().waitFor({ timeout: 15_000 });

      await tabUntil(page, (element) => element.tag === 'input' && element.label === 'name', 120);
      await page.keyboard.press('Control+A');
      await page.keyboard.type('Hydrogen oxidation, keyboard');
      await page.keyboard.press('Enter');
      await page.getByText('Saved. Find it under').waitFor({ timeout: 15_000 });
    } finally {
      await context.close();
    }
  }, 90_000);
});
