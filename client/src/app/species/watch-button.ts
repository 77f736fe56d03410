import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { EMPTY, catchError, map, of, startWith, switchMap } from 'rxjs';

import { AuthService } from '../core/auth';
import { WatchlistService } from '../shared/watchlist/watchlist';

/**
 * Watch or stop watching a species (signed-in readers are told when its values change).
 * Signed-out readers get a link to sign in and come back.
 */
@Component({
  selector: 'kx-watch-button',
  imports: [MatButtonModule, RouterLink],
  template: `
    @if (signedIn()) {
      <button
        mat-stroked-button
        type="button"
        class="kx-watch"
        [class.kx-watching]="watching()"
        [attr.aria-pressed]="watching()"
        [disabled]="watching() === null || busy()"
        (click)="toggleWatch()"
      >
        {{ watching() ? 'Watching' : 'Watch' }}
      </button>
      <span class="kx-visually-hidden" role="status" aria-live="polite">{{ announcement() }}</span>
    } @else {
      <a mat-stroked-button routerLink="/sign-in" [queryParams]="{ returnUrl: returnUrl() }">Sign in to watch</a>
    }
  `,
  styles: `
    .kx-watching {
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WatchButton {
  private readonly auth = inject(AuthService);
  private readonly watchlist = inject(WatchlistService);

  readonly speciesId = input.required<string | number>();
  readonly speciesName = input.required<string>();

  protected readonly signedIn = this.auth.isSignedIn;
  protected readonly busy = signal(false);
  protected readonly announcement = signal('');
  protected readonly returnUrl = computed(() => `/species/${encodeURIComponent(this.speciesId())}`);

  /** Null while the watchlist loads. */
  private readonly listed = toSignal(
    toObservable(computed(() => ({ signedIn: this.auth.isSignedIn(), id: this.speciesId() }))).pipe(
      switchMap(({ signedIn, id }) =>
        signedIn
          ? this.watchlist.list().pipe(
              map((items) => items.some((item) => String(item.speciesId) === String(id))),
              catchError(() => EMPTY),
              startWith(null),
            )
          : of(null),
      ),
    ),
    { initialValue: null },
  );
  private readonly toggled = signal<{ id: string | number; watching: boolean } | null>(null);

  protected readonly watching = computed(() => {
    const toggled = this.toggled();
    return toggled !== null && toggled.id === this.speciesId() ? toggled.watching : this.listed();
  });

  protected toggleWatch(): void {
    const id = this.speciesId();
    const watch = !this.watching();
    this.busy.set(true);
    (watch ? this.watchlist.watch(id) : this.watchlist.unwatch(id)).subscribe({
      next: () => {
        this.busy.set(false);
        this.toggled.set({ id, watching: watch });
        this.announcement.set(watch ? `You are watching ${this.speciesName()}.` : `You stopped watching ${this.speciesName()}.`);
      },
      error: () => this.busy.set(false),
    });
  }
}
