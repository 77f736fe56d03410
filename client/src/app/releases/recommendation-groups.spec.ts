import { CatalogueSpecies, CatalogueValue } from '../shared/catalogue/catalogue-api';
import { phaseKey, recommendationGroups, speciesPhaseIds } from './recommendation-groups';
import { ReleaseWorkspace } from './releases-api';

const value = (id: string, si: number, key: string, kind: 'standard' | 'expanded' = 'standard'): CatalogueValue => ({
  id, lineageId: id, versionNo: 1, value: si, uncertainty: 400, uncertaintyKind: kind, coverageFactor: kind === 'expanded' ? 2 : null,
  unit: 'J/mol', temperature: 298.15, pressure: 100000, method: 'measured', methodDetail: null,
  source: { id: key, key, citation: `${key} citation`, doi: null },
});

const propanol: CatalogueSpecies = {
  id: 'sp',
  formula: 'CH3CH2CH2OH',
  name: 'propan-1-ol',
  release: '2027.1',
  phases: [
    {
      phase: 'l',
      polymorph: null,
      quantities: [
        { quantity: 'dfH', symbol: 'ΔfH°', unit: 'J/mol', transitionKind: null, recommended: value('old', -302900, 'qpc-tc03-2025'), alternatives: [value('new', -302600, 'e2e-2027', 'expanded')] },
        { quantity: 'Cp', symbol: 'Cp°', unit: 'J/(mol·K)', transitionKind: null, recommended: { ...value('cp', 144.2, 'qpc-dsc07-2026'), unit: 'J/(mol·K)' }, alternatives: [] },
      ],
      fits: [],
    },
  ],
};

describe('recommendation groups', () => {
  it('finds each changed species phase’s id in the workspace change log', () => {
    const workspace = {
      changeLog: {
        species: [
          { speciesId: 'sp', added: [{ speciesPhaseId: 'ph-l', phase: 'l', polymorph: null }], revised: [], retired: [], removed: [], recommendation: [] },
        ],
      },
    } as unknown as ReleaseWorkspace;
    expect(speciesPhaseIds(workspace).get(phaseKey('sp', 'l', null))).toBe('ph-l');
  });

  it('lists the values of a quantity where sources disagree, side by side, in kJ/mol', () => {
    const groups = recommendationGroups([propanol], new Map([[phaseKey('sp', 'l', null), 'ph-l']]), []);
    expect(groups.length).toBe(1);
    const [group] = groups;
    expect(group).toEqual(jasmine.objectContaining({ speciesPhaseId: 'ph-l', label: 'ΔfH°(l)', quantity: 'dfH', needsChoice: false }));
    expect(group.candidates.map((c) => [c.id, c.recommended, c.value, c.sourceKey, c.uncertaintyText])).toEqual([
      ['old', true, -302.9, 'qpc-tc03-2025', 'standard u'],
      ['new', false, -302.6, 'e2e-2027', 'expanded U, k = 2'],
    ]);
  });

  it('includes a single-member group the API says lacks a recommendation', () => {
    const gaps = [{ speciesPhaseId: 'ph-l', memberKind: 'value' as const, quantity: 'Cp' as const, transitionKind: null, speciesName: 'propan-1-ol', hillFormula: 'C3H8O', phase: 'l' as const, polymorph: null, members: 1, recommended: 0 }];
    const groups = recommendationGroups([propanol], new Map([[phaseKey('sp', 'l', null), 'ph-l']]), gaps);
    expect(groups.map((g) => [g.label, g.needsChoice])).toEqual([
      ['ΔfH°(l)', false],
      ['Cp°(l)', true],
    ]);
  });

  it('leaves out phases the workspace does not name', () => {
    expect(recommendationGroups([propanol], new Map(), [])).toEqual([]);
  });
});
