import { prerequisitesFor } from './item-draft';

describe('prerequisitesFor', () => {
  it('adds nothing for a catalogue species phase that exists', () => {
    expect(prerequisitesFor({ species: { id: 's1', name: 'water', formula: 'H2O', phases: [{ phase: 'l', polymorph: null }] }, phase: 'l', polymorph: null, newPhase: false })).toEqual([]);
  });

  it('adds a species entered inline, then its new phase, named by the species name', () => {
    const draft = { formula: 'CH3CH2CH2CH2OH', name: 'butan-1-ol' };
    expect(prerequisitesFor({ species: { id: null, name: 'butan-1-ol', formula: 'CH3CH2CH2CH2OH', phases: [], draft }, phase: 'l', polymorph: null, newPhase: true })).toEqual([
      { kind: 'add_species', payload: draft },
      { kind: 'add_phase', payload: { species: 'butan-1-ol', phase: 'l' } },
    ]);
  });

  it('adds a new phase of a catalogue species by its id', () => {
    expect(prerequisitesFor({ species: { id: 's1', name: 'carbon', formula: 'C', phases: [] }, phase: 'cr', polymorph: 'diamond', newPhase: true })).toEqual([
      { kind: 'add_phase', payload: { speciesId: 's1', phase: 'cr', polymorph: 'diamond' } },
    ]);
  });
});
