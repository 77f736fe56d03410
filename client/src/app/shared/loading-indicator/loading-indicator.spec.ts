import { TestBed } from '@angular/core/testing';

import { LoadingIndicator } from './loading-indicator';

describe('LoadingIndicator', () => {
  it('announces what is loading as a polite status', () => {
    const fixture = TestBed.createComponent(LoadingIndicator);
    fixture.componentRef.setInput('label', 'Loading releases');
    fixture.detectChanges();
    const host = fixture.nativeElement as HTMLElement;

    expect(host.getAttribute('role')).toBe('status');
    expect(host.getAttribute('aria-live')).toBe('polite');
    expect(host.textContent!.trim()).toBe('Loading releases…');
    expect(host.querySelector('mat-progress-spinner')).not.toBeNull();
  });
});
