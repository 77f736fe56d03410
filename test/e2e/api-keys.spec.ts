import { closeBrowser, newPage } from './browser';
import { STEWARD, seriousA11yViolations, signIn } from './flows';

describe('a user keeps API keys for a downstream tool (end to end)', () => {
  afterAll(closeBrowser);

  it('creates a key, copies its secret, reads species with it, and revokes it', async () => {
    const { context, page } = await newPage();
    try {
      await context.grantPermissions(['clipboard-read', 'clipboard-write']);
      await signIn(page, STEWARD, undefined, '/account');
      await page.getByRole('heading', { name: 'API keys' }).waitFor({ timeout: 15_000 });

      const name = `e2e tool ${Date.now()}`;
      await page.getByLabel('Key name').fill(name);
      await page.getByRole('button', { name: 'Create key' }).click();
      const secret = (await page.locator('.kx-secret').textContent({ timeout: 15_000 }))!.trim();
      expect(secret.length).toBeGreaterThan(20);
      await page.getByRole('button', { name: 'Copy key' }).click();
      await page.getByText('Copied to the clipboard.').waitFor();
      expect(await seriousA11yViolations(page)).toEqual([]);

      const answer = await page.request.get('/api/v1/species?q=H2O', { headers: { 'X-API-Key': secret } });
      expect(answer.status()).toBe(200);
      const body = (await answer.json()) as { items: { formula: string }[] };
      expect(body.items.map((item) => item.formula)).toContain('H2O');

      await page.getByRole('button', { name: 'I have stored it' }).click();
      await page.getByRole('button', { name: `Revoke key ${name}` }).click();
      await page.getByRole('button', { name: 'Revoke key', exact: true }).click();
      await page.getByRole('row', { name: new RegExp(name) }).getByText('revoked').waitFor({ timeout: 15_000 });

      // A revoked key is refused outright, not treated as an anonymous reader.
      const refused = await page.request.get('/api/v1/species?q=H2O', { headers: { 'X-API-Key': secret } });
      expect(refused.status()).toBe(401);
    } finally {
      await context.close();
    }
  }, 60_000);
});
