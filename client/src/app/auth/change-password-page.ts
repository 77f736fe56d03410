import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, FormGroupDirective, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { switchMap } from 'rxjs';

import { describeHttpError } from '../core/api-error';
import { AuthService } from '../core/auth';
import { MIN_PASSWORD_LENGTH, passwordsMatch } from './password-rules';

/**
 * Changes the signed-in reader's password. The API then revokes every session of the account,
 * this one included, so the page signs in again with the new password to keep the reader in.
 */
@Component({
  selector: 'kx-change-password-page',
  imports: [MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, RouterLink],
  templateUrl: './change-password-page.html',
  styleUrl: './auth-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChangePasswordPage {
  private readonly auth = inject(AuthService);

  protected readonly minLength = MIN_PASSWORD_LENGTH;
  protected readonly form = new FormGroup(
    {
      currentPassword: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
      newPassword: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.minLength(MIN_PASSWORD_LENGTH)] }),
      confirmation: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    },
    { validators: passwordsMatch('newPassword', 'confirmation') },
  );
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly changed = signal(false);

  protected changePassword(formDirective: FormGroupDirective): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { currentPassword, newPassword } = this.form.getRawValue();
    const email = this.auth.user()?.email ?? '';
    this.busy.set(true);
    this.failure.set(null);
    this.changed.set(false);
    this.auth
      .changePassword(currentPassword, newPassword)
      .pipe(switchMap(() => this.auth.signIn(email, newPassword)))
      .subscribe({
        next: () => {
          this.busy.set(false);
          this.changed.set(true);
          formDirective.resetForm();
        },
        error: (error: unknown) => {
          this.busy.set(false);
          this.failure.set(error instanceof HttpErrorResponse ? describeHttpError(error) : 'The password was not changed.');
        },
      });
  }
}
