import { ProposalItem } from '../shared/proposals/proposal';
import { lacksSubject, prerequisitesFor, subjectItemDraft } from './item-draft';
import { Subject } from './subject';

const edited: ProposalItem = {
  id: 'i1', position: 1, kind: 'add_value', payload: { speciesId: 'sp-1', phase: 'l', value: '-302.6' }, sourceId: 's1', source: null,
  speciesId: null, speciesPhaseId: null, targetValueId: null, targetFitId: null,
  checks: null, checksRanAt: null, checkSummary: { pass: 0, warn: 0, fail: 0 }, evidence: [],
};
const inlineSpecies: Subject = {
  species: { id: null, name: 'butan-1-ol', formula: 'C4H10O', phases: [], draft: { formula: 'C4H10O', name: 'butan-1-ol' } },
  phase: 'l',
  polymorph: null,
  newPhase: true,
};

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

describe('lacksSubject', () => {
  it('wants a complete subject for a new item', () => {
    expect(lacksSubject(null, null)).toBeTrue();
    expect(lacksSubject({ ...inlineSpecies, phase: null }, null)).toBeTrue();
    expect(lacksSubject(inlineSpecies, null)).toBeFalse();
  });

  it('lets an edited item keep its subject while the picker is empty, but not a half-chosen one', () => {
    expect(lacksSubject(null, edited)).toBeFalse();
    expect(lacksSubject({ ...inlineSpecies, phase: null }, edited)).toBeTrue();
  });
});

describe('subjectItemDraft', () => {
  it('names the subject of a new item and adds what it needs first', () => {
    expect(subjectItemDraft('add_value', inlineSpecies, null, { value: '-327.3' }, 's2')).toEqual({
      kind: 'add_value',
      payload: { species: 'butan-1-ol', phase: 'l', value: '-327.3' },
      sourceId: 's2',
      prerequisites: [
        { kind: 'add_species', payload: { formula: 'C4H10O', name: 'butan-1-ol' } },
        { kind: 'add_phase', payload: { species: 'butan-1-ol', phase: 'l' } },
      ],
    });
  });

  it('keeps the subject of an edited item left alone, and adds nothing before it', () => {
    expect(subjectItemDraft('add_fit', null, edited, { form: 'constant' }, 's1')).toEqual({
      kind: 'add_fit',
      payload: { speciesId: 'sp-1', phase: 'l', form: 'constant' },
      sourceId: 's1',
      prerequisites: [],
    });
    expect(subjectItemDraft('add_value', inlineSpecies, edited, {}, 's1').prerequisites).toEqual([]);
  });
});
