import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';

import { ProposalItem } from '../shared/proposals/proposal';
import { fillEditedSubject } from './edited-subject';
import { SpeciesChoice, Subject } from './subject';

const water: SpeciesChoice = { id: 'sp-1', name: 'water', formula: 'H2O', phases: [{ phase: 'l', polymorph: null }] };
const butanol: SpeciesChoice = { id: null, name: 'butan-1-ol', formula: 'C4H10O', phases: [] };

function item(payload: Record<string, unknown>): ProposalItem {
  return {
    id: 'i1', position: 1, kind: 'add_value', payload, sourceId: null, source: null,
    speciesId: null, speciesPhaseId: null, targetValueId: null, targetFitId: null,
    checks: null, checksRanAt: null, checkSummary: { pass: 0, warn: 0, fail: 0 }, evidence: [],
  };
}

describe('fillEditedSubject', () => {
  function follow(edited: ProposalItem | null, known: SpeciesChoice | null = null) {
    const state = { item: signal(edited), proposed: signal<readonly SpeciesChoice[]>([butanol]), known: signal(known), subject: signal<Subject | null>(null) };
    TestBed.runInInjectionContext(() => fillEditedSubject(state.item, state.proposed, state.known, state.subject));
    TestBed.tick();
    return state;
  }

  it('names a species the proposal adds at once', () => {
    const { subject } = follow(item({ species: 'butan-1-ol', phase: 'l' }));
    expect(subject()).toEqual({ species: butanol, phase: 'l', polymorph: null, newPhase: false });
  });

  it('names a catalogue species once its record arrives, and leaves a chosen subject alone', () => {
    const state = follow(item({ speciesId: 'sp-1', phase: 'l' }));
    expect(state.subject()).toBeNull();
    state.known.set(water);
    TestBed.tick();
    expect(state.subject()?.species).toBe(water);

    const chosen: Subject = { species: butanol, phase: 'g', polymorph: null, newPhase: true };
    state.subject.set(chosen);
    state.known.set({ ...water });
    TestBed.tick();
    expect(state.subject()).toBe(chosen);
  });

  it('does nothing for a new item', () => {
    expect(follow(null, water).subject()).toBeNull();
  });
});
