import { NewItem } from '../shared/proposals/proposals-api';
import { ProposalItem, ProposalItemKind } from '../shared/proposals/proposal';
import { CompleteSubject, Subject, subjectComplete, subjectFieldsOf, subjectPayload } from './subject';

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

/**
 * Whether a value or fit form still lacks its subject: a new item needs a complete one; an item
 * being edited keeps its own while the picker is left empty.
 */
export function lacksSubject(subject: Subject | null, edited: ProposalItem | null): boolean {
  return !(edited && subject === null) && !subjectComplete(subject);
}

/**
 * An add_value or add_fit item: the subject's fields (or, where an edit left the subject alone,
 * the item's own) with the entry's `fields`, and for a new item what its subject needs first.
 */
export function subjectItemDraft(
  kind: 'add_value' | 'add_fit',
  subject: Subject | null,
  edited: ProposalItem | null,
  fields: Record<string, unknown>,
  sourceId: string,
): ItemDraft {
  const complete = subjectComplete(subject) ? subject : null;
  return {
    kind,
    payload: { ...(complete ? subjectPayload(complete) : edited ? subjectFieldsOf(edited.payload) : {}), ...fields },
    sourceId,
    prerequisites: edited || !complete ? [] : prerequisitesFor(complete),
  };
}
