import { HttpErrorResponse } from '@angular/common/http';
import { signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { of, throwError } from 'rxjs';

import { AuthService } from '../core/auth';
import { ChangePasswordPage } from './change-password-page';

describe('ChangePasswordPage', () => {
  let fixture: ComponentFixture<ChangePasswordPage>;
  let page: HTMLElement;
  let changePassword: jasmine.Spy;
  let signIn: jasmine.Spy;

  function type(name: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(`input[formcontrolname="${name}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function fillAndSubmit(): Promise<void> {
    type('currentPassword', 'kelvindex-demo');
    type('newPassword', 'a-better-password');
    type('confirmation', 'a-better-password');
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  }

  beforeEach(async () => {
    changePassword = jasmine.createSpy('changePassword');
    signIn = jasmine.createSpy('signIn').and.returnValue(of({}));
    TestBed.configureTestingModule({
      providers: [
        provideRouter([]),
        {
          provide: AuthService,
          useValue: { changePassword, signIn, user: signal({ id: 1, email: 'reader@kelvindex.test', name: 'R', roles: ['reader'] }) },
        },
      ],
    });
    fixture = TestBed.createComponent(ChangePasswordPage);
    page = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  it('changes the password, then signs in again with it to keep the session', async () => {
    changePassword.and.returnValue(of(undefined));
    await fillAndSubmit();
    expect(changePassword).toHaveBeenCalledOnceWith('kelvindex-demo', 'a-better-password');
    expect(signIn).toHaveBeenCalledOnceWith('reader@kelvindex.test', 'a-better-password');
    expect(page.querySelector('[role="status"]')!.textContent).toContain('Your password is changed.');
    expect(page.querySelector<HTMLInputElement>('input[formcontrolname="newPassword"]')!.value).toBe('');
  });

  it('says when the current password is wrong', async () => {
    changePassword.and.returnValue(
      throwError(() => new HttpErrorResponse({ status: 422, error: { error: 'unprocessable', message: 'The current password is wrong' } })),
    );
    await fillAndSubmit();
    expect(page.querySelector('[role="alert"]')!.textContent).toContain('The current password is wrong');
    expect(signIn).not.toHaveBeenCalled();
  });
});
