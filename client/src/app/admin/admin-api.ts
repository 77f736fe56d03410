import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';

import { API_BASE_URL } from '../core/api-base-url';
import { Role } from '../core/auth';

export const ROLES: readonly Role[] = ['reader', 'steward', 'reviewer', 'editor', 'admin'];

export interface ManagedUser {
  readonly id: string;
  readonly email: string;
  readonly name: string;
  readonly roles: readonly Role[];
  readonly active: boolean;
  readonly emailVerified: boolean;
  readonly lastSignInAt: string | null;
  readonly createdAt: string;
}

export interface ManagedApiKey {
  readonly id: string;
  readonly name: string;
  readonly scope: 'read' | 'write';
  readonly prefix: string;
  readonly createdAt: string;
  readonly lastUsedAt: string | null;
  readonly revokedAt: string | null;
  readonly owner: { readonly id: string; readonly email: string };
}

/** One line of the audit trail (append-only). */
export interface AuditEntry {
  readonly id: string;
  readonly occurredAt: string;
  readonly actorUserId: string | null;
  readonly actorApiKeyId: string | null;
  readonly actorLabel: string | null;
  readonly action: string;
  readonly entityType: string | null;
  readonly entityId: string | null;
  readonly details: Readonly<Record<string, unknown>>;
  readonly ipAddress: string | null;
  readonly userAgent: string | null;
}

export interface AuditQuery {
  /** E-mail (part of it) or user id. */
  readonly user?: string;
  /** Action prefix, e.g. `proposal.` or `release.publish`. */
  readonly action?: string;
  readonly entityType?: string;
  readonly entityId?: string;
  /** ISO dates (inclusive). */
  readonly from?: string;
  readonly to?: string;
  readonly page?: number;
  readonly pageSize?: number;
}

export interface AuditPage {
  readonly items: readonly AuditEntry[];
  readonly total: number;
  readonly page: number;
  readonly pageSize: number;
}

/** An e-mail the local SMTP server captured (development outbox). */
export interface CapturedMail {
  readonly id: string;
  readonly receivedAt: string;
  readonly from: string;
  readonly to: readonly string[];
  readonly subject: string;
  readonly text: string;
  readonly html: string;
}

/** What admins manage: users and roles, invitations, API keys, the audit trail, the development outbox. */
@Injectable({ providedIn: 'root' })
export class AdminApi {
  private readonly http = inject(HttpClient);
  private readonly baseUrl = inject(API_BASE_URL);

  users(): Observable<readonly ManagedUser[]> {
    return this.http.get<{ items: ManagedUser[] }>(`${this.baseUrl}/users`).pipe(map((answer) => answer.items));
  }

  invite(email: string, roles: readonly Role[]): Observable<{ email: string; roles: Role[]; expiresInHours: number }> {
    return this.http.post<{ email: string; roles: Role[]; expiresInHours: number }>(`${this.baseUrl}/users/invitations`, { email, roles });
  }

  setRoles(userId: string, roles: readonly Role[]): Observable<ManagedUser> {
    return this.http.put<ManagedUser>(`${this.baseUrl}/users/${encodeURIComponent(userId)}/roles`, { roles });
  }

  setActive(userId: string, active: boolean): Observable<ManagedUser> {
    return this.http.post<ManagedUser>(`${this.baseUrl}/users/${encodeURIComponent(userId)}/${active ? 'reactivate' : 'deactivate'}`, null);
  }

  apiKeys(): Observable<readonly ManagedApiKey[]> {
    return this.http.get<{ items: ManagedApiKey[] }>(`${this.baseUrl}/api-keys/all`).pipe(map((answer) => answer.items));
  }

  revokeKey(id: string): Observable<void> {
    return this.http.delete<void>(`${this.baseUrl}/api-keys/${encodeURIComponent(id)}`);
  }

  audit(query: AuditQuery): Observable<AuditPage> {
    let params = new HttpParams();
    for (const [key, value] of Object.entries(query)) {
      if (value !== undefined && value !== null && value !== '') {
        params = params.set(key, String(value));
      }
    }
    return this.http.get<AuditPage>(`${this.baseUrl}/audit`, { params });
  }

  outbox(to?: string): Observable<readonly CapturedMail[]> {
    const params = to ? new HttpParams().set('to', to) : new HttpParams();
    return this.http.get<{ items: CapturedMail[] }>(`${this.baseUrl}/dev/outbox`, { params }).pipe(map((answer) => answer.items));
  }
}
