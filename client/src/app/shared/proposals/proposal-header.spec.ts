import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';

import { Proposal } from './proposal';
import { ProposalHeader } from './proposal-header';

const proposal: Proposal = {
  id: 'p1',
  title: 'Propan-1-ol (l): ΔfH° from TC-04',
  summary: 'Two new values from the TC-04 series.',
  state: 'submitted',
  version: 4,
  author: { id: 'u-steward', name: 'Tomasz Okafor' },
  release: { id: 'rel-1', label: '2027.1' },
  submittedAt: '2026-11-20T10:00:00Z',
  decidedAt: null,
  createdAt: '2026-11-19T10:00:00Z',
  updatedAt: '2026-11-20T10:00:00Z',
  itemCount: 1,
  checkSummary: { pass: 2, warn: 1, fail: 0 },
  allowedActions: [],
  items: [
    {
      id: 'i1', position: 1, kind: 'add_value', payload: {}, sourceId: null, source: null,
      speciesId: null, speciesPhaseId: null, targetValueId: null, targetFitId: null,
      checks: [], checksRanAt: '2026-11-20T10:00:00Z', checkSummary: { pass: 2, warn: 1, fail: 0 }, evidence: [],
    },
  ],
  reviews: [],
};

@Component({
  imports: [ProposalHeader],
  template: `
    <kx-proposal-header [proposal]="proposal()" backLink="/reviews" backLabel="Review queue" [showAuthor]="showAuthor()">
      <button type="button" class="kx-page-action">Withdraw</button>
    </kx-proposal-header>
  `,
})
class HeaderHost {
  readonly proposal = signal(proposal);
  readonly showAuthor = signal(true);
}

describe('ProposalHeader', () => {
  let fixture: ComponentFixture<HeaderHost>;
  const element = () => fixture.nativeElement as HTMLElement;
  const meta = () => element().querySelector('.kx-meta')!.textContent!.replace(/\s+/g, ' ');

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideRouter([])] });
    fixture = TestBed.createComponent(HeaderHost);
    await fixture.whenStable();
  });

  it('leads back to its list and shows the title, the state and the summary', () => {
    const back = element().querySelector<HTMLAnchorElement>('.kx-crumbs a')!;
    expect(back.textContent).toBe('Review queue');
    expect(back.getAttribute('href')).toBe('/reviews');
    expect(element().querySelector('h1')!.textContent).toBe('Propan-1-ol (l): ΔfH° from TC-04');
    expect(element().querySelector('kx-proposal-state')!.textContent).toBe('Submitted');
    expect(element().querySelector('.kx-summary')!.textContent).toBe('Two new values from the TC-04 series.');
  });

  it('gives the version, the dates, the release and the checks', () => {
    expect(meta()).toContain('by Tomasz Okafor');
    expect(meta()).toContain('version 4');
    expect(meta()).toContain('started 2026-11-19');
    expect(meta()).toMatch(/submitted 2026-11-\d\d \d\d:\d\d \(\d+ days? ago\)/);
    expect(element().querySelector('.kx-meta a')!.getAttribute('href')).toBe('/releases/2027.1');
    expect(meta()).toContain('checks: 0 failed, 1 warnings, 2 passed');
  });

  it('leaves out the author on request, and the checks before they ran', async () => {
    fixture.componentInstance.showAuthor.set(false);
    fixture.componentInstance.proposal.set({ ...proposal, state: 'draft', submittedAt: null, summary: '', items: [{ ...proposal.items[0], checks: null }] });
    await fixture.whenStable();
    expect(meta()).not.toContain('Tomasz Okafor');
    expect(meta()).not.toContain('submitted');
    expect(element().querySelector('.kx-check-summary')).toBeNull();
    expect(element().querySelector('.kx-summary')).toBeNull();
  });

  it('shows the page’s content after the summary', () => {
    const header = element().querySelector('header')!;
    expect(header.lastElementChild!.classList).toContain('kx-page-action');
  });
});
