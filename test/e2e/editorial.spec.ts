import type { BrowserContext, Page } from 'playwright-core';

import { closeBrowser, newPage, screenshot } from './browser';
import { signIn } from './flows';
import {
  apiGet,
  apiToken,
  autocomplete,
  choose,
  downloadedText,
  expectAccessible,
  expectState,
  heading,
  itemCard,
  runTag,
  signInAs,
  waitUntil,
  DemoRole,
} from './editorial-flows';

// The whole editorial cycle, each step as its demo role, in order (the suite runs unshuffled):
// a steward proposes a new ΔfH° of propan-1-ol (l) with a BibTeX source and an evidence file; a
// reviewer asks for changes; the steward revises; a second reviewer approves; the editor puts it
// into 2027.1, recommends it over the older value and publishes; the species page then shows both
// releases' values; the reader, who watches propan-1-ol, got an e-mail. The numbers and the source
// are invented for the demo scenario, like the rest of it.
describe('editorial workflow (end to end)', () => {
  const tag = runTag();
  const title = `Propan-1-ol (l): ΔfH° from combustion series TC-04 (${tag})`;
  const bibtex = `@article{tc04-${tag},
  author = {Okafor, Tomasz and Marchetti, Ines},
  title = {Combustion calorimetry of propan-1-ol, series TC-04 (invented demo report ${tag})},
  journal = {Quillmere Process Chemicals Internal Reports},
  year = {2027},
  doi = {10.5555/kx-e2e-${tag}}
}`;
  let proposalPath = '';
  let sourceKey = '';
  const contexts: BrowserContext[] = [];

  async function pageAs(who: DemoRole | null, path: string): Promise<Page> {
    const { context, page } = await newPage();
    contexts.push(context);
    if (who) {
      await signInAs(page, who, path);
    } else {
      await page.goto(path);
    }
    return page;
  }

  afterEach(async () => {
    for (const context of contexts.splice(0)) {
      await context.close();
    }
  });
  afterAll(closeBrowser);

  it('a steward creates a proposal with an imported BibTeX source and an uploaded evidence file, and submits it', async () => {
    const page = await pageAs('steward', '/proposals');
    await heading(page, 'Your proposals');
    await expectAccessible(page, 'your proposals');

    await page.getByRole('textbox', { name: 'Title', exact: true }).fill(title);
    await page.getByRole('button', { name: 'Start proposal' }).click();
    await page.waitForURL(/\/proposals\/[0-9a-f-]{36}$/);
    proposalPath = new URL(page.url()).pathname;
    await heading(page, title);

    await page.getByRole('radio', { name: 'Value', exact: true }).click();
    await autocomplete(page, 'Species', 'propan-1-ol', /^propan-1-ol/);
    await page.getByRole('combobox', { name: 'Phase' }).filter({ hasText: 'l' }).waitFor();
    await page.getByText('Values already in release').waitFor();
    await page.getByRole('textbox', { name: 'Value', exact: true }).fill('-302.6');
    await page.getByRole('textbox', { name: 'Uncertainty (optional)' }).fill('0.4');
    await choose(page, 'Method', 'measured');

    await page.getByRole('button', { name: 'Add a source' }).click();
    await page.getByRole('textbox', { name: 'BibTeX or RIS entries' }).fill(bibtex);
    await page.getByRole('button', { name: 'Import', exact: true }).click();
    const source = page.getByRole('combobox', { name: 'Source', exact: true });
    await waitUntil(async () => (await source.inputValue()).includes(' — '), 'the imported source is chosen');
    sourceKey = (await source.inputValue()).split(' — ')[0];
    expect(sourceKey).withContext('the imported source is chosen').toMatch(/^okafor-2027/);
    await page.getByRole('textbox', { name: 'Where in the source (optional)' }).fill('Table 2');
    await page.getByRole('button', { name: 'Add value' }).click();

    const card = itemCard(page);
    await card.getByRole('heading', { name: /ΔfH°\(l\) of propan-1-ol/ }).waitFor();
    await card.locator('input[type=file]').setInputFiles({
      name: `tc04-runs-${tag}.csv`,
      mimeType: 'text/csv',
      buffer: Buffer.from('run,sample mass / g,energy / J\n1,0.81230,27531.2\n2,0.80904,27419.9\n3,0.81562,27642.0\n'),
    });
    await card.getByRole('button', { name: 'Upload' }).click();
    await card.getByRole('button', { name: `Download tc04-runs-${tag}.csv` }).waitFor();
    await expectAccessible(page, 'the proposal editor');
    await screenshot(page, 'editorial-proposal-draft-1280-light');

    await page.getByRole('button', { name: 'Submit for review' }).click();
    await expectState(page, 'Submitted');
    await card.getByText(/source-agreement/).first().waitFor();

    // The author sees the review page, with the four-eyes rule and no decision.
    await page.goto(proposalPath.replace('/proposals/', '/reviews/'));
    await heading(page, title);
    await page.getByRole('note').filter({ hasText: 'Four-eyes rule' }).waitFor();
    expect(await page.getByRole('button', { name: 'Record decision' }).count()).toBe(0);
  }, 120_000);

  it('a reviewer comments on the item and asks for changes', async () => {
    const page = await pageAs('reviewer', '/reviews');
    await heading(page, 'Review queue');
    await expectAccessible(page, 'the review queue');
    await page.getByRole('link', { name: title }).click();
    await heading(page, title);

    const card = itemCard(page);
    await card.getByRole('columnheader', { name: /Now, in 2026\.2/ }).waitFor();
    await card.getByRole('textbox', { name: 'Comment on this item' }).fill('Please state the uncertainty of the series as 0.35 kJ/mol, as in Table 2.');
    await card.getByRole('button', { name: 'Add comment' }).click();
    await expectState(page, 'In review');
    await expectAccessible(page, 'the review page');

    await page.getByRole('radio', { name: 'Ask for changes' }).check();
    await page.getByRole('textbox', { name: 'Comment for the author' }).fill('The uncertainty does not match Table 2; correct it and resubmit.');
    await page.getByRole('button', { name: 'Record decision' }).click();
    await expectState(page, 'Changes requested');
  }, 90_000);

  it('the steward revises the item, answers the comment and resubmits', async () => {
    const page = await pageAs('steward', proposalPath);
    await heading(page, title);
    await page.getByRole('heading', { name: /asked for changes/ }).waitFor();

    const card = itemCard(page);
    await card.getByRole('heading', { name: /ΔfH°\(l\) of propan-1-ol/ }).waitFor();
    await card.getByRole('button', { name: /^Edit ΔfH°/ }).click();
    await card.getByRole('combobox', { name: 'Species', exact: true }).waitFor();
    await card.getByRole('textbox', { name: 'Uncertainty (optional)' }).fill('0.35');
    await card.getByRole('button', { name: 'Save changes' }).click();
    await card.getByText(/-302\.6 ± 0\.35 kJ\/mol/).waitFor();
    await card.getByRole('textbox', { name: 'Answer on this item' }).fill('Corrected to 0.35 kJ/mol as in Table 2.');
    await card.getByRole('button', { name: 'Post answer' }).click();
    await card.getByText('Corrected to 0.35 kJ/mol as in Table 2.').waitFor();

    await page.getByRole('button', { name: 'Resubmit for review' }).click();
    await expectState(page, 'Resubmitted');
  }, 90_000);

  it('a second reviewer approves', async () => {
    const page = await pageAs('reviewer2', proposalPath.replace('/proposals/', '/reviews/'));
    await heading(page, title);
    await page.getByRole('radio', { name: 'Approve' }).check();
    const justification = page.getByRole('textbox', { name: 'Justification' });
    if ((await justification.count()) > 0) {
      await justification.fill('The older TC-03 value predates the recalibration of the calorimeter.');
    }
    await page.getByRole('button', { name: 'Record decision' }).click();
    await expectState(page, 'Approved');
  }, 60_000);

  it('the editor adds it to 2027.1, recommends the new value where the sources disagree and publishes', async () => {
    const page = await pageAs('editor', '/releases/2027.1/edit');
    await heading(page, 'Assemble release 2027.1');
    await page.locator('li').filter({ hasText: title }).getByRole('button', { name: 'Add to 2027.1' }).click();
    const group = page.locator('fieldset').filter({ hasText: 'ΔfH°(l) of propan-1-ol' });
    await group.getByText(sourceKey).waitFor({ timeout: 15_000 });
    await group.getByText('qpc-tc03-2025').waitFor();
    await expectAccessible(page, 'the release in preparation');
    await screenshot(page, 'editorial-release-workspace-1280-light');

    await group.getByRole('radio', { name: `Recommend ${sourceKey}` }).check();
    await group.locator('tr.kx-chosen').filter({ hasText: sourceKey }).waitFor({ timeout: 15_000 });
    await page.getByText(/ΔfH°\(l\)\s+revised|ΔfH°\(l\)\s+added/).first().waitFor();

    await page.getByRole('button', { name: 'Publish 2027.1…' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText('never changes again').waitFor();
    await dialog.getByRole('button', { name: 'Publish 2027.1' }).click();
    await page.waitForURL(/\/releases\/2027\.1$/, { timeout: 30_000 });
    await page.getByText(/^\s*Published/).first().waitFor();
    await expectAccessible(page, 'a published release');
  }, 120_000);

  it('the species page shows the new value under 2027.1 and the old value under 2026.2', async () => {
    const found = await apiGet<{ items: { id: string; name: string }[] }>('/species?q=propan-1-ol');
    const id = found.items.find((s) => s.name === 'propan-1-ol')!.id;
    const page = await pageAs(null, `/species/${id}?release=2027.1`);
    // The recommended value leads the quantity's card; the older source stays as an alternative.
    const enthalpy = page.locator('.kx-value-card').filter({ hasText: 'ΔfH°' }).first();
    await enthalpy.getByText(/^-302\.60? ± 0\.35$/).first().waitFor({ timeout: 15_000 });
    expect(await enthalpy.locator('.kx-value-line').first().textContent()).toMatch(/recommended\s*-302\.60? ± 0\.35/);
    expect(await enthalpy.textContent()).toContain(`invented demo report ${tag}`);

    await page.goto(`/species/${id}?release=2026.2`);
    const before = page.locator('.kx-value-card').filter({ hasText: 'ΔfH°' }).first();
    await before.getByText(/^-302\.9 ± 0\.5$/).first().waitFor({ timeout: 15_000 });
    expect(await before.locator('.kx-value-line').first().textContent()).toMatch(/recommended\s*-302\.9 ± 0\.5/);
    expect(await before.textContent()).not.toContain(`invented demo report ${tag}`);
  }, 60_000);

  it('the watcher’s e-mail about the release appears in the outbox', async () => {
    const page = await pageAs('admin', '/admin/outbox?to=reader%40kelvindex.test');
    await heading(page, 'Outbox');
    const mail = page.locator('mat-expansion-panel').filter({ hasText: 'Release 2027.1 changes species you watch' }).first();
    await mail.waitFor({ timeout: 30_000 });
    await mail.locator('mat-expansion-panel-header').click();
    await mail.getByText(/propan-1-ol/).first().waitFor();
    await expectAccessible(page, 'the outbox');
  }, 60_000);

  it('an admin invites a user, who signs up through the link in the captured e-mail', async () => {
    const email = `new.steward.${tag}@kelvindex.test`;
    const admin = await pageAs('admin', '/admin/users');
    await heading(admin, 'Users and roles');
    await admin.getByRole('textbox', { name: 'E-mail address' }).fill(email);
    await admin.getByRole('checkbox', { name: 'steward', exact: true }).check();
    await admin.getByRole('button', { name: 'Send invitation' }).click();
    await admin.getByText(`Invitation sent to ${email}`).waitFor();

    await admin.goto(`/admin/outbox?to=${encodeURIComponent(email)}`);
    const mail = admin.locator('mat-expansion-panel').filter({ hasText: 'You are invited to Kelvindex' }).first();
    await mail.waitFor({ timeout: 30_000 });
    await mail.locator('mat-expansion-panel-header').click();
    const link = await mail.locator('a[href*="/accept-invitation?token="]').getAttribute('href');
    expect(link).withContext('the invitation link').toBeTruthy();

    const invited = await pageAs(null, '/');
    await invited.goto(link!);
    await invited.getByRole('textbox', { name: 'Your name' }).fill(`New Steward ${tag}`);
    await invited.getByLabel('Password', { exact: true }).fill('a-long-demo-password');
    await invited.getByLabel('Repeat the password').fill('a-long-demo-password');
    await invited.getByRole('button', { name: 'Create my account' }).click();
    await invited.waitForURL((url) => !url.pathname.startsWith('/accept-invitation'), { timeout: 15_000 });
    await invited.getByRole('button', { name: new RegExp(`New Steward ${tag}`) }).waitFor();
    await invited.goto('/proposals');
    await heading(invited, 'Your proposals');
  }, 90_000);

  it('a bulk import with a bad row shows the line number, offers the report as CSV and writes nothing', async () => {
    const token = await apiToken('steward');
    const before = await apiGet<{ total: number }>('/proposals?mine=true&limit=1', token);
    const page = await pageAs('steward', '/imports');
    await heading(page, 'Import values from a file');
    await page.getByLabel('Import file').setInputFiles({
      name: `solvents-${tag}.csv`,
      mimeType: 'text/csv',
      buffer: Buffer.from(
        [
          'formula,name,phase,quantity,value,unit,uncertainty,pressure,method,sourceKey',
          'CH3CH2CH2OH,propan-1-ol,l,S,193.6,J/(mol·K),0.5,1 bar,measured,qpc-tc03-2025',
          'CH3CH2CH2OH,propan-1-ol,l,Cp,144.0,kJ,0.4,1 bar,measured,qpc-tc03-2025',
        ].join('\n') + '\n',
      ),
    });
    await page.getByRole('button', { name: 'Check the file' }).click();
    const row = page.locator('table tbody tr').filter({ hasText: 'unit must be one of' }).first();
    await row.waitFor({ timeout: 30_000 });
    expect((await row.locator('td').first().textContent())?.trim()).toBe('3');
    await page.getByText('nothing was written').waitFor();
    expect(await page.getByRole('button', { name: 'Import into a draft proposal' }).count()).toBe(0);
    await expectAccessible(page, 'the import report');

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download the problems as CSV' }).click()]);
    expect(download.suggestedFilename()).toBe(`solvents-${tag}-problems.csv`);
    expect(await downloadedText(download)).toContain('3,unit,');

    const after = await apiGet<{ total: number }>('/proposals?mine=true&limit=1', token);
    expect(after.total).withContext('no proposal was created').toBe(before.total);
  }, 90_000);

  it('signs in only through the sign-in page when the session is gone', async () => {
    // The e-mails link to /proposals/{id}: a signed-out reader is sent to sign in and back.
    const { context, page } = await newPage();
    contexts.push(context);
    await page.goto(proposalPath);
    await page.waitForURL(/\/sign-in\?returnUrl=/);
    await signIn(page, 'editor@kelvindex.test', undefined, proposalPath);
    await page.waitForURL(/\/reviews\//);
    await heading(page, title);
    await expectState(page, 'Released');
  }, 60_000);
});
