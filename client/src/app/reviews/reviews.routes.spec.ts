import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import { AuthService, Role } from '../core/auth';
import { roleGuard } from '../core/role-guard';
import { PROPOSAL_ROUTES } from '../proposals/proposals.routes';
import { RELEASE_ROUTES } from '../releases/releases.routes';
import { REVIEW_ROUTES } from './reviews.routes';

@Component({ template: '<p>elsewhere</p>' })
class Elsewhere {}

// The editorial areas as app.routes.ts mounts them, with their guards; pages load lazily, so the
// checks look at where the router lands, not at the pages themselves.
describe('editorial routes and their guards', () => {
  let roles: Role[] | null;
  let backend: HttpTestingController;

  beforeEach(() => {
    roles = null;
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([
          { path: 'proposals', canMatch: [roleGuard('steward', 'reviewer', 'editor', 'admin')], children: PROPOSAL_ROUTES },
          { path: 'reviews', canMatch: [roleGuard('steward', 'reviewer', 'editor', 'admin')], children: REVIEW_ROUTES },
          { path: 'releases', children: RELEASE_ROUTES },
          { path: 'sign-in', component: Elsewhere },
          { path: 'not-allowed', component: Elsewhere },
          { path: '**', component: Elsewhere },
        ]),
        {
          provide: AuthService,
          useValue: {
            restoreSession: () => Promise.resolve(),
            isSignedIn: () => roles !== null,
            hasAnyRole: (wanted: Role[]) => wanted.some((role) => roles?.includes(role)),
            user: () => (roles ? { id: 'u1', roles } : null),
          },
        },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
  });

  const url = () => TestBed.inject(Router).url;

  it('sends an anonymous reader of a proposal link to sign in, and back afterwards', async () => {
    await RouterTestingHarness.create('/proposals/p1');
    expect(url()).toBe('/sign-in?returnUrl=%2Fproposals%2Fp1');
  });

  it('keeps the steward’s list of proposals to stewards', async () => {
    roles = ['reader', 'reviewer'];
    await RouterTestingHarness.create('/proposals');
    expect(url()).toBe('/not-allowed?roles=steward');
  });

  it('keeps the review queue from stewards, but opens a proposal’s review page to them', async () => {
    roles = ['reader', 'steward'];
    const harness = await RouterTestingHarness.create('/reviews');
    expect(url()).toBe('/not-allowed?roles=reviewer,editor,admin');
    const navigation = harness.navigateByUrl('/reviews/p1');
    await new Promise((resolve) => setTimeout(resolve));
    backend.expectOne('/api/v1/proposals/p1').flush({ error: 'not_found', message: 'No proposal p1' }, { status: 404, statusText: 'Not Found' });
    await navigation;
    expect(url()).toBe('/not-found');
  });

  it('keeps a reader without an editorial role out of proposals', async () => {
    roles = ['reader'];
    await RouterTestingHarness.create('/proposals/p1');
    expect(url()).toBe('/not-allowed?roles=steward,reviewer,editor,admin');
  });

  it('lets anyone read releases, and only editors assemble one', async () => {
    roles = ['reader', 'steward'];
    await RouterTestingHarness.create('/releases/2027.1/edit');
    expect(url()).toBe('/not-allowed?roles=editor');
  });
});
