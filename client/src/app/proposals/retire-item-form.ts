import { ChangeDetectionStrategy, Component, computed, input, output, signal, viewChild } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';

import { findPhase, valuesOf } from '../shared/catalogue/catalogue-api';
import { Quantity } from '../shared/quantity/quantity';
import { convertFromSi } from '../shared/unit-selector/molar-energy-unit';
import { quantitySymbol } from '../shared/vocabulary/thermo-vocabulary';
import { catalogueRecord } from './catalogue-record';
import { ItemDraft } from './item-draft';
import { Subject } from './subject';
import { SubjectPicker } from './subject-picker';

/** Retires a value of the catalogue (retire_value): which one, and why. Nothing is deleted; the next release leaves it out. */
@Component({
  selector: 'kx-retire-item-form',
  imports: [MatButtonModule, MatFormFieldModule, MatInputModule, MatRadioModule, Quantity, ReactiveFormsModule, SubjectPicker],
  template: `
    <form [formGroup]="form" (ngSubmit)="saveRetirement()" class="kx-item-grid" aria-label="Retire a value">
      <div class="kx-span">
        <kx-subject-picker [subject]="subject()" (subjectChange)="subject.set($event); valueId.set(null)" />
      </div>
      @if (values().length > 0) {
        <fieldset class="kx-field-group">
          <legend>Value to retire</legend>
          <mat-radio-group [value]="valueId()" (change)="valueId.set($event.value)" aria-label="Value to retire" class="kx-radio-column">
            @for (v of values(); track v.id) {
              <mat-radio-button [value]="v.id">
                {{ v.symbol }} <kx-quantity class="kx-inline-quantity" [value]="v.shown.value" [uncertainty]="v.shown.uncertainty" [unit]="v.shown.unit" /> from {{ v.source }}
              </mat-radio-button>
            }
          </mat-radio-group>
        </fieldset>
      } @else if (subject()?.phase) {
        <p class="kx-hint kx-span">This species phase holds no values in the latest release.</p>
      }
      @if (problem()) {
        <p class="kx-form-problem" role="alert">{{ problem() }}</p>
      }
      <mat-form-field appearance="outline" class="kx-span">
        <mat-label>Reason</mat-label>
        <input matInput formControlName="reason" autocomplete="off" placeholder="duplicate entry of the same measurement" />
        <mat-error>Say why the value is retired.</mat-error>
      </mat-form-field>
      <div class="kx-item-actions kx-span">
        <button mat-flat-button type="submit" class="kx-save-item">Retire value</button>
        <button mat-button type="button" (click)="cancel.emit()">Cancel</button>
      </div>
    </form>
  `,
  styleUrl: './item-forms.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RetireItemForm {
  private readonly picker = viewChild(SubjectPicker);

  readonly save = output<ItemDraft>();
  readonly cancel = output<void>();

  protected readonly subject = signal<Subject | null>(null);
  protected readonly valueId = signal<string | null>(null);
  protected readonly problem = signal('');
  protected readonly reason = new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(2000)] });
  protected readonly form = new FormGroup({ reason: this.reason });
  private readonly record = catalogueRecord(computed(() => this.subject()?.species.id ?? null));
  protected readonly values = computed(() => {
    const record = this.record();
    const subject = this.subject();
    const phase = record && subject?.phase ? findPhase(record, subject.phase, subject.polymorph) : undefined;
    return (phase?.quantities ?? []).flatMap((q) =>
      valuesOf(q).map((value) => {
        const main = convertFromSi(value.value, value.unit, 'kJ/mol');
        return {
          id: value.id,
          symbol: quantitySymbol(q.quantity, q.transitionKind),
          source: value.source.key,
          shown: { value: main.value, uncertainty: value.uncertainty === null ? null : convertFromSi(value.uncertainty, value.unit, 'kJ/mol').value, unit: main.unit },
        };
      }),
    );
  });

  protected saveRetirement(): void {
    this.problem.set(this.valueId() ? '' : 'Choose the value to retire.');
    if (this.reason.invalid || !this.valueId()) {
      this.reason.markAsTouched();
      this.picker()?.touch();
      return;
    }
    this.save.emit({ kind: 'retire_value', payload: { valueId: this.valueId(), reason: this.reason.value.trim() }, sourceId: null, prerequisites: [] });
  }
}


