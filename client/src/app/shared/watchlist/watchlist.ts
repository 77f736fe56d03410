import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';

import { API_BASE_URL } from '../../core/api-base-url';

/** A species the signed-in reader watches; they are told when its values change. */
export interface WatchedSpecies {
  readonly speciesId: string | number;
  readonly formula: string;
  readonly name: string;
  readonly createdAt: string;
}

/** The signed-in reader's watchlist (`/api/v1/watchlist`). */
@Injectable({ providedIn: 'root' })
export class WatchlistService {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/watchlist`;

  list(): Observable<readonly WatchedSpecies[]> {
    return this.http.get<{ items: WatchedSpecies[] }>(this.url).pipe(map((response) => response.items));
  }

  watch(speciesId: string | number): Observable<void> {
    return this.http.put<void>(`${this.url}/${encodeURIComponent(speciesId)}`, null);
  }

  unwatch(speciesId: string | number): Observable<void> {
    return this.http.delete<void>(`${this.url}/${encodeURIComponent(speciesId)}`);
  }
}
