import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { filter, switchMap } from 'rxjs';

import { ConfirmDialog, ConfirmDialogData } from '../shared/confirm-dialog/confirm-dialog';
import { ErrorState } from '../shared/error-state/error-state';
import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { AdminApi, ManagedApiKey } from './admin-api';

/** Every API key with its owner, scope and last use; an admin revokes any of them. */
@Component({
  selector: 'kx-api-keys-page',
  imports: [DatePipe, ErrorState, LoadingIndicator, MatButtonModule, MatSlideToggleModule],
  template: `
    <h1>API keys</h1>
    <p>Keys downstream tools use. The secrets are never shown again; revoking a key stops it at once.</p>
    <p class="kx-visually-hidden" role="status" aria-live="polite">{{ announcement() }}</p>
    <mat-slide-toggle [checked]="showRevoked()" (change)="showRevoked.set($event.checked)">Show revoked keys</mat-slide-toggle>
    @let listing = list();
    @if (listing.state === 'loading') {
      <kx-loading-indicator label="Loading keys" />
    } @else if (listing.state === 'failed') {
      <kx-error-state heading="The keys could not be loaded" [message]="listing.message" (retry)="reload()" />
    } @else if (keys().length === 0) {
      <p class="kx-muted">No API keys{{ showRevoked() ? '' : ' in use' }}.</p>
    } @else {
      <div class="kx-table-scroll" tabindex="0" role="region" aria-label="API keys">
        <table class="kx-admin-table">
          <caption class="kx-visually-hidden">API keys</caption>
          <thead>
            <tr>
              <th scope="col">Name</th>
              <th scope="col">Owner</th>
              <th scope="col">Scope</th>
              <th scope="col">Starts with</th>
              <th scope="col">Created</th>
              <th scope="col">Last used</th>
              <th scope="col">Status</th>
            </tr>
          </thead>
          <tbody>
            @for (key of keys(); track key.id) {
              <tr [class.kx-inactive]="key.revokedAt">
                <td>{{ key.name }}</td>
                <td>{{ key.owner.email }}</td>
                <td>{{ key.scope === 'read' ? 'read only' : 'read and write' }}</td>
                <td><code>{{ key.prefix }}…</code></td>
                <td>{{ key.createdAt | date: 'yyyy-MM-dd' }}</td>
                <td>{{ key.lastUsedAt ? (key.lastUsedAt | date: 'yyyy-MM-dd HH:mm') : 'never' }}</td>
                <td>
                  @if (key.revokedAt) {
                    revoked {{ key.revokedAt | date: 'yyyy-MM-dd' }}
                  } @else {
                    <button mat-button type="button" [attr.aria-label]="'Revoke ' + key.name + ' of ' + key.owner.email" (click)="revoke(key)">Revoke</button>
                  }
                </td>
              </tr>
            }
          </tbody>
        </table>
      </div>
    }
  `,
  styleUrl: './admin-pages.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ApiKeysPage {
  private readonly admin = inject(AdminApi);
  private readonly dialog = inject(MatDialog);
  private readonly reloads = signal(0);

  protected readonly showRevoked = signal(false);
  protected readonly announcement = signal('');
  protected readonly list = toSignal(toObservable(this.reloads).pipe(switchMap(() => loadable(this.admin.apiKeys()))), {
    initialValue: { state: 'loading' } as Loadable<readonly ManagedApiKey[]>,
  });
  protected readonly keys = computed(() => {
    const list = this.list();
    return list.state === 'ok' ? list.value.filter((key) => this.showRevoked() || !key.revokedAt) : [];
  });

  protected revoke(key: ManagedApiKey): void {
    const data: ConfirmDialogData = {
      title: `Revoke “${key.name}”?`,
      message: `The key of ${key.owner.email} stops working at once; tools using it must get a new one.`,
      confirmLabel: 'Revoke key',
    };
    this.dialog
      .open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data })
      .afterClosed()
      .pipe(
        filter((confirmed) => confirmed === true),
        switchMap(() => this.admin.revokeKey(key.id)),
      )
      .subscribe(() => {
        this.announcement.set(`Revoked ${key.name}.`);
        this.reload();
      });
  }

  protected reload(): void {
    this.reloads.update((n) => n + 1);
  }
}
