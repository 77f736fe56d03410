import { ChangeDetectionStrategy, Component, DestroyRef, OnInit, computed, inject, input, output, signal, viewChild } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { map, startWith } from 'rxjs';

import { findPhase } from '../shared/catalogue/catalogue-api';
import { ProposalItem } from '../shared/proposals/proposal';
import { COEFFICIENT_COUNTS, FIT_FORMS } from '../shared/vocabulary/thermo-vocabulary';
import { catalogueRecord } from './catalogue-record';
import { FitEntryForm, fitEntryForm, fitEntryFromPayload, fitPayload, fitRangeForm, fitRanges, revalidateFit } from './fit-entry-rules';
import { FitPlot } from '../shared/heat-capacity/fit-plot';
import { fillEditedSubject } from './edited-subject';
import { ItemDraft, lacksSubject, subjectItemDraft } from './item-draft';
import { ProvenanceFields } from './provenance-fields';
import { SourceChoice } from '../shared/sources/source-picker';
import { SpeciesChoice, Subject } from './subject';
import { SubjectPicker } from './subject-picker';

/**
 * A heat-capacity fit (add_fit, or replace_fit for a new version of a catalogue fit): its form,
 * ranges and coefficients, pasted or typed, with a live plot against the species phase's data.
 */
@Component({
  selector: 'kx-fit-item-form',
  imports: [FitPlot, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ProvenanceFields, ReactiveFormsModule, SubjectPicker],
  templateUrl: './fit-item-form.html',
  styleUrls: ['./item-forms.scss', './fit-item-form.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FitItemForm implements OnInit {
  private readonly destroyRef = inject(DestroyRef);
  private readonly subjectPicker = viewChild(SubjectPicker);
  private readonly provenance = viewChild(ProvenanceFields);

  readonly proposed = input<readonly SpeciesChoice[]>([]);
  readonly addedPhases = input<ReadonlyMap<string, readonly { phase: string; polymorph: string | null }[]>>(new Map());
  readonly item = input<ProposalItem | null>(null);
  readonly knownSpecies = input<SpeciesChoice | null>(null);
  readonly save = output<ItemDraft>();
  readonly cancel = output<void>();

  protected readonly form: FitEntryForm = fitEntryForm();
  protected readonly subject = signal<Subject | null>(null);
  protected readonly source = signal<SourceChoice | null>(null);
  /** The catalogue fit this one replaces (replace_fit), or null for a new fit. */
  protected readonly replaces = signal<string | null>(null);
  protected readonly submitted = signal(false);

  protected readonly forms = FIT_FORMS;

  private readonly entry = toSignal(this.form.valueChanges.pipe(startWith(null), map(() => this.form.getRawValue())), {
    initialValue: this.form.getRawValue(),
  });
  protected readonly fitForm = computed(() => this.entry().form);
  protected readonly tabulated = computed(() => this.fitForm() === 'tabulated');
  protected readonly coefficientHint = computed(() => {
    const form = this.fitForm();
    return form === 'tabulated' ? 'One “T Cp” pair per line (K, J/(mol·K))' : `${COEFFICIENT_COUNTS[form]} numbers, in order; paste them as printed`;
  });
  protected readonly plotRanges = computed(() => fitRanges(this.entry()));
  private readonly record = catalogueRecord(computed(() => this.subject()?.species.id ?? null));
  protected readonly existingPhase = computed(() => {
    const record = this.record();
    const subject = this.subject();
    return record && subject?.phase && !subject.newPhase ? findPhase(record, subject.phase, subject.polymorph) ?? null : null;
  });
  protected readonly existingFits = computed(() => this.existingPhase()?.fits ?? []);

  constructor() {
    fillEditedSubject(this.item, this.proposed, this.knownSpecies, this.subject);
  }

  ngOnInit(): void {
    const item = this.item();
    if (item) {
      const entry = fitEntryFromPayload(item.payload);
      this.form.controls.ranges.clear();
      for (const range of entry.ranges) {
        this.form.controls.ranges.push(fitRangeForm(range));
      }
      const { ranges: _ranges, ...rest } = entry;
      this.form.patchValue(rest);
      if (item.kind === 'replace_fit') {
        this.replaces.set(String(item.payload['fitId'] ?? ''));
      }
      this.source.set(item.source);
    }
    revalidateFit(this.form);
    this.form.valueChanges.pipe(takeUntilDestroyed(this.destroyRef)).subscribe(() => revalidateFit(this.form));
  }

  protected rangeError(index: number): string {
    const range = this.form.controls.ranges.at(index);
    if (!range.touched && !this.submitted()) {
      return '';
    }
    const errors = range.errors ?? {};
    return [errors['range'], errors['numbers']].filter(Boolean).join(' ');
  }

  protected rangesError(): string {
    return (this.form.controls.ranges.errors?.['ranges'] as string | undefined) ?? '';
  }

  protected addRange(): void {
    const ranges = this.form.controls.ranges;
    const last = ranges.at(ranges.length - 1)?.getRawValue();
    ranges.push(fitRangeForm({ tMin: last?.tMax ?? '' }));
  }

  protected removeRange(index: number): void {
    this.form.controls.ranges.removeAt(index);
  }

  protected saveFit(): void {
    this.submitted.set(true);
    revalidateFit(this.form);
    const replaces = this.replaces();
    if (this.form.invalid || !this.source() || (!replaces && lacksSubject(this.subject(), this.item()))) {
      this.form.markAllAsTouched();
      this.subjectPicker()?.touch();
      this.provenance()?.touch();
      return;
    }
    const payload = fitPayload(this.form.getRawValue());
    const sourceId = this.source()!.id;
    this.save.emit(
      replaces
        ? { kind: 'replace_fit', payload: { fitId: replaces, ...payload }, sourceId, prerequisites: [] }
        : subjectItemDraft('add_fit', this.subject(), this.item(), payload, sourceId),
    );
  }
}
