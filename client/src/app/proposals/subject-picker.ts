import { ChangeDetectionStrategy, Component, computed, input, model, viewChild } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';

import { PHASES, PHASES_WITH_POLYMORPH, PhaseCode, phaseText } from '../shared/vocabulary/thermo-vocabulary';
import { SpeciesPicker } from './species-picker';
import { SpeciesChoice, Subject } from './subject';

interface PhaseOption {
  readonly key: string;
  readonly phase: PhaseCode;
  readonly polymorph: string | null;
  readonly label: string;
  readonly isNew: boolean;
}

/**
 * Picks the species phase a value or fit is about: a species (see SpeciesPicker), then one of
 * its phases, or a phase it does not have yet (added to the proposal with the item).
 */
@Component({
  selector: 'kx-subject-picker',
  imports: [FormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, SpeciesPicker],
  template: `
    <kx-species-picker [proposed]="proposed()" [species]="subject()?.species ?? null" (speciesChange)="chooseSpecies($event)" />
    @if (subject()?.species; as species) {
      <div class="kx-phase-row">
        <mat-form-field appearance="outline">
          <mat-label>Phase</mat-label>
          <mat-select [value]="phaseKey()" (selectionChange)="choosePhase($event.value)" class="kx-phase-select">
            @for (option of phaseOptions(); track option.key) {
              <mat-option [value]="option.key">{{ option.label }}</mat-option>
            }
          </mat-select>
          @if (!subject()?.phase) {
            <mat-hint>Choose the phase (IUPAC abbreviation).</mat-hint>
          }
        </mat-form-field>
        @if (subject()?.newPhase && takesPolymorph()) {
          <mat-form-field appearance="outline">
            <mat-label>Polymorph (optional)</mat-label>
            <input matInput [ngModel]="subject()?.polymorph ?? ''" (ngModelChange)="choosePolymorph($event)" autocomplete="off" placeholder="graphite" />
          </mat-form-field>
        }
      </div>
      @if (subject()?.newPhase) {
        <p class="kx-hint">{{ species.name }} has no {{ newPhaseText() }} phase yet: a new phase item is added with this item.</p>
      }
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .kx-phase-row {
      display: flex;
      flex-wrap: wrap;
      gap: 0 1rem;
    }
    .kx-hint {
      margin: 0 0 0.75rem;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SubjectPicker {
  private readonly speciesPicker = viewChild(SpeciesPicker);

  /** Species this proposal adds. */
  readonly proposed = input<readonly SpeciesChoice[]>([]);
  /** Phases this proposal adds to catalogue species, by species id. */
  readonly addedPhases = input<ReadonlyMap<string, readonly { phase: string; polymorph: string | null }[]>>(new Map());
  readonly subject = model<Subject | null>(null);

  protected readonly newPhaseText = computed(() => {
    const subject = this.subject();
    return subject?.phase ? phaseText(subject.phase, subject.polymorph) : '';
  });
  protected readonly phaseKey = computed(() => {
    const subject = this.subject();
    return subject?.phase ? key(subject.phase, subject.newPhase ? null : subject.polymorph, subject.newPhase) : null;
  });
  protected readonly takesPolymorph = computed(() => PHASES_WITH_POLYMORPH.includes(this.subject()?.phase as PhaseCode));
  protected readonly phaseOptions = computed((): PhaseOption[] => {
    const species = this.subject()?.species;
    if (!species) {
      return [];
    }
    const existing = [...species.phases, ...(species.id ? this.addedPhases().get(species.id) ?? [] : [])];
    const known: PhaseOption[] = existing.map((p) => ({
      key: key(p.phase as PhaseCode, p.polymorph, false),
      phase: p.phase as PhaseCode,
      polymorph: p.polymorph,
      label: phaseText(p.phase, p.polymorph),
      isNew: false,
    }));
    const others: PhaseOption[] = PHASES.filter((choice) => PHASES_WITH_POLYMORPH.includes(choice.value) || !existing.some((p) => p.phase === choice.value)).map(
      (choice) => ({ key: key(choice.value, null, true), phase: choice.value, polymorph: null, label: `${choice.label} (new phase)`, isNew: true }),
    );
    return [...known, ...others];
  });

  protected chooseSpecies(species: SpeciesChoice | null): void {
    if (!species) {
      this.subject.set(null);
      return;
    }
    const first = species.phases.length === 1 ? species.phases[0] : null;
    this.subject.set(
      first
        ? { species, phase: first.phase as PhaseCode, polymorph: first.polymorph, newPhase: false }
        : { species, phase: null, polymorph: null, newPhase: false },
    );
  }

  protected choosePhase(optionKey: string): void {
    const option = this.phaseOptions().find((o) => o.key === optionKey);
    const species = this.subject()?.species;
    if (option && species) {
      this.subject.set({ species, phase: option.phase, polymorph: option.polymorph, newPhase: option.isNew });
    }
  }

  protected choosePolymorph(polymorph: string): void {
    const subject = this.subject();
    if (subject) {
      this.subject.set({ ...subject, polymorph: polymorph.trim() || null });
    }
  }

  /** Shows "choose a species" when the field was left empty. */
  touch(): void {
    this.speciesPicker()?.touch();
  }
}

function key(phase: PhaseCode, polymorph: string | null, isNew: boolean): string {
  return `${isNew ? 'new:' : ''}${phase}|${polymorph ?? ''}`;
}

