import { HttpErrorResponse } from '@angular/common/http';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { of, throwError } from 'rxjs';

import { AuthService } from '../core/auth';
import { ResetPasswordPage } from './reset-password-page';

describe('ResetPasswordPage', () => {
  let fixture: ComponentFixture<ResetPasswordPage>;
  let page: HTMLElement;
  let auth: jasmine.SpyObj<Pick<AuthService, 'requestPasswordReset' | 'confirmPasswordReset'>>;

  function type(selector: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function create(token?: string): Promise<void> {
    fixture = TestBed.createComponent(ResetPasswordPage);
    if (token) {
      fixture.componentRef.setInput('token', token);
    }
    page = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  }

  async function submit(): Promise<void> {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  }

  beforeEach(() => {
    auth = jasmine.createSpyObj('AuthService', ['requestPasswordReset', 'confirmPasswordReset']);
    TestBed.configureTestingModule({ providers: [provideRouter([]), { provide: AuthService, useValue: auth }] });
  });

  it('sends a reset link and says so without telling whether the address exists', async () => {
    auth.requestPasswordReset.and.returnValue(of(undefined));
    await create();
    type('input[type="email"]', 'someone@kelvindex.test');
    await submit();

    expect(auth.requestPasswordReset).toHaveBeenCalledOnceWith('someone@kelvindex.test');
    expect(page.querySelector('[role="status"]')!.textContent).toContain('If that address has a Kelvindex account');
    expect(page.querySelector('form')).toBeNull();
  });

  it('sets the new password from the link’s token', async () => {
    auth.confirmPasswordReset.and.returnValue(of(undefined));
    await create('t'.repeat(40));
    type('input[formcontrolname="password"]', 'a-new-password');
    type('input[formcontrolname="confirmation"]', 'a-new-password');
    await submit();

    expect(auth.confirmPasswordReset).toHaveBeenCalledOnceWith('t'.repeat(40), 'a-new-password');
    expect(page.querySelector('[role="status"]')!.textContent).toContain('Your password is reset');
    expect(page.querySelector('a[href="/sign-in"]')).not.toBeNull();
  });

  it('refuses a short or mistyped password before calling the API', async () => {
    await create('t'.repeat(40));
    type('input[formcontrolname="password"]', 'short');
    type('input[formcontrolname="confirmation"]', 'shorter');
    await submit();

    expect(auth.confirmPasswordReset).not.toHaveBeenCalled();
    expect(page.textContent).toContain('Use at least 10 characters.');
    expect(page.textContent).toContain('The two passwords differ.');
  });

  it('shows why an expired link failed', async () => {
    auth.confirmPasswordReset.and.returnValue(
      throwError(() => new HttpErrorResponse({ status: 422, error: { error: 'unprocessable', message: 'The link has expired.' } })),
    );
    await create('t'.repeat(40));
    type('input[formcontrolname="password"]', 'a-new-password');
    type('input[formcontrolname="confirmation"]', 'a-new-password');
    await submit();
    expect(page.querySelector('[role="alert"]')!.textContent).toContain('The link has expired.');
  });
});
