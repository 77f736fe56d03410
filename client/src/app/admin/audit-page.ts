import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router } from '@angular/router';
import { switchMap } from 'rxjs';

import { downloadFile } from '../shared/csv/csv-file';
import { ErrorState } from '../shared/error-state/error-state';
import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { AdminApi, AuditPage as AuditPageData } from './admin-api';
import { auditCsv, auditQuery, detailsText } from './audit-filter';

/**
 * The audit trail, newest first, filtered by user, record (type and id), action and date; the
 * filters live in the URL so that a trail can be shared, and a page downloads as CSV.
 */
@Component({
  selector: 'kx-audit-page',
  imports: [DatePipe, ErrorState, LoadingIndicator, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
  templateUrl: './audit-page.html',
  styleUrl: './admin-pages.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AuditPage {
  private readonly admin = inject(AdminApi);
  private readonly router = inject(Router);

  readonly user = input<string>();
  readonly action = input<string>();
  readonly entityType = input<string>();
  readonly entityId = input<string>();
  readonly from = input<string>();
  readonly to = input<string>();
  readonly page = input<string>();

  protected readonly form = new FormGroup({
    user: new FormControl('', { nonNullable: true }),
    action: new FormControl('', { nonNullable: true }),
    entityType: new FormControl('', { nonNullable: true }),
    entityId: new FormControl('', { nonNullable: true }),
    from: new FormControl('', { nonNullable: true }),
    to: new FormControl('', { nonNullable: true }),
  });
  protected readonly query = computed(() =>
    auditQuery({ user: this.user(), action: this.action(), entityType: this.entityType(), entityId: this.entityId(), from: this.from(), to: this.to(), page: this.page() }),
  );
  protected readonly trail = toSignal(toObservable(this.query).pipe(switchMap((query) => loadable(this.admin.audit(query)))), {
    initialValue: { state: 'loading' } as Loadable<AuditPageData>,
  });
  protected readonly rows = computed(() => {
    const trail = this.trail();
    return trail.state === 'ok' ? trail.value.items.map((entry) => ({ entry, details: detailsText(entry.details) })) : [];
  });
  protected readonly pages = computed(() => {
    const trail = this.trail();
    return trail.state === 'ok' ? Math.max(1, Math.ceil(trail.value.total / trail.value.pageSize)) : 1;
  });

  constructor() {
    // The form shows the filters of the URL (on arrival, and after back and forward).
    effect(() =>
      this.form.setValue({
        user: this.user() ?? '',
        action: this.action() ?? '',
        entityType: this.entityType() ?? '',
        entityId: this.entityId() ?? '',
        from: this.from() ?? '',
        to: this.to() ?? '',
      }),
    );
  }

  protected applyFilters(): void {
    const values = this.form.getRawValue();
    const queryParams = Object.fromEntries(Object.entries(values).map(([key, value]) => [key, value.trim() || null]));
    void this.router.navigate([], { queryParams: { ...queryParams, page: null } });
  }

  protected clearFilters(): void {
    void this.router.navigate([], { queryParams: {} });
  }

  protected goToPage(page: number): void {
    void this.router.navigate([], { queryParams: { page: page === 1 ? null : page }, queryParamsHandling: 'merge' });
  }

  protected filterBy(change: { user?: string; entityType?: string; entityId?: string; action?: string }): void {
    void this.router.navigate([], { queryParams: { ...change, page: null }, queryParamsHandling: 'merge' });
  }

  protected downloadPage(): void {
    const trail = this.trail();
    if (trail.state === 'ok') {
      downloadFile(auditCsv(trail.value.items), `audit-trail-page-${trail.value.page}.csv`);
    }
  }
}
