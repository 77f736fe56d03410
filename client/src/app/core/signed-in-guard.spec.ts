import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import { AuthService } from './auth';
import { signedInGuard } from './signed-in-guard';

@Component({ template: '<p>account area</p>' })
class AccountArea {}

@Component({ template: '<p>sign-in page</p>' })
class SignInArea {}

describe('signedInGuard', () => {
  let signedIn: boolean;
  let restoreSession: jasmine.Spy;

  beforeEach(() => {
    signedIn = false;
    restoreSession = jasmine.createSpy('restoreSession').and.callFake(() => Promise.resolve());
    TestBed.configureTestingModule({
      providers: [
        provideRouter([
          { path: 'account', canMatch: [signedInGuard], component: AccountArea },
          { path: 'sign-in', component: SignInArea },
        ]),
        { provide: AuthService, useValue: { restoreSession, isSignedIn: () => signedIn } },
      ],
    });
  });

  it('lets a signed-in reader in, after the session check', async () => {
    signedIn = true;
    const harness = await RouterTestingHarness.create('/account');
    expect(restoreSession).toHaveBeenCalled();
    expect(harness.routeNativeElement!.textContent).toContain('account area');
  });

  it('sends anyone else to sign in, returning to the full address afterwards', async () => {
    const harness = await RouterTestingHarness.create('/account?tab=keys');
    expect(harness.routeNativeElement!.textContent).toContain('sign-in page');
    const router = TestBed.inject(Router);
    expect(router.url).toBe('/sign-in?returnUrl=%2Faccount%3Ftab%3Dkeys');
  });
});
