import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';

import { API_BASE_URL } from '../core/api-base-url';

export type ApiKeyScope = 'read' | 'write';

/** An API key as listed: never its secret, which is shown once when the key is created. */
export interface ApiKey {
  readonly id: string | number;
  readonly name: string;
  readonly scope: ApiKeyScope;
  /** The first characters of the secret, to recognise the key by. */
  readonly prefix: string;
  readonly createdAt: string;
  readonly lastUsedAt: string | null;
  readonly revokedAt: string | null;
}

export interface CreatedApiKey extends ApiKey {
  readonly secret: string;
}

/** The signed-in reader's API keys for downstream tools (`/api/v1/api-keys`). */
@Injectable({ providedIn: 'root' })
export class ApiKeysService {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/api-keys`;

  list(): Observable<readonly ApiKey[]> {
    return this.http.get<{ items: ApiKey[] }>(this.url).pipe(map((response) => response.items));
  }

  create(name: string, scope: ApiKeyScope): Observable<CreatedApiKey> {
    return this.http.post<CreatedApiKey>(this.url, { name, scope });
  }

  revoke(id: string | number): Observable<void> {
    return this.http.delete<void>(`${this.url}/${encodeURIComponent(id)}`);
  }
}
