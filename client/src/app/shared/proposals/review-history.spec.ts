import { ComponentFixture, TestBed } from '@angular/core/testing';

import { Review } from './proposal';
import { ReviewHistory } from './review-history';

const reviews: Review[] = [
  { id: 'r1', reviewer: { id: 'u1', name: 'Ines Marchetti' }, decision: 'request_changes', comment: 'State the uncertainty as in Table 2.', justification: null, proposalVersion: 3, createdAt: '2026-11-21T10:00:00Z' },
  { id: 'r2', reviewer: { id: 'u2', name: 'Jonas Berg' }, decision: 'approve', comment: '', justification: 'Table 2 supersedes the older series.', proposalVersion: 5, createdAt: '2026-11-23T09:30:00Z' },
];

describe('ReviewHistory', () => {
  let fixture: ComponentFixture<ReviewHistory>;
  const items = () => Array.from((fixture.nativeElement as HTMLElement).querySelectorAll('li'));

  beforeEach(async () => {
    fixture = TestBed.createComponent(ReviewHistory);
    fixture.componentRef.setInput('reviews', reviews);
    await fixture.whenStable();
  });

  it('lists each decision with its reviewer, time and the version it was about', () => {
    expect(items().length).toBe(2);
    expect(items()[0].querySelector('strong')!.textContent).toBe('Asked for changes');
    expect(items()[0].textContent).toContain('by Ines Marchetti');
    expect(items()[0].textContent).toContain('(version 3)');
    expect(items()[0].querySelector('time')!.getAttribute('datetime')).toBe('2026-11-21T10:00:00Z');
    expect(items()[1].querySelector('strong')!.textContent).toBe('Approved');
  });

  it('shows a comment and a justification only where there is one', () => {
    expect(items()[0].querySelector('p')!.textContent).toBe('State the uncertainty as in Table 2.');
    expect(items()[0].querySelector('.kx-justification')).toBeNull();
    expect(items()[1].querySelectorAll('p').length).toBe(1);
    expect(items()[1].querySelector('.kx-justification')!.textContent).toBe('Justification for a failed check: Table 2 supersedes the older series.');
  });
});
