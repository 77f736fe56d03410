import { ChangeDetectionStrategy, Component, OnInit, input, output } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

import { casRnRule, formulaRule, inchiKeyRule } from './species-entry-rules';

/**
 * A new species (the payload of an add_species item): formula and name, with optional
 * identifiers. Used on its own and inline from the species picker.
 */
@Component({
  selector: 'kx-species-item-form',
  imports: [MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
  template: `
    <form [formGroup]="form" (ngSubmit)="saveSpecies()" class="kx-item-grid" aria-label="New species">
      <mat-form-field appearance="outline">
        <mat-label>Formula</mat-label>
        <input matInput formControlName="formula" autocomplete="off" placeholder="CH3CH2CH2CH2OH" />
        @if (form.controls.formula.hasError('required')) {
          <mat-error>Enter the formula.</mat-error>
        } @else if (form.controls.formula.hasError('formula')) {
          <mat-error>Element symbols and counts, e.g. CH3CH2OH or SO4^2-.</mat-error>
        }
      </mat-form-field>
      <mat-form-field appearance="outline">
        <mat-label>Name</mat-label>
        <input matInput formControlName="name" autocomplete="off" />
        @if (form.controls.name.hasError('required')) {
          <mat-error>Enter the name.</mat-error>
        }
      </mat-form-field>
      <mat-form-field appearance="outline">
        <mat-label>CAS RN (optional)</mat-label>
        <input matInput formControlName="casRn" autocomplete="off" placeholder="71-36-3" />
        @if (form.controls.casRn.hasError('casRn')) {
          <mat-error>Not a valid CAS Registry Number (form or check digit).</mat-error>
        }
      </mat-form-field>
      <mat-form-field appearance="outline">
        <mat-label>InChIKey (optional)</mat-label>
        <input matInput formControlName="inchikey" autocomplete="off" />
        @if (form.controls.inchikey.hasError('inchikey')) {
          <mat-error>A standard InChIKey has 27 characters: 14-10-1 capital letters.</mat-error>
        }
      </mat-form-field>
      <mat-form-field appearance="outline" class="kx-span">
        <mat-label>Synonyms (optional, comma-separated)</mat-label>
        <input matInput formControlName="synonyms" autocomplete="off" />
      </mat-form-field>
      <div class="kx-item-actions kx-span">
        <button mat-flat-button type="submit" class="kx-save-species">{{ saveText() }}</button>
        <button mat-button type="button" (click)="cancel.emit()">Cancel</button>
      </div>
    </form>
  `,
  styleUrl: './item-forms.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SpeciesItemForm implements OnInit {
  readonly initial = input<Readonly<Record<string, unknown>>>({});
  readonly saveText = input('Add species');
  readonly save = output<Record<string, unknown>>();
  readonly cancel = output<void>();

  protected readonly form = new FormGroup({
    formula: new FormControl('', { nonNullable: true, validators: [Validators.required, formulaRule, Validators.maxLength(200)] }),
    name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(300)] }),
    casRn: new FormControl('', { nonNullable: true, validators: casRnRule }),
    inchikey: new FormControl('', { nonNullable: true, validators: inchiKeyRule }),
    synonyms: new FormControl('', { nonNullable: true }),
  });

  ngOnInit(): void {
    const initial = this.initial();
    const text = (key: string) => (typeof initial[key] === 'string' ? (initial[key] as string) : '');
    this.form.patchValue({
      formula: text('formula'),
      name: text('name'),
      casRn: text('casRn'),
      inchikey: text('inchikey'),
      synonyms: Array.isArray(initial['synonyms']) ? (initial['synonyms'] as string[]).join(', ') : '',
    });
  }

  protected saveSpecies(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const payload: Record<string, unknown> = { formula: value.formula.trim(), name: value.name.trim() };
    if (value.casRn.trim()) {
      payload['casRn'] = value.casRn.trim();
    }
    if (value.inchikey.trim()) {
      payload['inchikey'] = value.inchikey.trim();
    }
    const synonyms = value.synonyms.split(',').map((s) => s.trim()).filter(Boolean);
    if (synonyms.length > 0) {
      payload['synonyms'] = synonyms;
    }
    this.save.emit(payload);
  }
}
