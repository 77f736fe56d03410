import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';

import { ErrorState } from './error-state';

@Component({
  imports: [ErrorState],
  template: `<kx-error-state message="The server answered 502." [retryable]="retryable()" (retry)="retries = retries + 1" />`,
})
class ErrorStateHost {
  readonly retryable = signal(true);
  retries = 0;
}

describe('ErrorState', () => {
  let fixture: ComponentFixture<ErrorStateHost>;
  let element: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [MatIconTestingModule] });
    fixture = TestBed.createComponent(ErrorStateHost);
    await fixture.whenStable();
    element = (fixture.nativeElement as HTMLElement).querySelector('kx-error-state')!;
  });

  it('is an alert with a heading and the reason', () => {
    expect(element.getAttribute('role')).toBe('alert');
    expect(element.querySelector('h2')!.textContent).toBe('Something went wrong');
    expect(element.querySelector('p')!.textContent).toBe('The server answered 502.');
  });

  it('emits retry when the reader tries again', () => {
    element.querySelector('button')!.click();
    expect(fixture.componentInstance.retries).toBe(1);
  });

  it('offers no retry when retrying cannot help', async () => {
    fixture.componentInstance.retryable.set(false);
    await fixture.whenStable();
    expect(element.querySelector('button')).toBeNull();
  });
});
