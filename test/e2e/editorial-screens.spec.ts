import type { Page } from 'playwright-core';

import { closeBrowser, newPage, screenshot } from './browser';
import { DemoRole, apiGet, apiToken, expectAccessible, heading, signInAs } from './editorial-flows';

interface EditorialPage {
  readonly name: string;
  readonly url: string;
  /** What shows that the page has finished loading. */
  readonly ready: (page: Page) => Promise<unknown>;
}

/** Every editorial page by the role that works on it; proposal addresses come from the demo data. */
async function editorialPages(): Promise<Record<DemoRole, EditorialPage[]>> {
  const steward = await apiToken('steward');
  const editor = await apiToken('editor');
  const draft = (await apiGet<{ items: { id: string }[] }>('/proposals?mine=true&state=draft&sort=createdAt&limit=1', steward)).items[0];
  const inReview = (await apiGet<{ items: { id: string }[] }>('/proposals?state=in_review&sort=createdAt&limit=1', editor)).items[0];
  const releases = (await apiGet<{ items: { label: string; status: string }[] }>('/releases', editor)).items;
  const preparing = releases.find((r) => r.status === 'preparing');
  const published = releases.find((r) => r.status === 'published')!;
  const table = (page: Page) => page.locator('main table tbody tr').first().waitFor({ timeout: 15_000 });
  return {
    steward: [
      { name: 'proposals', url: '/proposals', ready: table },
      { name: 'proposal-editor', url: `/proposals/${draft.id}`, ready: (page) => page.getByRole('heading', { name: 'Add an item' }).waitFor() },
      { name: 'import', url: '/imports', ready: (page) => heading(page, 'Import values from a file') },
    ],
    reviewer: [
      { name: 'review-queue', url: '/reviews', ready: table },
      { name: 'review', url: `/reviews/${inReview.id}`, ready: (page) => page.getByRole('heading', { name: 'Your decision' }).waitFor() },
    ],
    editor: [
      { name: 'releases', url: '/releases', ready: (page) => page.getByText(/added,\s+\d+ revised/).waitFor() },
      { name: 'release', url: `/releases/${published.label}`, ready: (page) => page.getByRole('heading', { name: 'Change log' }).waitFor() },
      ...(preparing
        ? [{ name: 'release-workspace', url: `/releases/${preparing.label}/edit`, ready: (page: Page) => page.getByRole('heading', { name: 'Change log against', exact: false }).waitFor() }]
        : []),
      { name: 'sources', url: '/sources', ready: table },
    ],
    admin: [
      { name: 'admin-users', url: '/admin/users', ready: table },
      { name: 'admin-api-keys', url: '/admin/api-keys', ready: (page) => heading(page, 'API keys') },
      { name: 'admin-audit', url: '/admin/audit', ready: table },
      { name: 'admin-outbox', url: '/admin/outbox', ready: (page) => heading(page, 'Outbox') },
    ],
    reader: [],
    reviewer2: [],
  };
}

describe('editorial pages at both widths in both themes (end to end)', () => {
  afterAll(closeBrowser);

  for (const width of [1280, 390]) {
    for (const colorScheme of ['light', 'dark'] as const) {
      it(`renders every editorial page at ${width} px in the ${colorScheme} theme without serious accessibility faults`, async () => {
        const pages = await editorialPages();
        for (const [who, list] of Object.entries(pages) as [DemoRole, EditorialPage[]][]) {
          if (list.length === 0) {
            continue;
          }
          const { context, page } = await newPage({ width, height: width > 600 ? 900 : 844, colorScheme });
          try {
            await signInAs(page, who, list[0].url);
            for (const editorial of list) {
              if (page.url() !== new URL(editorial.url, page.url()).href) {
                await page.goto(editorial.url);
              }
              await editorial.ready(page);
              const overflow = await page.evaluate(() => {
                const root = (globalThis as unknown as { document: { documentElement: { scrollWidth: number; clientWidth: number } } }).document.documentElement;
                return root.scrollWidth - root.clientWidth;
              });
              expect(overflow).withContext(`${editorial.name} is no wider than the window`).toBeLessThanOrEqual(1);
              await expectAccessible(page, `${editorial.name} at ${width} px, ${colorScheme}`);
              await screenshot(page, `editorial-${editorial.name}-${width}-${colorScheme}`);
            }
          } finally {
            await context.close();
          }
        }
      }, 240_000);
    }
  }
});
