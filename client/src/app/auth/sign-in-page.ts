import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';

import { describeHttpError } from '../core/api-error';
import { AuthService } from '../core/auth';
import { safeReturnUrl } from './return-url';

export const WRONG_CREDENTIALS = 'E-mail or password is wrong.';

/** Signs a reader in with e-mail and password, then returns them where they were going. */
@Component({
  selector: 'kx-sign-in-page',
  imports: [MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, RouterLink],
  templateUrl: './sign-in-page.html',
  styleUrl: './auth-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInPage {
  private readonly auth = inject(AuthService);
  private readonly router = inject(Router);

  /** Where to go afterwards, from `?returnUrl=`. */
  readonly returnUrl = input<string>();

  protected readonly form = new FormGroup({
    email: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.email] }),
    password: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected signIn(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { email, password } = this.form.getRawValue();
    this.busy.set(true);
    this.failure.set(null);
    this.auth.signIn(email.trim(), password).subscribe({
      next: () => void this.router.navigateByUrl(safeReturnUrl(this.returnUrl())),
      error: (error: unknown) => {
        this.busy.set(false);
        this.form.controls.password.reset();
        this.failure.set(
          error instanceof HttpErrorResponse && error.status !== 401 ? describeHttpError(error) : WRONG_CREDENTIALS,
        );
      },
    });
  }
}
