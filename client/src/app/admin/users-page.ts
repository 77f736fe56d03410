import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { filter, switchMap } from 'rxjs';

import { AuthService, Role } from '../core/auth';
import { ConfirmDialog, ConfirmDialogData } from '../shared/confirm-dialog/confirm-dialog';
import { ErrorState } from '../shared/error-state/error-state';
import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { AdminApi, ManagedUser, ROLES } from './admin-api';
import { chosenRoles, invitationForm } from './invitation-rules';

/** Users with their roles (ticked on and off in place), deactivation, and invitations by e-mail. */
@Component({
  selector: 'kx-users-page',
  imports: [DatePipe, ErrorState, LoadingIndicator, MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
  templateUrl: './users-page.html',
  styleUrl: './admin-pages.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UsersPage {
  private readonly admin = inject(AdminApi);
  private readonly dialog = inject(MatDialog);
  private readonly auth = inject(AuthService);
  private readonly reloads = signal(0);

  protected readonly roles = ROLES;
  protected readonly me = computed(() => String(this.auth.user()?.id ?? ''));
  protected readonly list = toSignal(toObservable(this.reloads).pipe(switchMap(() => loadable(this.admin.users()))), {
    initialValue: { state: 'loading' } as Loadable<readonly ManagedUser[]>,
  });
  protected readonly form = invitationForm();
  protected readonly inviting = signal(false);
  protected readonly invited = signal('');
  protected readonly announcement = signal('');

  protected toggleRole(user: ManagedUser, role: Role, on: boolean): void {
    const roles = on ? [...user.roles, role] : user.roles.filter((r) => r !== role);
    this.admin.setRoles(user.id, ROLES.filter((r) => roles.includes(r))).subscribe({
      next: (updated) => {
        this.announcement.set(`${updated.name} now holds: ${updated.roles.join(', ') || 'no role'}.`);
        this.reload();
      },
      error: () => this.reload(),
    });
  }

  protected setActive(user: ManagedUser, active: boolean): void {
    const data: ConfirmDialogData = active
      ? { title: `Reactivate ${user.name}?`, message: `${user.email} can sign in again with their roles.`, confirmLabel: 'Reactivate' }
      : {
          title: `Deactivate ${user.name}?`,
          message: `${user.email} can no longer sign in, and their sessions and API keys stop working. Their records and history stay.`,
          confirmLabel: 'Deactivate',
        };
    this.dialog
      .open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data })
      .afterClosed()
      .pipe(
        filter((confirmed) => confirmed === true),
        switchMap(() => this.admin.setActive(user.id, active)),
      )
      .subscribe((updated) => {
        this.announcement.set(`${updated.name} is ${updated.active ? 'active again' : 'deactivated'}.`);
        this.reload();
      });
  }

  protected inviteUser(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { email, roles } = this.form.getRawValue();
    this.inviting.set(true);
    this.admin.invite(email.trim(), chosenRoles(roles)).subscribe({
      next: (invitation) => {
        this.inviting.set(false);
        this.invited.set(
          `Invitation sent to ${invitation.email} (${invitation.roles.join(', ')}); the link works once, for ${Math.round(invitation.expiresInHours / 24)} days.`,
        );
        this.form.reset();
      },
      error: () => this.inviting.set(false),
    });
  }

  protected reload(): void {
    this.reloads.update((n) => n + 1);
  }
}
