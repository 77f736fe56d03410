import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { provideRouter } from '@angular/router';
import { of } from 'rxjs';

import { AuthService, User } from '../core/auth';
import { Proposal, ProposalAction, ProposalState } from '../shared/proposals/proposal';
import { ProposalEditor } from './proposal-editor';

const steward: User = { id: 'u-steward', email: 'steward@kelvindex.test', name: 'Tomasz Okafor', roles: ['reader', 'steward'] };

/** The actions the API allows the author in each state (api/src/proposals/proposals.service.ts allowedActions). */
const ALLOWED: Record<ProposalState, ProposalAction[]> = {
  draft: ['submit', 'withdraw', 'edit_items'],
  submitted: ['withdraw'],
  in_review: ['withdraw'],
  changes_requested: ['resubmit', 'withdraw', 'edit_items'],
  resubmitted: ['withdraw'],
  approved: [],
  released: [],
  rejected: [],
  withdrawn: [],
};

function proposal(state: ProposalState): Proposal {
  return {
    id: 'p1',
    title: 'Propan-1-ol (l): ΔfH° from TC-04',
    summary: '',
    state,
    version: 4,
    author: { id: 'u-steward', name: 'Tomasz Okafor' },
    release: null,
    submittedAt: state === 'draft' ? null : '2026-11-20T10:00:00Z',
    decidedAt: null,
    createdAt: '2026-11-19T10:00:00Z',
    updatedAt: '2026-11-20T10:00:00Z',
    itemCount: 1,
    checkSummary: { pass: 1, warn: 0, fail: 0 },
    allowedActions: ALLOWED[state],
    items: [
      {
        id: 'i1', position: 1, kind: 'add_value',
        payload: { species: 'propan-1-ol', phase: 'l', quantity: 'dfH', value: '-302.6', unit: 'kJ/mol', pressurePa: 100000, method: 'measured' },
        sourceId: 's1', source: { id: 's1', shortKey: 'okafor-2027', title: 'TC-04' },
        speciesId: null, speciesPhaseId: null, targetValueId: null, targetFitId: null,
        checks: state === 'draft' ? null : [{ code: 'source-agreement', status: 'pass', message: 'agrees' }],
        checksRanAt: null, checkSummary: { pass: 1, warn: 0, fail: 0 }, evidence: [],
      },
    ],
    reviews:
      state === 'changes_requested'
        ? [{ id: 'r1', reviewer: { id: 'u-rev', name: 'Ines Marchetti' }, decision: 'request_changes', comment: 'State the uncertainty as in Table 2.', justification: null, proposalVersion: 3, createdAt: '2026-11-21T10:00:00Z' }]
        : [],
  };
}

describe('ProposalEditor', () => {
  let fixture: ComponentFixture<ProposalEditor>;
  let backend: HttpTestingController;
  const element = () => fixture.nativeElement as HTMLElement;
  const buttons = () => Array.from(element().querySelectorAll('.kx-actions button')).map((b) => b.textContent!.trim());

  async function open(state: ProposalState): Promise<void> {
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([]),
        { provide: AuthService, useValue: { user: signal(steward) } },
        { provide: MatDialog, useValue: { open: () => ({ afterClosed: () => of(true) }) } },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ProposalEditor);
    fixture.componentRef.setInput('proposal', proposal(state));
    await fixture.whenStable();
    backend.expectOne('/api/v1/proposals/p1/comments').flush({ items: [] });
    await fixture.whenStable();
  }

  afterEach(() => backend.verify());

  it('lets the author submit, withdraw and change the items of a draft', async () => {
    await open('draft');
    expect(buttons()).toEqual(['Submit for review', 'Withdraw']);
    expect(element().querySelector('#add-heading')).not.toBeNull();
    expect(element().querySelector('.kx-edit-item')).not.toBeNull();
    expect(element().textContent).toContain('The automatic checks run when the proposal is submitted.');
  });

  it('offers only withdrawal while the proposal waits for review, and no editing', async () => {
    await open('submitted');
    expect(buttons()).toEqual(['Withdraw']);
    expect(element().querySelector('#add-heading')).toBeNull();
    expect(element().querySelector('.kx-edit-item')).toBeNull();
    expect(element().querySelector('a[href="/reviews/p1"]')).not.toBeNull();
  });

  it('shows the reviewer’s request and offers to resubmit once changes are requested', async () => {
    await open('changes_requested');
    expect(buttons()).toEqual(['Resubmit for review', 'Withdraw']);
    expect(element().querySelector('.kx-callout')!.textContent).toContain('Ines Marchetti asked for changes');
    expect(element().querySelector('.kx-callout')!.textContent).toContain('State the uncertainty as in Table 2.');
    expect(element().querySelector('#add-heading')).not.toBeNull();
  });

  for (const state of ['approved', 'released', 'rejected', 'withdrawn'] as const) {
    it(`offers the author nothing to do once the proposal is ${state}`, async () => {
      await open(state);
      expect(buttons()).toEqual([]);
      expect(element().querySelector('#add-heading')).toBeNull();
    });
  }

  it('submits with the version the author saw and shows the new state', async () => {
    await open('draft');
    element().querySelector<HTMLButtonElement>('.kx-submit')!.click();
    const request = backend.expectOne('/api/v1/proposals/p1/submit');
    expect(request.request.body).toEqual({ version: 4 });
    request.flush({ ...proposal('submitted'), version: 5 });
    await fixture.whenStable();
    backend.expectOne('/api/v1/proposals/p1/comments').flush({ items: [] });
    await fixture.whenStable();
    expect(element().querySelector('kx-proposal-state')!.textContent).toBe('Submitted');
    expect(buttons()).toEqual(['Withdraw']);
  });

  it('withdraws after the author confirms', async () => {
    await open('submitted');
    element().querySelector<HTMLButtonElement>('.kx-withdraw')!.click();
    const request = backend.expectOne('/api/v1/proposals/p1/withdraw');
    expect(request.request.body).toEqual({ version: 4 });
    request.flush(proposal('withdrawn'));
    await fixture.whenStable();
    backend.expectOne('/api/v1/proposals/p1/comments').flush({ items: [] });
    await fixture.whenStable();
    expect(buttons()).toEqual([]);
  });
});
