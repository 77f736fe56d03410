import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';

import { describeHttpError } from '../core/api-error';
import { AuthService } from '../core/auth';
import { MIN_PASSWORD_LENGTH, passwordsMatch } from './password-rules';

/**
 * Two steps of a forgotten password: without a token, asks for the address to send a link to;
 * with the link's `?token=`, asks for the new password.
 */
@Component({
  selector: 'kx-reset-password-page',
  imports: [MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, RouterLink],
  templateUrl: './reset-password-page.html',
  styleUrl: './auth-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPasswordPage {
  private readonly auth = inject(AuthService);

  /** The single-use token from the e-mailed link. */
  readonly token = input<string>();

  protected readonly minLength = MIN_PASSWORD_LENGTH;
  protected readonly hasToken = computed(() => !!this.token());
  protected readonly requestForm = new FormGroup({
    email: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.email] }),
  });
  protected readonly confirmForm = new FormGroup(
    {
      password: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.minLength(MIN_PASSWORD_LENGTH)] }),
      confirmation: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    },
    { validators: passwordsMatch('password', 'confirmation') },
  );
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly done = signal<'requested' | 'reset' | null>(null);

  protected requestLink(): void {
    if (this.requestForm.invalid) {
      this.requestForm.markAllAsTouched();
      return;
    }
    this.run(this.auth.requestPasswordReset(this.requestForm.getRawValue().email.trim()), 'requested');
  }

  protected setPassword(): void {
    if (this.confirmForm.invalid) {
      this.confirmForm.markAllAsTouched();
      return;
    }
    this.run(this.auth.confirmPasswordReset(this.token()!, this.confirmForm.getRawValue().password), 'reset');
  }

  private run(call: ReturnType<AuthService['requestPasswordReset']>, outcome: 'requested' | 'reset'): void {
    this.busy.set(true);
    this.failure.set(null);
    call.subscribe({
      next: () => {
        this.busy.set(false);
        this.done.set(outcome);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.failure.set(error instanceof HttpErrorResponse ? describeHttpError(error) : 'The request failed.');
      },
    });
  }
}
