import { ChangeDetectionStrategy, Component, computed, effect, inject, input, model, signal, untracked } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { AbstractControl, FormControl, ReactiveFormsModule, ValidationErrors } from '@angular/forms';
import { MatAutocompleteModule, MatAutocompleteSelectedEvent } from '@angular/material/autocomplete';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { catchError, debounceTime, distinctUntilChanged, filter, map, of, switchMap } from 'rxjs';

import { CatalogueApi } from '../shared/catalogue/catalogue-api';
import { Formula } from '../shared/formula/formula';
import { SpeciesItemForm } from './species-item-form';
import { SpeciesChoice } from './subject';

/** The "add a new species" entry at the end of the list. */
interface CreateSpecies {
  readonly create: string;
}

type PickerValue = string | SpeciesChoice | CreateSpecies;

function chosen(control: AbstractControl<PickerValue>): ValidationErrors | null {
  return typeof control.value === 'object' && control.value !== null && 'name' in control.value ? null : { choose: true };
}

let nextPickerId = 0;

/**
 * Picks a species by formula, name, CAS RN or InChIKey (autocomplete over `GET /species`), or one
 * this proposal adds; offers to add a new one, whose details are asked for in place and saved as
 * an add_species item together with the item being entered.
 */
@Component({
  selector: 'kx-species-picker',
  imports: [Formula, MatAutocompleteModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, SpeciesItemForm],
  template: `
    <mat-form-field appearance="outline" class="kx-species-field">
      <mat-label>{{ label() }}</mat-label>
      <input matInput [id]="inputId" [formControl]="text" [matAutocomplete]="auto" autocomplete="off" class="kx-species-input" />
      <mat-autocomplete #auto="matAutocomplete" [displayWith]="display" (optionSelected)="choose($event)">
        @for (species of proposedMatches(); track species.name) {
          <mat-option [value]="species">
            {{ species.name }} (<kx-formula [formula]="species.formula" />) <small class="kx-option-note">added in this proposal</small>
          </mat-option>
        }
        @for (species of results(); track species.id) {
          <mat-option [value]="species">{{ species.name }} (<kx-formula [formula]="species.formula" />)</mat-option>
        }
        @if (typed() && allowCreate()) {
          <mat-option [value]="{ create: typed() }" class="kx-create-species">Add “{{ typed() }}” as a new species…</mat-option>
        }
      </mat-autocomplete>
      <mat-hint>Formula, name, CAS RN or InChIKey</mat-hint>
      @if (text.hasError('choose')) {
        <mat-error>Choose a species from the list{{ allowCreate() ? ', or add a new one' : '' }}.</mat-error>
      }
    </mat-form-field>
    @if (creating(); as name) {
      <section class="kx-inline-panel" aria-label="New species">
        <h4>New species</h4>
        <p class="kx-hint">It is added to this proposal as a new species item, before the item you are entering.</p>
        <kx-species-item-form [initial]="guess(name)" saveText="Use this species" (save)="useNewSpecies($event)" (cancel)="creating.set(null)" />
      </section>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .kx-species-field {
      width: 100%;
    }
    .kx-option-note {
      color: var(--mat-sys-on-surface-variant);
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
    .kx-hint {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SpeciesPicker {
  private readonly catalogue = inject(CatalogueApi);

  readonly label = input('Species');
  /** Species this proposal adds (add_species items), offered first. */
  readonly proposed = input<readonly SpeciesChoice[]>([]);
  readonly allowCreate = input(true);
  readonly species = model<SpeciesChoice | null>(null);

  protected readonly inputId = `kx-species-${nextPickerId++}`;
  protected readonly text = new FormControl<PickerValue>('', { nonNullable: true, validators: chosen });
  protected readonly creating = signal<string | null>(null);
  private readonly query = toSignal(this.text.valueChanges.pipe(map((value) => (typeof value === 'string' ? value.trim() : ''))), { initialValue: '' });
  protected readonly typed = computed(() => this.query());
  protected readonly results = toSignal(
    this.text.valueChanges.pipe(
      filter((value): value is string => typeof value === 'string'),
      map((value) => value.trim()),
      debounceTime(250),
      distinctUntilChanged(),
      switchMap((q) =>
        q.length === 0
          ? of([] as SpeciesChoice[])
          : this.catalogue.searchSpecies(q).pipe(
              map((matches) => matches.map((m): SpeciesChoice => ({ id: m.id, name: m.name, formula: m.formula, phases: m.phases }))),
              catchError(() => of([] as SpeciesChoice[])),
            ),
      ),
    ),
    { initialValue: [] as SpeciesChoice[] },
  );
  protected readonly proposedMatches = computed(() => {
    const q = this.query().toLowerCase();
    return this.proposed().filter((s) => q === '' || s.name.toLowerCase().includes(q) || s.formula.toLowerCase().includes(q));
  });

  constructor() {
    // A species set from outside (an item being edited) shows in the field.
    effect(() => {
      const species = this.species();
      untracked(() => {
        const current = this.text.value;
        if (species && current !== species) {
          this.text.setValue(species, { emitEvent: false });
        }
      });
    });
    this.text.valueChanges.pipe(takeUntilDestroyed()).subscribe((value) => {
      if (typeof value === 'string' && this.species() !== null) {
        this.species.set(null);
      }
    });
  }

  protected readonly display = (value: PickerValue | null): string => {
    if (value === null || typeof value === 'string') {
      return value ?? '';
    }
    return 'name' in value ? `${value.name} (${value.formula})` : value.create;
  };

  protected choose(event: MatAutocompleteSelectedEvent): void {
    const value = event.option.value as SpeciesChoice | CreateSpecies;
    if ('create' in value) {
      this.text.setValue(value.create, { emitEvent: false });
      this.creating.set(value.create);
      return;
    }
    this.creating.set(null);
    this.species.set(value);
  }

  /** Guesses whether the typed text is a formula or a name, to prefill the new species. */
  protected guess(text: string): Record<string, unknown> {
    return /^[A-Z][A-Za-z0-9()]*$/.test(text) && /\d|[A-Z].*[A-Z]/.test(text) ? { formula: text } : { name: text };
  }

  protected useNewSpecies(payload: Record<string, unknown>): void {
    const species: SpeciesChoice = { id: null, name: String(payload['name']), formula: String(payload['formula']), phases: [], draft: payload };
    this.creating.set(null);
    this.species.set(species);
  }

  /** Marks the field touched so that "choose a species" shows on a submit attempt. */
  touch(): void {
    this.text.markAsTouched();
    this.text.updateValueAndValidity();
  }
}
