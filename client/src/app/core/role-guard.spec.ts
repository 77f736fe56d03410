import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import { AuthService, Role } from './auth';
import { roleGuard } from './role-guard';

@Component({ template: '<p>review queue</p>' })
class ReviewArea {}

@Component({ template: '<p>elsewhere</p>' })
class Elsewhere {}

describe('roleGuard', () => {
  let roles: Role[] | null;

  beforeEach(() => {
    roles = null;
    TestBed.configureTestingModule({
      providers: [
        provideRouter([
          { path: 'reviews', canMatch: [roleGuard('reviewer', 'editor')], component: ReviewArea },
          { path: 'sign-in', component: Elsewhere },
          { path: 'not-allowed', component: Elsewhere },
        ]),
        {
          provide: AuthService,
          useValue: {
            restoreSession: () => Promise.resolve(),
            isSignedIn: () => roles !== null,
            hasAnyRole: (wanted: Role[]) => wanted.some((role) => roles?.includes(role)),
          },
        },
      ],
    });
  });

  it('lets in a reader holding one of the roles', async () => {
    roles = ['reader', 'editor'];
    const harness = await RouterTestingHarness.create('/reviews');
    expect(harness.routeNativeElement!.textContent).toContain('review queue');
  });

  it('sends an anonymous reader to sign in', async () => {
    await RouterTestingHarness.create('/reviews');
    expect(TestBed.inject(Router).url).toBe('/sign-in?returnUrl=%2Freviews');
  });

  it('tells a signed-in reader without the role which roles it takes', async () => {
    roles = ['reader'];
    await RouterTestingHarness.create('/reviews');
    expect(TestBed.inject(Router).url).toBe('/not-allowed?roles=reviewer,editor');
  });
});
