import { Signal, WritableSignal, effect, untracked } from '@angular/core';

import { ProposalItem } from '../shared/proposals/proposal';
import { SpeciesChoice, Subject, subjectOf } from './subject';

/**
 * Names the subject of the item an item form edits: from the species the proposal adds and the
 * catalogue species known when the form opens, and again when the catalogue species arrives
 * later (its record is loaded after the form opens) while the subject is still unknown. Call in
 * the form's constructor; the subject picker changes `subject` from then on.
 */
export function fillEditedSubject(
  item: Signal<ProposalItem | null>,
  proposed: Signal<readonly SpeciesChoice[]>,
  knownSpecies: Signal<SpeciesChoice | null>,
  subject: WritableSignal<Subject | null>,
): void {
  effect(() => {
    const edited = item();
    const known = knownSpecies();
    if (edited && untracked(subject) === null) {
      const species = untracked(proposed);
      subject.set(subjectOf(edited.payload, known ? [...species, known] : species));
    }
  });
}
