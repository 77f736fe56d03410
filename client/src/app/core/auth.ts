import { HttpClient, HttpContext, HttpContextToken } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { Router } from '@angular/router';
import { Observable, catchError, finalize, firstValueFrom, map, of, shareReplay, tap } from 'rxjs';

import { REPORT_HTTP_ERRORS } from './api-error-interceptor';
import { API_BASE_URL } from './api-base-url';

export type Role = 'reader' | 'steward' | 'reviewer' | 'editor' | 'admin';

/** The signed-in person, as `GET /api/v1/auth/me` and the sign-in calls describe them. */
export interface User {
  readonly id: string | number;
  readonly email: string;
  readonly name: string;
  readonly roles: readonly Role[];
}

/** Answer of sign-in, refresh and invitation acceptance; the refresh token travels as a cookie. */
export interface SignedInSession {
  readonly accessToken: string;
  /** Seconds until the access token expires. */
  readonly expiresIn: number;
  readonly user: User;
}

/**
 * Set on requests that must reach the API without the auth interceptor's help: the sign-in,
 * refresh and one-time-token calls, whose 401 means "wrong credentials", never "token expired".
 */
export const SKIP_AUTH = new HttpContextToken<boolean>(() => false);

/**
 * The session: who is signed in and their access token, kept in memory only (a reload asks the
 * API for a new one with the httpOnly refresh cookie).
 */
@Injectable({ providedIn: 'root' })
export class AuthService {
  private readonly http = inject(HttpClient);
  private readonly router = inject(Router);
  private readonly authUrl = `${inject(API_BASE_URL)}/auth`;
  private readonly token = signal<string | null>(null);
  private readonly currentUser = signal<User | null>(null);
  private refreshInFlight: Observable<SignedInSession> | null = null;
  private sessionCheck: Promise<void> | null = null;

  readonly user = this.currentUser.asReadonly();
  readonly accessToken = this.token.asReadonly();
  readonly isSignedIn = computed(() => this.currentUser() !== null);

  hasAnyRole(roles: readonly Role[]): boolean {
    const user = this.currentUser();
    return user !== null && roles.some((role) => user.roles.includes(role));
  }

  /**
   * Asks once, quietly, whether the browser still holds a refresh cookie and so a session.
   * Resolves when that is known, never rejects; guards await it before deciding.
   */
  restoreSession(): Promise<void> {
    this.sessionCheck ??= firstValueFrom(
      this.refresh().pipe(
        map(() => undefined),
        catchError(() => of(undefined)),
      ),
    );
    return this.sessionCheck;
  }

  signIn(email: string, password: string): Observable<User> {
    return this.http
      .post<SignedInSession>(`${this.authUrl}/login`, { email, password }, { context: quietAuthContext() })
      .pipe(map((session) => this.startSession(session)));
  }

  /**
   * Trades the refresh cookie for a new access token. Concurrent callers (several requests that
   * met a 401 at once) share one request, so the rotating refresh token is used only once.
   */
  refresh(): Observable<SignedInSession> {
    this.refreshInFlight ??= this.http
      .post<SignedInSession>(`${this.authUrl}/refresh`, null, { context: quietAuthContext() })
      .pipe(
        tap((session) => this.startSession(session)),
        finalize(() => (this.refreshInFlight = null)),
        shareReplay({ bufferSize: 1, refCount: false }),
      );
    return this.refreshInFlight;
  }

  /** Revokes the refresh token on the server and forgets the session here, whatever the answer. */
  signOut(): Observable<void> {
    return this.http.post<void>(`${this.authUrl}/logout`, null, { context: quietAuthContext() }).pipe(
      catchError(() => of(undefined)),
      map(() => undefined),
      finalize(() => this.clear()),
    );
  }

  /**
   * Forgets a session the API no longer accepts, then re-runs the current navigation so that a
   * page which needs a signed-in user sends the reader to the sign-in page.
   */
  endSession(): void {
    if (!this.isSignedIn() && this.token() === null) {
      return;
    }
    this.clear();
    void this.router.navigateByUrl(this.router.url, { onSameUrlNavigation: 'reload' });
  }

  acceptInvitation(token: string, name: string, password: string): Observable<User> {
    return this.http
      .post<SignedInSession>(`${this.authUrl}/invitations/accept`, { token, name, password }, { context: quietAuthContext() })
      .pipe(map((session) => this.startSession(session)));
  }

  requestPasswordReset(email: string): Observable<void> {
    return this.http
      .post(`${this.authUrl}/password-reset/request`, { email }, { context: quietAuthContext() })
      .pipe(map(() => undefined));
  }

  confirmPasswordReset(token: string, password: string): Observable<void> {
    return this.http
      .post(`${this.authUrl}/password-reset/confirm`, { token, password }, { context: quietAuthContext() })
      .pipe(map(() => undefined));
  }

  changePassword(currentPassword: string, newPassword: string): Observable<void> {
    // Signed in: the interceptor attaches the token; the page shows a failure itself.
    const context = new HttpContext().set(REPORT_HTTP_ERRORS, false);
    return this.http
      .post(`${this.authUrl}/change-password`, { currentPassword, newPassword }, { context })
      .pipe(map(() => undefined));
  }

  private startSession(session: SignedInSession): User {
    this.token.set(session.accessToken);
    this.currentUser.set(session.user);
    return session.user;
  }

  private clear(): void {
    this.token.set(null);
    this.currentUser.set(null);
  }
}

/** The caller shows these failures in the form itself, and no token refresh can help them. */
function quietAuthContext(): HttpContext {
  return new HttpContext().set(SKIP_AUTH, true).set(REPORT_HTTP_ERRORS, false);
}
