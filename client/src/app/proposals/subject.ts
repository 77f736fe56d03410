import { PhaseCode } from '../shared/vocabulary/thermo-vocabulary';
import { ProposalItem } from '../shared/proposals/proposal';

/** A species to attach data to: one in the catalogue (with its id) or one this proposal adds (id null). */
export interface SpeciesChoice {
  readonly id: string | null;
  readonly name: string;
  readonly formula: string;
  /** Phases it already has (catalogue) or that this proposal adds. */
  readonly phases: readonly { readonly phase: string; readonly polymorph: string | null }[];
  /** A species entered inline and not saved yet: the add_species payload to save first. */
  readonly draft?: Readonly<Record<string, unknown>>;
}

/** The species phase a value or fit is about. */
export interface Subject {
  readonly species: SpeciesChoice;
  /** Null until a phase is chosen. */
  readonly phase: PhaseCode | null;
  readonly polymorph: string | null;
  /** The species lacks this phase: saving the item adds an add_phase item first. */
  readonly newPhase: boolean;
}

/** The payload fields naming a subject: speciesId for a catalogue species, else its name. */
export function subjectPayload(subject: Pick<Subject, 'species' | 'polymorph'> & { readonly phase: PhaseCode }): Record<string, unknown> {
  const payload: Record<string, unknown> = subject.species.id ? { speciesId: subject.species.id } : { species: subject.species.name };
  payload['phase'] = subject.phase;
  if (subject.polymorph?.trim()) {
    payload['polymorph'] = subject.polymorph.trim();
  }
  return payload;
}

/** The species and phases a proposal's own add_species and add_phase items create. */
export function proposedSpecies(items: readonly Pick<ProposalItem, 'kind' | 'payload'>[]): SpeciesChoice[] {
  const species = items
    .filter((item) => item.kind === 'add_species')
    .map((item) => ({ id: null, name: String(item.payload['name'] ?? ''), formula: String(item.payload['formula'] ?? ''), phases: [] as { phase: string; polymorph: string | null }[] }));
  for (const item of items.filter((i) => i.kind === 'add_phase')) {
    const target = species.find((s) => s.name === item.payload['species']);
    target?.phases.push({ phase: String(item.payload['phase']), polymorph: (item.payload['polymorph'] as string | undefined) ?? null });
  }
  return species;
}

/** Phases this proposal adds to catalogue species, by species id. */
export function proposedPhases(items: readonly Pick<ProposalItem, 'kind' | 'payload'>[]): Map<string, { phase: string; polymorph: string | null }[]> {
  const phases = new Map<string, { phase: string; polymorph: string | null }[]>();
  for (const item of items) {
    const speciesId = item.payload['speciesId'];
    if (item.kind === 'add_phase' && typeof speciesId === 'string') {
      phases.set(speciesId, [...(phases.get(speciesId) ?? []), { phase: String(item.payload['phase']), polymorph: (item.payload['polymorph'] as string | undefined) ?? null }]);
    }
  }
  return phases;
}

/** The subject an item's payload names, when the species is among `known`. */
export function subjectOf(payload: Readonly<Record<string, unknown>>, known: readonly SpeciesChoice[]): Subject | null {
  const species = known.find((s) => (s.id !== null ? s.id === payload['speciesId'] : s.name === payload['species']));
  if (!species || typeof payload['phase'] !== 'string') {
    return null;
  }
  return { species, phase: payload['phase'] as PhaseCode, polymorph: (payload['polymorph'] as string | undefined) ?? null, newPhase: false };
}

/** A subject naming both a species and a phase. */
export type CompleteSubject = Subject & { readonly phase: PhaseCode };

export function subjectComplete(subject: Subject | null): subject is CompleteSubject {
  return !!subject && !!subject.phase;
}

/** The fields naming the subject in a stored payload (kept as they are when an edit leaves the subject alone). */
export function subjectFieldsOf(payload: Readonly<Record<string, unknown>>): Record<string, unknown> {
  const fields: Record<string, unknown> = {};
  for (const key of ['speciesPhaseId', 'speciesId', 'species', 'phase', 'polymorph']) {
    if (payload[key] !== undefined) {
      fields[key] = payload[key];
    }
  }
  return fields;
}
