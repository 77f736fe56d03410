import { HttpClient, HttpContext, HttpErrorResponse, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';

import { REPORT_HTTP_ERRORS, apiErrorInterceptor } from './api-error-interceptor';

describe('apiErrorInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;
  let snackBar: jasmine.SpyObj<MatSnackBar>;

  beforeEach(() => {
    snackBar = jasmine.createSpyObj<MatSnackBar>('MatSnackBar', ['open']);
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(withInterceptors([apiErrorInterceptor])),
        provideHttpClientTesting(),
        { provide: MatSnackBar, useValue: snackBar },
      ],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it("shows the API's message in an error snackbar", () => {
    http.get('/api/v1/species/42').subscribe({ error: () => undefined });

    backend
      .expectOne('/api/v1/species/42')
      .flush({ error: 'NotFound', message: 'No species with id 42.', details: null }, { status: 404, statusText: 'Not Found' });

    expect(snackBar.open).toHaveBeenCalledOnceWith(
      'No species with id 42.',
      'Dismiss',
      jasmine.objectContaining({ panelClass: 'kx-snackbar-error', politeness: 'assertive' }),
    );
  });

  it('passes the error on to the caller', () => {
    let received: unknown;
    http.get('/api/v1/releases').subscribe({ error: (error: unknown) => (received = error) });

    backend
      .expectOne('/api/v1/releases')
      .flush({ error: 'Conflict', message: 'Release 2025.1 is published.' }, { status: 409, statusText: 'Conflict' });

    expect(received).toBeInstanceOf(HttpErrorResponse);
    expect((received as HttpErrorResponse).status).toBe(409);
  });

  it('tells the reader when the server cannot be reached', () => {
    http.get('/api/v1/releases').subscribe({ error: () => undefined });

    backend.expectOne('/api/v1/releases').error(new ProgressEvent('error'), { status: 0 });

    expect(snackBar.open.calls.mostRecent().args[0]).toContain('cannot reach its server');
  });

  it('stays quiet for a request whose caller shows the error itself', () => {
    const context = new HttpContext().set(REPORT_HTTP_ERRORS, false);
    http.get('/api/v1/health', { context }).subscribe({ error: () => undefined });

    backend.expectOne('/api/v1/health').flush({ status: 'degraded' }, { status: 503, statusText: 'Service Unavailable' });

    expect(snackBar.open).not.toHaveBeenCalled();
  });

  it('does nothing for a successful response', () => {
    let body: unknown;
    http.get('/api/v1/releases').subscribe((response) => (body = response));

    backend.expectOne('/api/v1/releases').flush([{ version: '2025.1' }]);

    expect(body).toEqual([{ version: '2025.1' }]);
    expect(snackBar.open).not.toHaveBeenCalled();
  });
});
