import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { provideRouter } from '@angular/router';

import { AuthService, Role, User } from '../core/auth';
import { Proposal, ProposalAction, ProposalState } from '../shared/proposals/proposal';
import { ReviewPage } from './review-page';

function proposal(state: ProposalState, allowedActions: ProposalAction[]): Proposal {
  return {
    id: 'p1',
    title: 'Ethyl acetate: ΔvapH at 298.15 K',
    summary: '',
    state,
    version: 2,
    author: { id: 'u-steward', name: 'Tomasz Okafor' },
    release: null,
    submittedAt: '2026-11-20T10:00:00Z',
    decidedAt: null,
    createdAt: '2026-11-19T10:00:00Z',
    updatedAt: '2026-11-20T10:00:00Z',
    itemCount: 1,
    checkSummary: { pass: 0, warn: 0, fail: 1 },
    allowedActions,
    items: [
      {
        id: 'i1', position: 1, kind: 'add_value',
        payload: { species: 'ethyl acetate', phase: 'l', quantity: 'dtrsH', transitionKind: 'vap', value: '35.6', unit: 'kJ/mol', pressurePa: 100000, method: 'measured' },
        sourceId: 's1', source: { id: 's1', shortKey: 'qpc-tc03-2025', title: 'TC-03' },
        speciesId: null, speciesPhaseId: null, targetValueId: null, targetFitId: null,
        checks: [{ code: 'source-agreement', status: 'fail', message: 'differs', details: { z: 3.4 } }],
        checksRanAt: '2026-11-20T10:00:00Z', checkSummary: { pass: 0, warn: 0, fail: 1 }, evidence: [],
      },
    ],
    reviews: [],
  };
}

describe('ReviewPage', () => {
  let fixture: ComponentFixture<ReviewPage>;
  let backend: HttpTestingController;
  const element = () => fixture.nativeElement as HTMLElement;

  async function open(viewer: { id: string; roles: Role[] }, shown: Proposal): Promise<void> {
    const user: User = { id: viewer.id, email: 'x@kelvindex.test', name: 'Viewer', roles: viewer.roles };
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([]), { provide: AuthService, useValue: { user: signal(user) } }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ReviewPage);
    fixture.componentRef.setInput('proposal', shown);
    await fixture.whenStable();
    backend.expectOne('/api/v1/proposals/p1/comments').flush({ items: [] });
    backend.expectOne('/api/v1/proposals/p1/impact').flush({ proposalId: 'p1', release: '2026.2', temperatureK: 298.15, items: [] });
    await fixture.whenStable();
  }

  afterEach(() => backend.verify());

  it('offers a reviewer the decision while the proposal waits, with the failed check and its numbers', async () => {
    await open({ id: 'u-reviewer', roles: ['reader', 'reviewer'] }, proposal('submitted', ['approve', 'request_changes', 'reject']));
    expect(element().querySelector('kx-review-decision')).not.toBeNull();
    expect(element().querySelector('.kx-four-eyes')).toBeNull();
    expect(element().querySelector('.kx-check-fail')!.textContent).toContain('source-agreement');
    expect(element().querySelector('.kx-failed-note')).not.toBeNull();
  });

  it('makes the four-eyes rule visible to the author, with no decision, even when they hold the reviewer role', async () => {
    await open({ id: 'u-steward', roles: ['reader', 'steward', 'reviewer'] }, proposal('submitted', ['withdraw']));
    expect(element().querySelector('kx-review-decision')).toBeNull();
    const note = element().querySelector('.kx-four-eyes')!;
    expect(note.getAttribute('role')).toBe('note');
    expect(note.textContent).toContain('Four-eyes rule.');
    expect(note.textContent).toContain('Nobody reviews their own work');
  });

  it('says why there is nothing to decide once the proposal is approved', async () => {
    await open({ id: 'u-reviewer', roles: ['reader', 'reviewer'] }, proposal('approved', []));
    expect(element().querySelector('kx-review-decision')).toBeNull();
    expect(element().querySelector('.kx-four-eyes')!.textContent).toContain('An editor takes it into a release.');
  });

  it('tells an editor that deciding takes the reviewer role', async () => {
    await open({ id: 'u-editor', roles: ['reader', 'editor'] }, proposal('in_review', []));
    expect(element().querySelector('kx-review-decision')).toBeNull();
    expect(element().querySelector('.kx-four-eyes')!.textContent).toContain('reviewer role');
  });

  it('sets the proposed value beside the current one', async () => {
    await open({ id: 'u-reviewer', roles: ['reader', 'reviewer'] }, proposal('submitted', ['approve', 'request_changes', 'reject']));
    const proposed = element().querySelector('.kx-compare .kx-proposed')!;
    expect(proposed.textContent!.trim()).toBe('35.6 kJ/mol');
    expect(element().textContent).toContain('No value of this quantity for this species phase');
  });
});
