import { ChangeDetectionStrategy, Component, computed, input, model, viewChild } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { startWith, switchMap } from 'rxjs';

import { SourceChoice, SourcePicker } from '../shared/sources/source-picker';
import { METHODS, STANDARD_PRESSURES, StandardPressure, ValueMethod } from '../shared/vocabulary/thermo-vocabulary';
import { ProvenanceField, provenanceMessage } from './value-entry-rules';

/** The controls of an entry's form that these fields edit; a value's form and a fit's form both have them. */
export interface ProvenanceControls {
  readonly pressurePa: FormControl<StandardPressure>;
  readonly method: FormControl<ValueMethod | null>;
  readonly levelOfTheory: FormControl<string>;
  readonly sourceLocator: FormControl<string>;
  readonly notes: FormControl<string>;
}

/**
 * Where an entered value or fit comes from: its standard pressure and method (with the level of
 * theory of a computed one), the source it cites, where in that source, and notes. Fields given
 * as content join the conditions row, before the pressure (a value's temperature).
 */
@Component({
  selector: 'kx-provenance-fields',
  imports: [MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule, SourcePicker],
  template: `
    <div class="kx-item-grid">
      <fieldset class="kx-field-group">
        <legend>Conditions and method</legend>
        <div class="kx-field-row">
          <ng-content />
          <mat-form-field appearance="outline">
            <mat-label>Standard pressure p°</mat-label>
            <mat-select [formControl]="controls().pressurePa">
              @for (p of pressures; track p.value) {
                <mat-option [value]="p.value">{{ p.label }}</mat-option>
              }
            </mat-select>
          </mat-form-field>
          <mat-form-field appearance="outline">
            <mat-label>Method</mat-label>
            <mat-select [formControl]="controls().method">
              @for (m of methods; track m.value) {
                <mat-option [value]="m.value">{{ m.label }}</mat-option>
              }
            </mat-select>
            <mat-error>{{ message('method') }}</mat-error>
          </mat-form-field>
          @if (computedMethod()) {
            <mat-form-field appearance="outline">
              <mat-label>Level of theory</mat-label>
              <input matInput [formControl]="controls().levelOfTheory" autocomplete="off" placeholder="G4" />
              <mat-error>{{ message('levelOfTheory') }}</mat-error>
            </mat-form-field>
          }
        </div>
      </fieldset>

      <div class="kx-span">
        <kx-source-picker [(source)]="source" />
      </div>
      <mat-form-field appearance="outline">
        <mat-label>Where in the source (optional)</mat-label>
        <input matInput [formControl]="controls().sourceLocator" autocomplete="off" placeholder="Table 3, p. 14" />
        <mat-error>{{ message('sourceLocator') }}</mat-error>
      </mat-form-field>
      <mat-form-field appearance="outline">
        <mat-label>Notes (optional)</mat-label>
        <input matInput [formControl]="controls().notes" autocomplete="off" />
        <mat-error>{{ message('notes') }}</mat-error>
      </mat-form-field>
    </div>
  `,
  styleUrl: './item-forms.scss',
  styles: `
    :host {
      grid-column: 1 / -1;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProvenanceFields {
  private readonly sourcePicker = viewChild.required(SourcePicker);

  readonly controls = input.required<ProvenanceControls>();
  /** What is entered, as the messages name it: "value", "fit". */
  readonly entry = input.required<string>();
  readonly source = model<SourceChoice | null>(null);

  protected readonly methods = METHODS;
  protected readonly pressures = STANDARD_PRESSURES;

  private readonly method = toSignal(
    toObservable(this.controls).pipe(switchMap((controls) => controls.method.valueChanges.pipe(startWith(controls.method.value)))),
    { initialValue: null },
  );
  protected readonly computedMethod = computed(() => this.method() === 'computed');

  protected message(field: ProvenanceField): string {
    return provenanceMessage(field, this.controls()[field].errors, this.entry());
  }

  /** Shows what the source picker misses, as after a save that failed. */
  touch(): void {
    this.sourcePicker().touch();
  }
}
