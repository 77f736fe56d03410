import { HttpClient, HttpErrorResponse, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, provideRouter } from '@angular/router';

import { apiErrorInterceptor } from './api-error-interceptor';
import { AuthService, SignedInSession } from './auth';
import { authInterceptor } from './auth-interceptor';

const session = (token: string): SignedInSession => ({
  accessToken: token,
  expiresIn: 900,
  user: { id: 1, email: 'reader@kelvindex.test', name: 'Rosa Lindqvist', roles: ['reader'] },
});

describe('authInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;
  let auth: AuthService;
  let snackBar: jasmine.SpyObj<MatSnackBar>;

  function signIn(token = 'old-token'): void {
    auth.signIn('reader@kelvindex.test', 'kelvindex-demo').subscribe();
    backend.expectOne('/api/v1/auth/login').flush(session(token));
  }

  beforeEach(() => {
    snackBar = jasmine.createSpyObj<MatSnackBar>('MatSnackBar', ['open']);
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(withInterceptors([apiErrorInterceptor, authInterceptor])),
        provideHttpClientTesting(),
        provideRouter([]),
        { provide: MatSnackBar, useValue: snackBar },
      ],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
    auth = TestBed.inject(AuthService);
    spyOn(TestBed.inject(Router), 'navigateByUrl').and.resolveTo(true);
  });

  afterEach(() => backend.verify());

  it('sends no Authorization header while signed out', () => {
    http.get('/api/v1/species').subscribe();
    expect(backend.expectOne('/api/v1/species').request.headers.has('Authorization')).toBeFalse();
  });

  it('attaches the access token to API requests once signed in', () => {
    signIn();
    http.get('/api/v1/watchlist').subscribe();
    expect(backend.expectOne('/api/v1/watchlist').request.headers.get('Authorization')).toBe('Bearer old-token');
  });

  it('keeps the token away from other hosts and files', () => {
    signIn();
    http.get('icons/menu.svg', { responseType: 'text' }).subscribe();
    expect(backend.expectOne('icons/menu.svg').request.headers.has('Authorization')).toBeFalse();
  });

  it('refreshes an expired token once and retries the request, without showing the 401', () => {
    signIn();
    let body: unknown;
    http.get('/api/v1/watchlist').subscribe((response) => (body = response));

    backend.expectOne('/api/v1/watchlist').flush({ error: 'unauthorized', message: 'Token expired' }, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/v1/auth/refresh').flush(session('new-token'));
    const retry = backend.expectOne('/api/v1/watchlist');
    expect(retry.request.headers.get('Authorization')).toBe('Bearer new-token');
    retry.flush({ items: [] });

    expect(body).toEqual({ items: [] });
    expect(auth.accessToken()).toBe('new-token');
    expect(snackBar.open).not.toHaveBeenCalled();
  });

  it('refreshes once for several requests that expire together', () => {
    signIn();
    http.get('/api/v1/watchlist').subscribe();
    http.get('/api/v1/api-keys').subscribe();
    for (const url of ['/api/v1/watchlist', '/api/v1/api-keys']) {
      backend.expectOne(url).flush({ error: 'unauthorized', message: 'Token expired' }, { status: 401, statusText: 'Unauthorized' });
    }
    backend.expectOne('/api/v1/auth/refresh').flush(session('new-token'));
    backend.expectOne('/api/v1/watchlist').flush({ items: [] });
    backend.expectOne('/api/v1/api-keys').flush({ items: [] });
    expect(auth.isSignedIn()).toBeTrue();
  });

  it('signs out when the refresh fails, and reports the original failure', () => {
    signIn();
    let failure: HttpErrorResponse | undefined;
    http.get('/api/v1/watchlist').subscribe({ error: (error: HttpErrorResponse) => (failure = error) });

    backend.expectOne('/api/v1/watchlist').flush({ error: 'unauthorized', message: 'Sign in again.' }, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/v1/auth/refresh').flush({ error: 'unauthorized', message: 'Refresh token revoked' }, { status: 401, statusText: 'Unauthorized' });

    expect(failure?.status).toBe(401);
    expect(auth.isSignedIn()).toBeFalse();
    expect(snackBar.open).toHaveBeenCalledOnceWith('Sign in again.', 'Dismiss', jasmine.any(Object));
  });

  it('retries only once when the retried request is refused again', () => {
    signIn();
    let status = 0;
    http.get('/api/v1/api-keys').subscribe({ error: (error: HttpErrorResponse) => (status = error.status) });
    backend.expectOne('/api/v1/api-keys').flush({ error: 'unauthorized', message: 'x' }, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/v1/auth/refresh').flush(session('new-token'));
    backend.expectOne('/api/v1/api-keys').flush({ error: 'unauthorized', message: 'x' }, { status: 401, statusText: 'Unauthorized' });
    expect(status).toBe(401);
  });

  it('leaves other errors alone', () => {
    signIn();
    let status = 0;
    http.get('/api/v1/api-keys').subscribe({ error: (error: HttpErrorResponse) => (status = error.status) });
    backend.expectOne('/api/v1/api-keys').flush({ error: 'forbidden', message: 'No' }, { status: 403, statusText: 'Forbidden' });
    expect(status).toBe(403);
    expect(auth.isSignedIn()).toBeTrue();
  });

  it('does not try to refresh for a wrong password at sign-in', () => {
    auth.signIn('reader@kelvindex.test', 'wrong').subscribe({ error: () => undefined });
    backend.expectOne('/api/v1/auth/login').flush({ error: 'unauthorized', message: 'x' }, { status: 401, statusText: 'Unauthorized' });
    backend.expectNone('/api/v1/auth/refresh');
    expect(snackBar.open).not.toHaveBeenCalled();
  });
});
