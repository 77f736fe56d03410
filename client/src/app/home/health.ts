import { HttpClient, HttpContext, HttpErrorResponse } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, catchError, map, of, startWith } from 'rxjs';

import { describeHttpError } from '../core/api-error';
import { REPORT_HTTP_ERRORS } from '../core/api-error-interceptor';
import { API_BASE_URL } from '../core/api-base-url';

/** Body of `GET /api/v1/health`, with 200 when everything is up and 503 when degraded. */
export interface HealthReport {
  readonly status: 'ok' | 'degraded';
  readonly database: 'up' | 'down';
  readonly version?: string;
}

export type HealthCheck =
  | { readonly state: 'checking' }
  | { readonly state: 'ok'; readonly report: HealthReport }
  | { readonly state: 'degraded'; readonly report: HealthReport }
  | { readonly state: 'unreachable'; readonly message: string };

/** Asks the API whether it and its database are up. */
@Injectable({ providedIn: 'root' })
export class HealthService {
  private readonly http = inject(HttpClient);
  private readonly apiBaseUrl = inject(API_BASE_URL);

  /** Emits `checking` at once, then the outcome of one request; never errors. */
  check(): Observable<HealthCheck> {
    // The caller shows the outcome, including failures, so the interceptor stays quiet.
    const context = new HttpContext().set(REPORT_HTTP_ERRORS, false);
    return this.http.get<HealthReport>(`${this.apiBaseUrl}/health`, { context }).pipe(
      map((report): HealthCheck => ({ state: report.status === 'ok' ? 'ok' : 'degraded', report })),
      catchError((error: unknown) => of(failedCheck(error))),
      startWith<HealthCheck>({ state: 'checking' }),
    );
  }
}

function failedCheck(error: unknown): HealthCheck {
  if (error instanceof HttpErrorResponse && isHealthReport(error.error)) {
    return { state: 'degraded', report: error.error };
  }
  return {
    state: 'unreachable',
    message: error instanceof HttpErrorResponse ? describeHttpError(error) : 'The health check failed unexpectedly.',
  };
}

function isHealthReport(body: unknown): body is HealthReport {
  return typeof body === 'object' && body !== null && typeof (body as Partial<HealthReport>).status === 'string';
}
