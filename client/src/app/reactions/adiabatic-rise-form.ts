import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';

import { describeHttpError } from '../core/api-error';
import { CautionNotice } from '../shared/caution-notice/caution-notice';
import { AdiabaticRise, ReactionResult, ReactionsApi } from './reactions-api';

/**
 * A screening estimate of the adiabatic temperature rise: the reaction heat of `extent` mol taken
 * up by `mass` kg of material with a specific heat, with no heat lost. Always shown with the caution.
 */
@Component({
  selector: 'kx-adiabatic-rise-form',
  imports: [CautionNotice, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule],
  template: `
    <kx-caution-notice>
      <p>Assumes all the reaction heat stays in the mass given (no heat loss, no phase change, constant specific heat).</p>
    </kx-caution-notice>
    <form [formGroup]="form" (ngSubmit)="estimate()" class="kx-rise-form" aria-label="Adiabatic temperature rise">
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>ΔrH° at</mat-label>
        <mat-select formControlName="temperature">
          @for (result of results(); track result.T) {
            <mat-option [value]="result.T">{{ result.T }} K</mat-option>
          }
        </mat-select>
      </mat-form-field>
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>Extent of reaction (mol)</mat-label>
        <input matInput type="number" formControlName="amount" min="0" step="any" required />
      </mat-form-field>
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>Mass heated (kg)</mat-label>
        <input matInput type="number" formControlName="mass" min="0" step="any" required />
      </mat-form-field>
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>Specific heat (J/(kg·K))</mat-label>
        <input matInput type="number" formControlName="specificHeat" min="0" step="any" required />
      </mat-form-field>
      <button mat-flat-button type="submit" [disabled]="busy()">Estimate the rise</button>
    </form>
    @if (form.invalid && form.touched) {
      <p class="kx-rise-error" role="alert">Enter positive numbers for the extent, the mass and the specific heat.</p>
    }
    <div aria-live="polite">
      @if (outcome(); as outcome) {
        <p class="kx-rise-result" role="status">
          Adiabatic temperature change: <strong class="kx-numeric">{{ outcomeText() }}</strong>
          (from ΔrH° at {{ outcome.temperature }} K).
        </p>
        @if (outcome.rise.caution) {
          <p class="kx-rise-caution">{{ outcome.rise.caution }}</p>
        }
      }
      @if (failure(); as failure) {
        <p class="kx-rise-error" role="alert">{{ failure }}</p>
      }
    </div>
  `,
  styles: `
    .kx-rise-form {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 0.75rem;
      margin-top: 1rem;
      mat-form-field {
        width: 12rem;
      }
    }
    .kx-rise-result {
      margin-top: 1rem;
      font: var(--mat-sys-title-medium);
    }
    .kx-rise-caution {
      color: var(--mat-sys-on-surface-variant);
    }
    .kx-rise-error {
      color: var(--mat-sys-error);
    }
    @media (max-width: 599.98px) {
      .kx-rise-form mat-form-field {
        width: 100%;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AdiabaticRiseForm {
  private readonly api = inject(ReactionsApi);

  /** The evaluated results; the reader picks the temperature whose ΔrH° is used. */
  readonly results = input.required<readonly ReactionResult[]>();

  protected readonly form = new FormGroup({
    temperature: new FormControl<number | null>(null, { validators: [Validators.required] }),
    amount: new FormControl<number | null>(1, { validators: [Validators.required, Validators.min(Number.MIN_VALUE)] }),
    mass: new FormControl<number | null>(1, { validators: [Validators.required, Validators.min(Number.MIN_VALUE)] }),
    specificHeat: new FormControl<number | null>(4184, { validators: [Validators.required, Validators.min(Number.MIN_VALUE)] }),
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly outcome = signal<{ temperature: number; rise: AdiabaticRise } | null>(null);
  protected readonly outcomeText = computed(() => {
    const outcome = this.outcome();
    if (!outcome) {
      return '';
    }
    const sign = outcome.rise.deltaT > 0 ? '+' : '';
    return `${sign}${outcome.rise.deltaT.toPrecision(3)} K`;
  });

  constructor() {
    // New results: start from the first temperature and forget an estimate made from old ones.
    effect(() => {
      const first = this.results()[0]?.T ?? null;
      untracked(() => {
        this.form.controls.temperature.setValue(first);
        this.outcome.set(null);
      });
    });
  }

  protected estimate(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { temperature, amount, mass, specificHeat } = this.form.getRawValue();
    const result = this.results().find((candidate) => candidate.T === temperature);
    if (!result) {
      return;
    }
    // The API takes J/mol; evaluate answers ΔrH° in kJ/mol.
    const deltaH = result.deltaH.value * 1000;
    this.busy.set(true);
    this.failure.set(null);
    this.api.adiabaticRise(deltaH, amount!, mass!, specificHeat!).subscribe({
      next: (rise) => {
        this.busy.set(false);
        this.outcome.set({ temperature: result.T, rise });
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.failure.set(error instanceof HttpErrorResponse ? describeHttpError(error) : 'The estimate failed.');
      },
    });
  }
}
