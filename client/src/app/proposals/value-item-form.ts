import { ChangeDetectionStrategy, Component, DestroyRef, OnInit, computed, inject, input, output, signal, viewChild } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { startWith } from 'rxjs';

import { CatalogueValue, findPhase, valuesOf } from '../shared/catalogue/catalogue-api';
import { ProposalItem } from '../shared/proposals/proposal';
import { Quantity } from '../shared/quantity/quantity';
import { convertFromSi } from '../shared/unit-selector/molar-energy-unit';
import { QUANTITIES, QuantityCode, TRANSITIONS, unitsFor } from '../shared/vocabulary/thermo-vocabulary';
import { catalogueRecord } from './catalogue-record';
import { fillEditedSubject } from './edited-subject';
import { ItemDraft, lacksSubject, subjectItemDraft } from './item-draft';
import { ProvenanceFields } from './provenance-fields';
import { SourceChoice } from '../shared/sources/source-picker';
import { SpeciesChoice, Subject } from './subject';
import { SubjectPicker } from './subject-picker';
import { ValueEntry, entryFromPayload, revalidateDependents, valueEntryForm, valueEntryMessage, valuePayload } from './value-entry-rules';

let nextFormId = 0;

/**
 * A value with its uncertainty, standard state, method and source: a new value (add_value) or a
 * new version of one in the catalogue (revise_value). Validation messages appear as the steward
 * types; the existing values of the species phase and quantity are listed to compare with.
 */
@Component({
  selector: 'kx-value-item-form',
  imports: [
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatInputModule,
    MatRadioModule,
    MatSelectModule,
    ProvenanceFields,
    Quantity,
    ReactiveFormsModule,
    SubjectPicker,
  ],
  templateUrl: './value-item-form.html',
  styleUrl: './item-forms.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ValueItemForm implements OnInit {
  private readonly destroyRef = inject(DestroyRef);
  private readonly subjectPicker = viewChild(SubjectPicker);
  private readonly provenance = viewChild(ProvenanceFields);

  /** Species and phases the proposal adds, to offer in the pickers. */
  readonly proposed = input<readonly SpeciesChoice[]>([]);
  readonly addedPhases = input<ReadonlyMap<string, readonly { phase: string; polymorph: string | null }[]>>(new Map());
  /** The item being edited, or null for a new one. */
  readonly item = input<ProposalItem | null>(null);
  /** A catalogue species to start from (editing an add_value item that names one by id). */
  readonly knownSpecies = input<SpeciesChoice | null>(null);
  readonly save = output<ItemDraft>();
  readonly cancel = output<void>();

  protected readonly ids = { unit: `kx-unit-${nextFormId}`, kind: `kx-ukind-${nextFormId++}` };
  protected readonly form = valueEntryForm();
  protected readonly subject = signal<Subject | null>(null);
  protected readonly source = signal<SourceChoice | null>(null);
  /** The value this one revises (revise_value), or null for a new value. */
  protected readonly revises = signal<string | null>(null);
  protected readonly submitted = signal(false);

  protected readonly quantities = QUANTITIES;
  protected readonly transitions = TRANSITIONS;

  private readonly entry = toSignal(this.form.valueChanges.pipe(startWith(null)), { initialValue: null });
  protected readonly quantity = computed(() => (this.entry(), this.form.controls.quantity.value));
  protected readonly units = computed(() => unitsFor(this.quantity()));
  protected readonly showTransition = computed(() => this.quantity() === 'dtrsH');
  protected readonly expanded = computed(() => (this.entry(), this.form.controls.uncertaintyKind.value === 'expanded'));
  protected readonly editingRevision = computed(() => this.item()?.kind === 'revise_value');

  private readonly record = catalogueRecord(computed(() => this.subject()?.species.id ?? null));
  /** Values of the chosen species phase and quantity in the latest published release. */
  protected readonly existing = computed(() => {
    const record = this.record();
    const subject = this.subject();
    if (!record || !subject?.phase || subject.newPhase) {
      return [];
    }
    const transition = this.form.controls.transitionKind.value;
    const quantity = findPhase(record, subject.phase, subject.polymorph)?.quantities.find(
      (q) => q.quantity === this.quantity() && (this.quantity() !== 'dtrsH' || q.transitionKind === transition),
    );
    return valuesOf(quantity).map((value, index) => ({ value, recommended: index === 0 && !!quantity?.recommended, shown: shown(value) }));
  });
  protected readonly release = computed(() => this.record()?.release ?? '');

  constructor() {
    fillEditedSubject(this.item, this.proposed, this.knownSpecies, this.subject);
  }

  ngOnInit(): void {
    const item = this.item();
    if (item) {
      this.form.patchValue(entryFromPayload(item.payload, item.kind === 'revise_value' ? quantityFromUnit(String(item.payload['unit'] ?? '')) : undefined));
      if (item.kind === 'revise_value') {
        this.revises.set(String(item.payload['valueId'] ?? ''));
      }
      this.source.set(item.source);
    }
    revalidateDependents(this.form);
    this.form.controls.quantity.valueChanges.pipe(takeUntilDestroyed(this.destroyRef)).subscribe((quantity) => {
      if (!unitsFor(quantity).includes(this.form.controls.unit.value)) {
        this.form.controls.unit.setValue(unitsFor(quantity)[0]);
      }
      if (quantity !== 'dtrsH') {
        this.form.controls.transitionKind.setValue(null);
      }
      this.revises.set(null);
    });
    this.form.valueChanges.pipe(takeUntilDestroyed(this.destroyRef)).subscribe(() => revalidateDependents(this.form));
  }

  protected message(field: keyof ValueEntry): string {
    return valueEntryMessage(field, this.form.controls[field].errors, this.quantity());
  }

  protected chooseSubject(subject: Subject | null): void {
    this.subject.set(subject);
    this.revises.set(null);
  }

  protected saveValue(): void {
    this.submitted.set(true);
    revalidateDependents(this.form);
    if (this.form.invalid || !this.source() || (!this.editingRevision() && lacksSubject(this.subject(), this.item()))) {
      this.form.markAllAsTouched();
      this.subjectPicker()?.touch();
      this.provenance()?.touch();
      return;
    }
    const entry = this.form.getRawValue();
    const revises = this.revises();
    const sourceId = this.source()!.id;
    this.save.emit(
      revises
        ? { kind: 'revise_value', payload: { valueId: revises, ...valuePayload(entry, { withQuantity: false }) }, sourceId, prerequisites: [] }
        : subjectItemDraft('add_value', this.subject(), this.item(), valuePayload(entry, { withQuantity: true }), sourceId),
    );
  }
}

/** A value in the unit it is usually read in (kJ/mol, J/(mol·K)). */
function shown(value: CatalogueValue): { value: number; uncertainty: number | null; unit: string } {
  const main = convertFromSi(value.value, value.unit, 'kJ/mol');
  const uncertainty = value.uncertainty === null ? null : convertFromSi(value.uncertainty, value.unit, 'kJ/mol').value;
  return { value: main.value, uncertainty, unit: main.unit };
}

/** The quantity family a unit belongs to, for the rules of a revision whose quantity is the revised value's. */
function quantityFromUnit(unit: string): QuantityCode {
  return unitsFor('dfH').includes(unit) ? 'dfH' : 'S';
}

