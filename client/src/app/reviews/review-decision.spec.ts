import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';

import { Proposal } from '../shared/proposals/proposal';
import { ReviewDecision } from './review-decision';

function proposalWith(checks: { status: 'pass' | 'fail' }[]): Proposal {
  return {
    id: 'p1',
    version: 3,
    items: [{ id: 'i1', checks: checks.map((c) => ({ code: 'source-agreement', message: '…', ...c })) }],
  } as unknown as Proposal;
}

describe('ReviewDecision', () => {
  let fixture: ComponentFixture<ReviewDecision>;
  let backend: HttpTestingController;
  const element = () => fixture.nativeElement as HTMLElement;

  async function create(proposal: Proposal): Promise<void> {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ReviewDecision);
    fixture.componentRef.setInput('proposal', proposal);
    await fixture.whenStable();
  }

  async function choose(label: string): Promise<void> {
    const radio = Array.from(element().querySelectorAll('mat-radio-button')).find((r) => r.textContent!.includes(label))!;
    radio.querySelector('input')!.click();
    await fixture.whenStable();
  }

  async function submit(): Promise<void> {
    element().querySelector<HTMLButtonElement>('.kx-record-decision')!.click();
    await fixture.whenStable();
  }

  afterEach(() => backend.verify());

  it('asks for a comment before sending a proposal back', async () => {
    await create(proposalWith([{ status: 'pass' }]));
    await choose('Ask for changes');
    await submit();
    expect(element().querySelector('mat-error')!.textContent).toContain('Say what should change.');
    backend.expectNone('/api/v1/proposals/p1/reviews');
  });

  it('sends the decision with the version the reviewer saw', async () => {
    await create(proposalWith([{ status: 'pass' }]));
    await choose('Ask for changes');
    const comment = element().querySelector<HTMLTextAreaElement>('.kx-decision-comment')!;
    comment.value = 'Give the expanded uncertainty with its k.';
    comment.dispatchEvent(new Event('input'));
    await submit();
    const request = backend.expectOne('/api/v1/proposals/p1/reviews');
    expect(request.request.body).toEqual({ decision: 'request_changes', version: 3, comment: 'Give the expanded uncertainty with its k.' });
    request.flush({});
  });

  it('shows the justification field only when approving over a failed check, and requires it', async () => {
    await create(proposalWith([{ status: 'fail' }]));
    expect(element().querySelector('.kx-failed-note')).not.toBeNull();
    await choose('Reject');
    expect(element().querySelector('.kx-decision-justification')).toBeNull();
    await choose('Approve');
    expect(element().querySelector('.kx-decision-justification')).not.toBeNull();
    await submit();
    expect(element().textContent).toContain('say why it does not block the approval');
    backend.expectNone('/api/v1/proposals/p1/reviews');
  });

  it('approves without a justification when no check failed', async () => {
    await create(proposalWith([{ status: 'pass' }]));
    expect(element().querySelector('.kx-failed-note')).toBeNull();
    await choose('Approve');
    await submit();
    const request = backend.expectOne('/api/v1/proposals/p1/reviews');
    expect(request.request.body).toEqual({ decision: 'approve', version: 3 });
    request.flush({});
  });
});
