import { ChangeDetectionStrategy, Component, computed, input, output, signal, viewChild } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';

import { PHASES, PHASES_WITH_POLYMORPH, PhaseCode } from '../shared/vocabulary/thermo-vocabulary';
import { ItemDraft } from './item-draft';
import { SpeciesPicker } from './species-picker';
import { SpeciesChoice } from './subject';

/** A new phase of a species (add_phase): the phase, an optional polymorph, and whether it is the element's reference state. */
@Component({
  selector: 'kx-phase-item-form',
  imports: [MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule, SpeciesPicker],
  template: `
    <form [formGroup]="form" (ngSubmit)="savePhase()" class="kx-item-grid" aria-label="New phase">
      <div class="kx-span">
        <kx-species-picker [proposed]="proposed()" [species]="species()" (speciesChange)="species.set($event)" />
      </div>
      <mat-form-field appearance="outline">
        <mat-label>Phase</mat-label>
        <mat-select formControlName="phase">
          @for (p of phases; track p.value) {
            <mat-option [value]="p.value">{{ p.label }}</mat-option>
          }
        </mat-select>
        <mat-error>Choose the phase.</mat-error>
      </mat-form-field>
      @if (takesPolymorph()) {
        <mat-form-field appearance="outline">
          <mat-label>Polymorph (optional)</mat-label>
          <input matInput formControlName="polymorph" autocomplete="off" placeholder="graphite" />
        </mat-form-field>
      }
      <mat-checkbox formControlName="isReferenceState" class="kx-span">This phase is the reference state of the element</mat-checkbox>
      <div class="kx-item-actions kx-span">
        <button mat-flat-button type="submit" class="kx-save-item">Add phase</button>
        <button mat-button type="button" (click)="cancel.emit()">Cancel</button>
      </div>
    </form>
  `,
  styleUrl: './item-forms.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhaseItemForm {
  private readonly picker = viewChild(SpeciesPicker);

  readonly proposed = input<readonly SpeciesChoice[]>([]);
  readonly save = output<ItemDraft>();
  readonly cancel = output<void>();

  protected readonly phases = PHASES;
  protected readonly species = signal<SpeciesChoice | null>(null);
  protected readonly form = new FormGroup({
    phase: new FormControl<PhaseCode | null>(null, { validators: Validators.required }),
    polymorph: new FormControl('', { nonNullable: true, validators: Validators.maxLength(100) }),
    isReferenceState: new FormControl(false, { nonNullable: true }),
  });
  private readonly phase = toSignal(this.form.controls.phase.valueChanges, { initialValue: null });
  protected readonly takesPolymorph = computed(() => PHASES_WITH_POLYMORPH.includes(this.phase() as PhaseCode));

  protected savePhase(): void {
    const species = this.species();
    if (this.form.invalid || !species) {
      this.form.markAllAsTouched();
      this.picker()?.touch();
      return;
    }
    const { phase, polymorph, isReferenceState } = this.form.getRawValue();
    const payload: Record<string, unknown> = species.id ? { speciesId: species.id } : { species: species.name };
    payload['phase'] = phase;
    if (this.takesPolymorph() && polymorph.trim()) {
      payload['polymorph'] = polymorph.trim();
    }
    if (isReferenceState) {
      payload['isReferenceState'] = true;
    }
    this.save.emit({ kind: 'add_phase', payload, sourceId: null, prerequisites: species.draft ? [{ kind: 'add_species', payload: species.draft }] : [] });
  }
}
