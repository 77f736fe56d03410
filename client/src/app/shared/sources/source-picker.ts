import { ChangeDetectionStrategy, Component, effect, inject, input, model, signal, untracked } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { AbstractControl, FormControl, ReactiveFormsModule, ValidationErrors } from '@angular/forms';
import { MatAutocompleteModule, MatAutocompleteSelectedEvent } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { catchError, debounceTime, distinctUntilChanged, filter, map, of, startWith, switchMap } from 'rxjs';

import { SourceImportForm } from './source-import-form';
import { Source, SourcesApi } from './sources-api';

/** The source an item cites, as the proposal shows it. */
export interface SourceChoice {
  readonly id: string;
  readonly shortKey: string;
  readonly title: string;
}

type PickerValue = string | SourceChoice;

let nextSourcePickerId = 0;

/**
 * Picks the source an item cites, by key, title, author or DOI (autocomplete over
 * `GET /sources`); a source not in Kelvindex yet is added right here from BibTeX or RIS text or
 * from its DOI, then chosen.
 */
@Component({
  selector: 'kx-source-picker',
  imports: [MatAutocompleteModule, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, SourceImportForm],
  template: `
    <div class="kx-source-row">
      <mat-form-field appearance="outline" class="kx-source-field">
        <mat-label>{{ label() }}</mat-label>
        <input matInput [id]="inputId" [formControl]="text" [matAutocomplete]="auto" autocomplete="off" class="kx-source-input" />
        <mat-autocomplete #auto="matAutocomplete" [displayWith]="display" (optionSelected)="choose($event)">
          @for (source of results(); track source.id) {
            @if (source.id !== exclude()) {
            <mat-option [value]="source">
              <strong>{{ source.shortKey }}</strong> — {{ source.title }}{{ source.year ? ' (' + source.year + ')' : '' }}
            </mat-option>
            }
          } @empty {
            @if (typed()) {
              <mat-option disabled>No source matches; add it below.</mat-option>
            }
          }
        </mat-autocomplete>
        <mat-hint>{{ hint() }}</mat-hint>
        @if (text.hasError('choose')) {
          <mat-error>Choose a source from the list{{ allowAdd() ? ', or add it' : '' }}.</mat-error>
        }
      </mat-form-field>
      @if (allowAdd()) {
        <button mat-stroked-button type="button" class="kx-add-source" [attr.aria-expanded]="adding()" (click)="adding.set(!adding())">
          {{ adding() ? 'Close' : 'Add a source' }}
        </button>
      }
    </div>
    @if (adding()) {
      <section class="kx-inline-panel" aria-label="Add a source">
        <h4>Add a source</h4>
        <kx-source-import-form (created)="useCreated($event)" />
      </section>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .kx-source-row {
      display: flex;
      flex-wrap: wrap;
      gap: 0 1rem;
      align-items: baseline;
    }
    .kx-source-field {
      flex: 1 1 20rem;
    }
    .kx-inline-panel {
      margin: 0 0 1rem;
      padding: 0.75rem 1rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-surface-container-low);
      h4 {
        margin-top: 0;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SourcePicker {
  private readonly sources = inject(SourcesApi);

  readonly required = input(true);
  readonly label = input('Source');
  readonly hint = input('Key, title, author or DOI. No value without a source.');
  /** Offer to add a source from BibTeX, RIS or a DOI right here. */
  readonly allowAdd = input(true);
  /** A source not to offer (the one being merged). */
  readonly exclude = input<string | null>(null);
  readonly source = model<SourceChoice | null>(null);

  protected readonly inputId = `kx-source-${nextSourcePickerId++}`;
  protected readonly text = new FormControl<PickerValue>('', {
    nonNullable: true,
    validators: (control: AbstractControl<PickerValue>): ValidationErrors | null =>
      !this.required() || typeof control.value === 'object' ? null : { choose: true },
  });
  protected readonly adding = signal(false);
  protected readonly typed = toSignal(this.text.valueChanges.pipe(map((v) => (typeof v === 'string' ? v.trim() : ''))), { initialValue: '' });
  protected readonly results = toSignal(
    this.text.valueChanges.pipe(
      filter((value): value is string => typeof value === 'string'),
      map((value) => value.trim()),
      debounceTime(250),
      distinctUntilChanged(),
      startWith(''),
      switchMap((q) => this.sources.search(q, 12).pipe(map((page) => page.items), catchError(() => of([] as Source[])))),
    ),
    { initialValue: [] as Source[] },
  );

  constructor() {
    effect(() => {
      const source = this.source();
      untracked(() => {
        if (source && this.text.value !== source) {
          this.text.setValue(source, { emitEvent: false });
          this.text.updateValueAndValidity({ emitEvent: false });
        }
      });
    });
    this.text.valueChanges.pipe(takeUntilDestroyed()).subscribe((value) => {
      if (typeof value === 'string' && this.source() !== null) {
        this.source.set(null);
      }
    });
  }

  protected readonly display = (value: PickerValue | null): string =>
    value === null || typeof value === 'string' ? (value ?? '') : `${value.shortKey} — ${value.title}`;

  protected choose(event: MatAutocompleteSelectedEvent): void {
    const source = event.option.value as Source;
    this.source.set({ id: source.id, shortKey: source.shortKey, title: source.title });
  }

  protected useCreated(created: Source[]): void {
    const first = created[0];
    if (first) {
      this.adding.set(false);
      this.source.set({ id: first.id, shortKey: first.shortKey, title: first.title });
    }
  }

  touch(): void {
    this.text.markAsTouched();
    this.text.updateValueAndValidity();
  }
}
