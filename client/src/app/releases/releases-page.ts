import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import { of, switchMap } from 'rxjs';

import { AuthService } from '../core/auth';
import { ErrorState } from '../shared/error-state/error-state';
import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { ChangeLogTable } from './change-log-table';
import { ReleaseDiff, ReleaseSummary, ReleasesApi } from './releases-api';

/** The label the next release would have: the next number in the current year, or year.1. */
export function nextReleaseLabel(labels: readonly string[], now: Date = new Date()): string {
  const year = now.getFullYear();
  const numbers = labels.map((l) => l.split('.').map(Number)).filter(([y]) => y >= year);
  if (numbers.length === 0) {
    const latestYear = Math.max(year, ...labels.map((l) => Number(l.split('.')[0])));
    return `${latestYear}.1`;
  }
  const latestYear = Math.max(...numbers.map(([y]) => y));
  const latestNumber = Math.max(...numbers.filter(([y]) => y === latestYear).map(([, n]) => n));
  return `${latestYear}.${latestNumber + 1}`;
}

/** The pair of releases a diff compares by default: the latest published one against the one before it. */
export function defaultDiffPair(releases: readonly ReleaseSummary[]): { from: string; to: string } | null {
  const published = releases.filter((r) => r.status === 'published');
  return published.length >= 2 ? { from: published[1].label, to: published[0].label } : null;
}

/**
 * Every release with its date and notes, and what changed between any two (the pair lives in the
 * URL: `?from=2026.1&to=2026.2`). Editors see the release in preparation and open the next one.
 */
@Component({
  selector: 'kx-releases-page',
  imports: [ChangeLogTable, DatePipe, ErrorState, LoadingIndicator, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule, RouterLink],
  templateUrl: './releases-page.html',
  styleUrl: './releases-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReleasesPage {
  private readonly releases = inject(ReleasesApi);
  private readonly router = inject(Router);
  private readonly auth = inject(AuthService);
  private readonly reloads = signal(0);

  readonly from = input<string>();
  readonly to = input<string>();

  protected readonly isEditor = computed(() => this.auth.user()?.roles.includes('editor') ?? false);
  protected readonly list = toSignal(toObservable(this.reloads).pipe(switchMap(() => loadable(this.releases.list()))), {
    initialValue: { state: 'loading' } as Loadable<readonly ReleaseSummary[]>,
  });
  protected readonly items = computed(() => {
    const list = this.list();
    return list.state === 'ok' ? list.value : [];
  });
  protected readonly preparing = computed(() => this.items().find((r) => r.status === 'preparing') ?? null);
  protected readonly pair = computed(() => {
    const fallback = defaultDiffPair(this.items());
    const from = this.from() ?? fallback?.from;
    const to = this.to() ?? fallback?.to;
    return from && to ? { from, to } : null;
  });
  protected readonly diff = toSignal(
    toObservable(this.pair).pipe(switchMap((pair) => (pair ? loadable(this.releases.diff(pair.from, pair.to)) : of(null)))),
    { initialValue: null as Loadable<ReleaseDiff> | null },
  );

  protected readonly opening = signal(false);
  protected readonly openForm = new FormGroup({
    label: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.pattern(/^[0-9]{4}\.[1-9][0-9]*$/)] }),
    notes: new FormControl('', { nonNullable: true, validators: Validators.maxLength(50000) }),
  });

  protected choosePair(change: { from?: string; to?: string }): void {
    const pair = { ...this.pair(), ...change };
    void this.router.navigate([], { queryParams: { from: pair.from, to: pair.to }, replaceUrl: true });
  }

  protected retry(): void {
    this.reloads.update((n) => n + 1);
  }

  protected suggestLabel(): void {
    if (!this.openForm.controls.label.value) {
      this.openForm.controls.label.setValue(nextReleaseLabel(this.items().map((r) => r.label)));
    }
  }

  protected openRelease(): void {
    if (this.openForm.invalid) {
      this.openForm.markAllAsTouched();
      return;
    }
    const { label, notes } = this.openForm.getRawValue();
    this.opening.set(true);
    this.releases.open(label, notes.trim()).subscribe({
      next: () => void this.router.navigate(['/releases', label, 'edit']),
      error: () => this.opening.set(false),
    });
  }
}
