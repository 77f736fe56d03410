import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, catchError, map, shareReplay, throwError } from 'rxjs';

import { ReleaseSummary } from '../shared/release-picker/release-summary';
import { API_BASE_URL } from './api-base-url';

/** The release list, fetched once per visit (published releases never change). */
@Injectable({ providedIn: 'root' })
export class ReleasesService {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/releases`;
  private cached: Observable<readonly ReleaseSummary[]> | null = null;

  /** Every release, newest first as the API orders them; a failed load is retried next time. */
  list(): Observable<readonly ReleaseSummary[]> {
    this.cached ??= this.http.get<{ items: ReleaseSummary[] }>(this.url).pipe(
      map((response) => response.items),
      catchError((error: unknown) => {
        this.cached = null;
        return throwError(() => error);
      }),
      shareReplay({ bufferSize: 1, refCount: false }),
    );
    return this.cached;
  }
}
