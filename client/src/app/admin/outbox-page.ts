import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router } from '@angular/router';
import { switchMap } from 'rxjs';

import { ErrorState } from '../shared/error-state/error-state';
import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { AdminApi, CapturedMail } from './admin-api';
import { mailParts } from './mail-text';

/**
 * The development outbox: every e-mail the local SMTP server captured (invitations, resets,
 * workflow notices, watchers' release mails), newest first, each readable with its links.
 */
@Component({
  selector: 'kx-outbox-page',
  imports: [DatePipe, ErrorState, LoadingIndicator, MatButtonModule, MatExpansionModule, MatFormFieldModule, MatInputModule],
  template: `
    <h1>Outbox</h1>
    <p>
      E-mails Kelvindex sent, as the development mail server caught them; nothing leaves this machine. In production this list is empty.
    </p>
    <div class="kx-filters">
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>Recipient</mat-label>
        <input #recipient matInput type="email" [value]="to() ?? ''" (keydown.enter)="filterTo(recipient.value)" (change)="filterTo(recipient.value)" autocomplete="off" />
      </mat-form-field>
      <button mat-stroked-button type="button" (click)="reload()">Refresh</button>
    </div>
    @let state = mails();
    @if (state.state === 'loading') {
      <kx-loading-indicator label="Loading the outbox" />
    } @else if (state.state === 'failed') {
      <kx-error-state heading="The outbox could not be loaded" [message]="state.message" (retry)="reload()" />
    } @else if (state.value.length === 0) {
      <p class="kx-muted">No e-mail{{ to() ? ' to ' + to() : '' }} yet.</p>
    } @else {
      <mat-accordion multi class="kx-mails">
        @for (mail of rows(); track mail.id) {
          <mat-expansion-panel class="kx-mail">
            <mat-expansion-panel-header>
              <mat-panel-title>{{ mail.subject }}</mat-panel-title>
              <mat-panel-description>to {{ mail.to.join(', ') }} · {{ mail.receivedAt | date: 'yyyy-MM-dd HH:mm:ss' }}</mat-panel-description>
            </mat-expansion-panel-header>
            <p class="kx-muted">From {{ mail.from }}</p>
            <pre class="kx-mail-text">@for (part of mail.parts; track $index) {@if (part.href) {<a [href]="part.href">{{ part.text }}</a>} @else {{{ part.text }}}}</pre>
          </mat-expansion-panel>
        }
      </mat-accordion>
    }
  `,
  styleUrl: './admin-pages.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OutboxPage {
  private readonly admin = inject(AdminApi);
  private readonly router = inject(Router);
  private readonly reloads = signal(0);

  /** Only mails to this address, from the URL. */
  readonly to = input<string>();

  protected readonly mails = toSignal(
    toObservable(computed(() => ({ to: this.to(), reload: this.reloads() }))).pipe(switchMap(({ to }) => loadable(this.admin.outbox(to)))),
    { initialValue: { state: 'loading' } as Loadable<readonly CapturedMail[]> },
  );
  protected readonly rows = computed(() => {
    const mails = this.mails();
    return mails.state === 'ok' ? mails.value.map((mail) => ({ ...mail, parts: mailParts(mail.text) })) : [];
  });

  protected filterTo(address: string): void {
    void this.router.navigate([], { queryParams: { to: address.trim() || null }, replaceUrl: true });
  }

  protected reload(): void {
    this.reloads.update((n) => n + 1);
  }
}
