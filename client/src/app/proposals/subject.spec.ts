import { proposedPhases, proposedSpecies, subjectFieldsOf, subjectOf, subjectPayload } from './subject';

describe('subjects', () => {
  const items = [
    { kind: 'add_species' as const, payload: { name: 'butan-1-ol', formula: 'CH3CH2CH2CH2OH' } },
    { kind: 'add_phase' as const, payload: { species: 'butan-1-ol', phase: 'l' } },
    { kind: 'add_phase' as const, payload: { speciesId: 's-water', phase: 'cr', polymorph: 'ice Ih' } },
  ];

  it('names a catalogue species by id and a proposed one by name', () => {
    expect(subjectPayload({ species: { id: 's-water', name: 'water', formula: 'H2O', phases: [] }, phase: 'l', polymorph: null })).toEqual({ speciesId: 's-water', phase: 'l' });
    expect(subjectPayload({ species: { id: null, name: 'butan-1-ol', formula: 'C4H10O', phases: [] }, phase: 'cr', polymorph: ' rhombic ' })).toEqual({
      species: 'butan-1-ol',
      phase: 'cr',
      polymorph: 'rhombic',
    });
  });

  it('collects the species and phases a proposal adds', () => {
    expect(proposedSpecies(items)).toEqual([{ id: null, name: 'butan-1-ol', formula: 'CH3CH2CH2CH2OH', phases: [{ phase: 'l', polymorph: null }] }]);
    expect(proposedPhases(items).get('s-water')).toEqual([{ phase: 'cr', polymorph: 'ice Ih' }]);
  });

  it('finds the subject an item names among the known species', () => {
    const known = proposedSpecies(items);
    expect(subjectOf({ species: 'butan-1-ol', phase: 'l' }, known)?.species.name).toBe('butan-1-ol');
    expect(subjectOf({ speciesId: 'unknown', phase: 'l' }, known)).toBeNull();
  });

  it('keeps the subject fields of a stored payload for an edit that leaves them alone', () => {
    expect(subjectFieldsOf({ speciesId: 's1', phase: 'cr', polymorph: 'graphite', value: '1', unit: 'kJ/mol' })).toEqual({ speciesId: 's1', phase: 'cr', polymorph: 'graphite' });
  });
});
