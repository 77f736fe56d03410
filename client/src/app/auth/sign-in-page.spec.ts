import { HttpErrorResponse } from '@angular/common/http';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { Subject } from 'rxjs';

import { AuthService, User } from '../core/auth';
import { SignInPage } from './sign-in-page';

describe('SignInPage', () => {
  let fixture: ComponentFixture<SignInPage>;
  let page: HTMLElement;
  let answer: Subject<User>;
  let signIn: jasmine.Spy;
  let navigate: jasmine.Spy;

  function type(selector: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function submit(): Promise<void> {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  }

  beforeEach(async () => {
    answer = new Subject<User>();
    signIn = jasmine.createSpy('signIn').and.callFake(() => answer);
    TestBed.configureTestingModule({
      providers: [provideRouter([]), { provide: AuthService, useValue: { signIn } }],
    });
    navigate = spyOn(TestBed.inject(Router), 'navigateByUrl').and.resolveTo(true);
    fixture = TestBed.createComponent(SignInPage);
    fixture.componentRef.setInput('returnUrl', '/account?tab=keys');
    page = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  it('labels both fields and links to the password reset', () => {
    const labels = Array.from(page.querySelectorAll('mat-label')).map((label) => label.textContent!.trim());
    expect(labels).toEqual(['E-mail', 'Password']);
    expect(page.querySelector('input[type="password"]')!.getAttribute('autocomplete')).toBe('current-password');
    expect(page.querySelector('a[href="/reset-password"]')).not.toBeNull();
  });

  it('asks for both fields before calling the API', async () => {
    await submit();
    expect(signIn).not.toHaveBeenCalled();
    expect(Array.from(page.querySelectorAll('mat-error')).map((e) => e.textContent!.trim())).toEqual([
      'Enter your e-mail address.',
      'Enter your password.',
    ]);
  });

  it('signs in and returns to where the reader was going', async () => {
    type('input[type="email"]', ' steward@kelvindex.test ');
    type('input[type="password"]', 'kelvindex-demo');
    await submit();
    expect(signIn).toHaveBeenCalledOnceWith('steward@kelvindex.test', 'kelvindex-demo');
    expect(page.querySelector<HTMLButtonElement>('button[type="submit"]')!.disabled).toBeTrue();

    answer.next({ id: 2, email: 'steward@kelvindex.test', name: 'T', roles: ['steward'] });
    expect(navigate).toHaveBeenCalledOnceWith('/account?tab=keys');
  });

  it('says plainly that the e-mail or password is wrong', async () => {
    type('input[type="email"]', 'steward@kelvindex.test');
    type('input[type="password"]', 'not-it');
    await submit();
    answer.error(new HttpErrorResponse({ status: 401, error: { error: 'unauthorized', message: 'Invalid credentials' } }));
    await fixture.whenStable();

    const alert = page.querySelector('[role="alert"]')!;
    expect(alert.textContent!.trim()).toBe('E-mail or password is wrong.');
    expect(page.querySelector<HTMLInputElement>('input[type="password"]')!.value).toBe('');
    expect(navigate).not.toHaveBeenCalled();
  });

  it('shows the API’s message when sign-in is throttled', async () => {
    type('input[type="email"]', 'steward@kelvindex.test');
    type('input[type="password"]', 'not-it');
    await submit();
    answer.error(
      new HttpErrorResponse({ status: 429, error: { error: 'too_many_requests', message: 'Too many attempts; try again in 10 minutes.' } }),
    );
    await fixture.whenStable();
    expect(page.querySelector('[role="alert"]')!.textContent).toContain('Too many attempts');
  });
});
