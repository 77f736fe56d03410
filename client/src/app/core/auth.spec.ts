import { HttpErrorResponse, provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';

import { REPORT_HTTP_ERRORS } from './api-error-interceptor';
import { AuthService, SKIP_AUTH, SignedInSession, User } from './auth';

const steward: User = { id: 2, email: 'steward@kelvindex.test', name: 'Tomasz Okafor', roles: ['reader', 'steward'] };
const session: SignedInSession = { accessToken: 'token-1', expiresIn: 900, user: steward };

describe('AuthService', () => {
  let auth: AuthService;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])] });
    auth = TestBed.inject(AuthService);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('signs in, keeping the token in memory and the user in a signal', () => {
    let user: User | undefined;
    auth.signIn('steward@kelvindex.test', 'kelvindex-demo').subscribe((signedIn) => (user = signedIn));

    const request = backend.expectOne('/api/v1/auth/login');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ email: 'steward@kelvindex.test', password: 'kelvindex-demo' });
    expect(request.request.context.get(SKIP_AUTH)).toBeTrue();
    expect(request.request.context.get(REPORT_HTTP_ERRORS)).toBeFalse();
    request.flush(session);

    expect(user).toEqual(steward);
    expect(auth.user()).toEqual(steward);
    expect(auth.isSignedIn()).toBeTrue();
    expect(auth.accessToken()).toBe('token-1');
    expect(auth.hasAnyRole(['steward', 'editor'])).toBeTrue();
    expect(auth.hasAnyRole(['admin'])).toBeFalse();
  });

  it('passes a failed sign-in on without signing in', () => {
    let status = 0;
    auth.signIn('a@b.test', 'wrong').subscribe({ error: (error: HttpErrorResponse) => (status = error.status) });
    backend.expectOne('/api/v1/auth/login').flush({ error: 'unauthorized', message: 'nope' }, { status: 401, statusText: 'Unauthorized' });
    expect(status).toBe(401);
    expect(auth.isSignedIn()).toBeFalse();
  });

  it('restores a session from the refresh cookie once, quietly', async () => {
    const first = auth.restoreSession();
    const second = auth.restoreSession();
    const request = backend.expectOne('/api/v1/auth/refresh');
    expect(request.request.body).toBeNull();
    request.flush(session);
    await Promise.all([first, second]);
    expect(auth.user()).toEqual(steward);
  });

  it('resolves the session check when there is no session', async () => {
    const check = auth.restoreSession();
    backend.expectOne('/api/v1/auth/refresh').flush({ error: 'unauthorized', message: 'No session' }, { status: 401, statusText: 'Unauthorized' });
    await expectAsync(check).toBeResolved();
    expect(auth.isSignedIn()).toBeFalse();
  });

  it('shares one refresh between concurrent callers', () => {
    const tokens: string[] = [];
    auth.refresh().subscribe((s) => tokens.push(s.accessToken));
    auth.refresh().subscribe((s) => tokens.push(s.accessToken));
    backend.expectOne('/api/v1/auth/refresh').flush({ ...session, accessToken: 'token-2' });
    expect(tokens).toEqual(['token-2', 'token-2']);

    auth.refresh().subscribe();
    backend.expectOne('/api/v1/auth/refresh').flush(session);
  });

  it('signs out on the server and here, even when the server call fails', () => {
    auth.signIn('steward@kelvindex.test', 'kelvindex-demo').subscribe();
    backend.expectOne('/api/v1/auth/login').flush(session);

    let done = false;
    auth.signOut().subscribe({ complete: () => (done = true) });
    backend.expectOne('/api/v1/auth/logout').flush(null, { status: 500, statusText: 'Server Error' });

    expect(done).toBeTrue();
    expect(auth.isSignedIn()).toBeFalse();
    expect(auth.accessToken()).toBeNull();
  });

  it('ends an expired session and re-runs the current navigation so guards apply', () => {
    const router = TestBed.inject(Router);
    const navigate = spyOn(router, 'navigateByUrl').and.resolveTo(true);
    auth.refresh().subscribe();
    backend.expectOne('/api/v1/auth/refresh').flush(session);

    auth.endSession();

    expect(auth.isSignedIn()).toBeFalse();
    expect(navigate).toHaveBeenCalledOnceWith('/', { onSameUrlNavigation: 'reload' });
  });

  it('accepts an invitation and is then signed in', () => {
    auth.acceptInvitation('t'.repeat(32), 'New Person', 'a-long-password').subscribe();
    const request = backend.expectOne('/api/v1/auth/invitations/accept');
    expect(request.request.body).toEqual({ token: 't'.repeat(32), name: 'New Person', password: 'a-long-password' });
    request.flush(session, { status: 201, statusText: 'Created' });
    expect(auth.isSignedIn()).toBeTrue();
  });

  it('requests and confirms a password reset', () => {
    auth.requestPasswordReset('someone@kelvindex.test').subscribe();
    expect(backend.expectOne('/api/v1/auth/password-reset/request').request.body).toEqual({ email: 'someone@kelvindex.test' });

    auth.confirmPasswordReset('tok', 'new-password-1').subscribe();
    expect(backend.expectOne('/api/v1/auth/password-reset/confirm').request.body).toEqual({ token: 'tok', password: 'new-password-1' });
  });

  it('changes the password with the token attached by the interceptor', () => {
    auth.changePassword('old-password', 'new-password-1').subscribe();
    const request = backend.expectOne('/api/v1/auth/change-password');
    expect(request.request.body).toEqual({ currentPassword: 'old-password', newPassword: 'new-password-1' });
    expect(request.request.context.get(SKIP_AUTH)).toBeFalse();
  });
});
