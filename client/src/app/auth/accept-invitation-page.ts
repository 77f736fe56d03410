import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';

import { describeHttpError } from '../core/api-error';
import { AuthService } from '../core/auth';
import { EmptyState } from '../shared/empty-state/empty-state';
import { MIN_PASSWORD_LENGTH, passwordsMatch } from './password-rules';

/** Turns an invitation link (`?token=`) into an account: the person's name and a password. */
@Component({
  selector: 'kx-accept-invitation-page',
  imports: [EmptyState, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, RouterLink],
  templateUrl: './accept-invitation-page.html',
  styleUrl: './auth-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitationPage {
  private readonly auth = inject(AuthService);
  private readonly router = inject(Router);

  readonly token = input<string>();

  protected readonly minLength = MIN_PASSWORD_LENGTH;
  protected readonly hasToken = computed(() => !!this.token());
  protected readonly form = new FormGroup(
    {
      name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(120)] }),
      password: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.minLength(MIN_PASSWORD_LENGTH)] }),
      confirmation: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    },
    { validators: passwordsMatch('password', 'confirmation') },
  );
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected acceptInvitation(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { name, password } = this.form.getRawValue();
    this.busy.set(true);
    this.failure.set(null);
    this.auth.acceptInvitation(this.token()!, name.trim(), password).subscribe({
      next: () => void this.router.navigateByUrl('/account'),
      error: (error: unknown) => {
        this.busy.set(false);
        this.failure.set(error instanceof HttpErrorResponse ? describeHttpError(error) : 'The invitation could not be accepted.');
      },
    });
  }
}
