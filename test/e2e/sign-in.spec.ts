import { closeBrowser, newPage } from './browser';
import { READER, seriousA11yViolations, signIn } from './flows';

describe('signing in and out (end to end)', () => {
  afterAll(closeBrowser);

  it('says clearly that the e-mail or password is wrong', async () => {
    const { context, page } = await newPage();
    try {
      await page.goto('/sign-in');
      await page.getByLabel('E-mail').fill(READER);
      await page.getByLabel('Password').fill('not-the-password');
      await page.getByRole('button', { name: 'Sign in', exact: true }).click();
      const alert = page.getByRole('alert');
      await alert.waitFor({ timeout: 15_000 });
      expect(await alert.textContent()).toContain('E-mail or password is wrong');
      expect(page.url()).toContain('/sign-in');
      expect(await seriousA11yViolations(page)).toEqual([]);
    } finally {
      await context.close();
    }
  }, 60_000);

  it('signs in, keeps the session over a reload, shows the account, and signs out', async () => {
    const { context, page } = await newPage();
    try {
      await page.goto('/account');
      await page.waitForURL(/\/sign-in\?returnUrl=%2Faccount/);

      await signIn(page, READER, undefined, '/account');
      await page.waitForURL(/\/account$/);
      await page.getByRole('heading', { name: 'Your account' }).waitFor();

      await page.reload();
      await page.getByRole('heading', { name: 'Your account' }).waitFor({ timeout: 15_000 });
      expect(await page.locator('nav[aria-label="Main"]').textContent()).toContain('Account');

      await page.getByRole('button', { name: /^Your account:/ }).click();
      await page.getByRole('menuitem', { name: 'Sign out' }).click();
      await page.waitForURL((url) => url.pathname === '/');
      await page.getByRole('link', { name: 'Sign in' }).waitFor();
      await page.goto('/account');
      await page.waitForURL(/\/sign-in/);
    } finally {
      await context.close();
    }
  }, 60_000);
});
