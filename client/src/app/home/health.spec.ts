import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { REPORT_HTTP_ERRORS } from '../core/api-error-interceptor';
import { HealthCheck, HealthService } from './health';

describe('HealthService', () => {
  let backend: HttpTestingController;
  let outcomes: HealthCheck[];

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    outcomes = [];
    TestBed.inject(HealthService)
      .check()
      .subscribe((outcome) => outcomes.push(outcome));
  });

  afterEach(() => backend.verify());

  it('reports checking, then ok when the API and database are up', () => {
    const request = backend.expectOne('/api/v1/health');
    expect(outcomes).toEqual([{ state: 'checking' }]);
    expect(request.request.context.get(REPORT_HTTP_ERRORS)).toBeFalse();

    request.flush({ status: 'ok', database: 'up', version: '0.1.0' });

    expect(outcomes[1]).toEqual({ state: 'ok', report: { status: 'ok', database: 'up', version: '0.1.0' } });
  });

  it('reads the 503 body as a degraded report', () => {
    backend
      .expectOne('/api/v1/health')
      .flush({ status: 'degraded', database: 'down', version: '0.1.0' }, { status: 503, statusText: 'Service Unavailable' });

    expect(outcomes[1]).toEqual({ state: 'degraded', report: { status: 'degraded', database: 'down', version: '0.1.0' } });
  });

  it('reports an unreachable API with the reason', () => {
    backend.expectOne('/api/v1/health').error(new ProgressEvent('error'), { status: 0 });

    expect(outcomes[1].state).toBe('unreachable');
    expect(outcomes[1]).toEqual(jasmine.objectContaining({ message: jasmine.stringContaining('cannot reach') }));
  });
});
