import { closeBrowser, newPage, screenshot } from './browser';

describe('home page (end to end)', () => {
  afterAll(closeBrowser);

  it('shows the API health reported by the served app', async () => {
    const { context, page } = await newPage();
    try {
      await page.goto('/');
      await page.getByText('the API and its database are up').waitFor({ timeout: 15_000 });
      expect(await page.title()).toContain('Kelvindex');
      await screenshot(page, 'home-1280-light');
    } finally {
      await context.close();
    }
  });

  it('serves deep links to the client and keeps unknown API paths as JSON 404s', async () => {
    const { context, page } = await newPage();
    try {
      const deep = await page.goto('/some/client/route');
      expect(deep?.status()).toBe(200);
      const api = await page.request.get('/api/v1/nothing-here');
      expect(api.status()).toBe(404);
      expect((await api.json()).error).toBe('not_found');
    } finally {
      await context.close();
    }
  });
});
