import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, output, signal } from '@angular/core';
import { AbstractControl, FormControl, FormGroup, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { Observable } from 'rxjs';

import { describeHttpError } from '../../core/api-error';
import { BibliographyFormat, Source, SourcesApi, isDoi } from './sources-api';

type Mode = 'bibliography' | 'doi';

/** A control holding a DOI (bare, doi: or https://doi.org/ form); empty is left to `required`. */
export function doiValidator(control: AbstractControl<string>): ValidationErrors | null {
  return control.value.trim() === '' || isDoi(control.value) ? null : { doi: true };
}

/**
 * Adds sources to Kelvindex: paste BibTeX or RIS entries (all are created, or none), or give a
 * DOI alone (Kelvindex makes no network lookups; the title is filled in later). Emits what it
 * created; a DOI already present is reported in place, naming the source that has it.
 */
@Component({
  selector: 'kx-source-import-form',
  imports: [MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule],
  template: `
    <mat-button-toggle-group
      class="kx-source-mode"
      hideSingleSelectionIndicator
      aria-label="How to add the source"
      [value]="mode()"
      (change)="mode.set($event.value)"
    >
      <mat-button-toggle value="bibliography">BibTeX or RIS</mat-button-toggle>
      <mat-button-toggle value="doi">DOI only</mat-button-toggle>
    </mat-button-toggle-group>

    @if (mode() === 'bibliography') {
      <form [formGroup]="bibliography" (ngSubmit)="importEntries()" aria-label="Import BibTeX or RIS entries">
        <mat-form-field appearance="outline" class="kx-wide">
          <mat-label>BibTeX or RIS entries</mat-label>
          <textarea matInput formControlName="text" rows="6" spellcheck="false" placeholder="@article{key, title = {…}, …}"></textarea>
          <mat-hint>Paste one or more entries; the format is recognised unless you choose it.</mat-hint>
          @if (bibliography.controls.text.hasError('required')) {
            <mat-error>Paste at least one entry.</mat-error>
          }
        </mat-form-field>
        <div class="kx-row">
          <mat-form-field appearance="outline" subscriptSizing="dynamic">
            <mat-label>Format</mat-label>
            <mat-select formControlName="format">
              <mat-option value="">recognise it</mat-option>
              <mat-option value="bibtex">BibTeX</mat-option>
              <mat-option value="ris">RIS</mat-option>
            </mat-select>
          </mat-form-field>
          <button mat-flat-button type="submit" class="kx-import-sources" [disabled]="busy()">Import</button>
        </div>
      </form>
    } @else {
      <form [formGroup]="doi" (ngSubmit)="createFromDoi()" aria-label="Create a source from its DOI">
        <div class="kx-row">
          <mat-form-field appearance="outline">
            <mat-label>DOI</mat-label>
            <input matInput formControlName="doi" autocomplete="off" placeholder="10.1000/xyz123" />
            @if (doi.controls.doi.hasError('required')) {
              <mat-error>Enter the DOI.</mat-error>
            } @else if (doi.controls.doi.hasError('doi')) {
              <mat-error>A DOI starts with 10., e.g. 10.1000/xyz123 (doi: and https://doi.org/ forms are fine).</mat-error>
            }
          </mat-form-field>
          <button mat-flat-button type="submit" [disabled]="busy()">Create source</button>
        </div>
      </form>
    }
    @if (problem()) {
      <p class="kx-form-problem" role="alert">{{ problem() }}</p>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .kx-source-mode {
      margin-bottom: 0.75rem;
    }
    .kx-wide {
      width: 100%;
    }
    .kx-row {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem 1rem;
      align-items: baseline;
    }
    .kx-form-problem {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SourceImportForm {
  private readonly sources = inject(SourcesApi);

  readonly created = output<Source[]>();

  protected readonly mode = signal<Mode>('bibliography');
  protected readonly busy = signal(false);
  protected readonly problem = signal('');
  protected readonly bibliography = new FormGroup({
    text: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(1_000_000)] }),
    format: new FormControl<BibliographyFormat | ''>('', { nonNullable: true }),
  });
  protected readonly doi = new FormGroup({
    doi: new FormControl('', { nonNullable: true, validators: [Validators.required, doiValidator] }),
  });

  protected importEntries(): void {
    if (this.bibliography.invalid) {
      this.bibliography.markAllAsTouched();
      return;
    }
    const { text, format } = this.bibliography.getRawValue();
    this.run(this.sources.importEntries(text, format || undefined), (result) => {
      this.bibliography.reset();
      this.created.emit(result.items);
    });
  }

  protected createFromDoi(): void {
    if (this.doi.invalid) {
      this.doi.markAllAsTouched();
      return;
    }
    this.run(this.sources.createFromDoi(this.doi.getRawValue().doi), (source) => {
      this.doi.reset();
      this.created.emit([source]);
    });
  }

  private run<T>(request: Observable<T>, done: (result: T) => void): void {
    this.busy.set(true);
    this.problem.set('');
    request.subscribe({
      next: (result) => {
        this.busy.set(false);
        done(result);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.problem.set(error instanceof HttpErrorResponse ? describeHttpError(error) : 'The source could not be added.');
      },
    });
  }
}
