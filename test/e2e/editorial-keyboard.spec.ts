import type { Page } from 'playwright-core';

import { closeBrowser, newPage } from './browser';
import { focused } from './flows';
import { KeyboardTarget, expectState, heading, itemCard, runTag, signInAs, tabTo } from './editorial-flows';

const named = (name: string | RegExp, role?: string, tag?: string) => (target: KeyboardTarget) =>
  (typeof name === 'string' ? target.name === name : name.test(target.name)) && (!role || target.role === role) && (!tag || target.tag === tag);

async function expectFocusVisible(page: Page, what: string): Promise<void> {
  expect((await focused(page)).focusVisible).withContext(`focus on ${what} is visible`).toBeTrue();
}

// A proposal entered and submitted, then reviewed, with the keyboard alone (after signing in).
describe('keyboard-only editorial work (end to end)', () => {
  const title = `Propan-1-ol (l): ΔfH°, keyboard entry (${runTag()})`;
  let proposalPath = '';

  afterAll(closeBrowser);

  it('a steward enters a value with its source and submits the proposal without a mouse', async () => {
    const { context, page } = await newPage();
    try {
      await signInAs(page, 'steward', '/proposals');
      await heading(page, 'Your proposals');

      await tabTo(page, named('Title', '', 'input'));
      await expectFocusVisible(page, 'the title field');
      await page.keyboard.type(title);
      await page.keyboard.press('Enter');
      await page.waitForURL(/\/proposals\/[0-9a-f-]{36}$/);
      proposalPath = new URL(page.url()).pathname;
      await heading(page, title);

      await tabTo(page, named('Value', 'radio'));
      await expectFocusVisible(page, 'the kind of item');
      await page.keyboard.press('Space');
      await page.getByRole('form', { name: 'Enter a value' }).waitFor();

      await tabTo(page, named('Species', 'combobox', 'input'));
      await page.keyboard.type('propan-1-ol');
      await page.getByRole('option', { name: /^propan-1-ol/ }).first().waitFor();
      await page.keyboard.press('ArrowDown');
      await page.keyboard.press('Enter');
      await page.getByText('Values already in release').waitFor();

      await tabTo(page, named('Value', '', 'input'));
      await page.keyboard.type('-302.7');
      await tabTo(page, named('Uncertainty (optional)', '', 'input'));
      await page.keyboard.type('0.6');
      await tabTo(page, named(/^Method/, 'combobox'));
      await expectFocusVisible(page, 'the method select');
      await page.keyboard.press('Enter');
      await page.getByRole('option', { name: 'measured' }).waitFor();
      await page.keyboard.press('Enter');
      await page.getByRole('combobox', { name: /Method/ }).filter({ hasText: 'measured' }).waitFor();

      await tabTo(page, named('Source', 'combobox', 'input'));
      await page.keyboard.type('qpc-tc03');
      await page.getByRole('option', { name: /qpc-tc03-2025/ }).first().waitFor();
      await page.keyboard.press('ArrowDown');
      await page.keyboard.press('Enter');

      await tabTo(page, named('Add value', '', 'button'));
      await page.keyboard.press('Enter');
      await itemCard(page).getByRole('heading', { name: /ΔfH°\(l\)/ }).waitFor({ timeout: 15_000 });

      await tabTo(page, named('Submit for review', '', 'button'), 150);
      await expectFocusVisible(page, 'the submit button');
      await page.keyboard.press('Enter');
      await expectState(page, 'Submitted');
    } finally {
      await context.close();
    }
  }, 120_000);

  it('a reviewer opens it from the queue and asks for changes without a mouse', async () => {
    const { context, page } = await newPage();
    try {
      await signInAs(page, 'reviewer', '/reviews');
      await heading(page, 'Review queue');
      await page.getByRole('link', { name: title }).waitFor();
      await tabTo(page, named(title, '', 'a'), 150);
      await expectFocusVisible(page, 'the proposal link');
      await page.keyboard.press('Enter');
      await page.waitForURL(new RegExp(proposalPath.replace('/proposals/', '/reviews/')));
      await heading(page, title);
      await page.getByRole('radio', { name: 'Approve' }).waitFor();

      await tabTo(page, named('Approve', '', 'input'), 150);
      await expectFocusVisible(page, 'the decision');
      await page.keyboard.press('ArrowDown');
      await tabTo(page, named('Comment for the author', '', 'textarea'));
      await page.keyboard.type('Give the number of runs behind the uncertainty.');
      await tabTo(page, named('Record decision', '', 'button'));
      await expectFocusVisible(page, 'the record button');
      await page.keyboard.press('Enter');
      await expectState(page, 'Changes requested');
    } finally {
      await context.close();
    }
  }, 90_000);
});
