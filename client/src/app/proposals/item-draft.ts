import { NewItem } from '../shared/proposals/proposals-api';
import { ProposalItemKind } from '../shared/proposals/proposal';
import { CompleteSubject, subjectPayload } from './subject';

/**
 * What an item form hands the editor to save: the item, and the items it needs first (a species
 * entered inline, a phase the species does not have yet), in the order to add them.
 */
export interface ItemDraft {
  readonly kind: ProposalItemKind;
  readonly payload: Record<string, unknown>;
  readonly sourceId: string | null;
  readonly prerequisites: readonly NewItem[];
}

/** The add_species and add_phase items a subject needs before an item about it. */
export function prerequisitesFor(subject: CompleteSubject): NewItem[] {
  const items: NewItem[] = [];
  if (subject.species.draft) {
    items.push({ kind: 'add_species', payload: subject.species.draft });
  }
  if (subject.newPhase) {
    items.push({ kind: 'add_phase', payload: subjectPayload(subject) });
  }
  return items;
}
