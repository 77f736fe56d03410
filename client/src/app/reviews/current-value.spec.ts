import { CatalogueSpecies, CatalogueValue } from '../shared/catalogue/catalogue-api';
import { currentValueFor, speciesIdOf } from './current-value';

const source = { id: 's', key: 'qpc-tc03-2025', citation: 'TC-03', doi: null };
const value = (id: string, v: number): CatalogueValue => ({
  id, lineageId: id, versionNo: 1, value: v, uncertainty: 500, uncertaintyKind: 'standard', coverageFactor: null,
  unit: 'J/mol', temperature: 298.15, pressure: 100000, method: 'measured', methodDetail: null, source,
});
const propanol: CatalogueSpecies = {
  id: 'sp-1',
  formula: 'CH3CH2CH2OH',
  name: 'propan-1-ol',
  release: '2026.2',
  phases: [
    {
      phase: 'l',
      polymorph: null,
      quantities: [{ quantity: 'dfH', symbol: 'ΔfH°', unit: 'J/mol', transitionKind: null, recommended: value('v1', -302900), alternatives: [value('v2', -302500)] }],
      fits: [],
    },
  ],
};

describe('currentValueFor', () => {
  it('sets a new value against the recommended value of the same phase and quantity', () => {
    const current = currentValueFor({ kind: 'add_value', payload: { speciesId: 'sp-1', phase: 'l', quantity: 'dfH', value: '-302.6' } }, propanol);
    expect(current).toEqual(jasmine.objectContaining({ relation: 'recommended now', recommended: true, others: 1 }));
    expect(current?.value.id).toBe('v1');
  });

  it('finds the value a revision or retirement targets, recommended or not', () => {
    expect(currentValueFor({ kind: 'revise_value', payload: { valueId: 'v2' } }, propanol)).toEqual(
      jasmine.objectContaining({ relation: 'revises', recommended: false, others: 1 }),
    );
    expect(currentValueFor({ kind: 'retire_value', payload: { valueId: 'v1' } }, propanol)?.relation).toBe('retires');
  });

  it('has nothing to compare with for a new quantity, an unknown value or no record', () => {
    expect(currentValueFor({ kind: 'add_value', payload: { speciesId: 'sp-1', phase: 'l', quantity: 'S' } }, propanol)).toBeNull();
    expect(currentValueFor({ kind: 'revise_value', payload: { valueId: 'elsewhere' } }, propanol)).toBeNull();
    expect(currentValueFor({ kind: 'add_value', payload: {} }, null)).toBeNull();
  });

  it('takes the species resolved at submission before the one named in the payload', () => {
    expect(speciesIdOf({ speciesId: 'resolved', payload: { speciesId: 'named' } })).toBe('resolved');
    expect(speciesIdOf({ speciesId: null, payload: { speciesId: 'named' } })).toBe('named');
    expect(speciesIdOf({ speciesId: null, payload: { species: 'butan-1-ol' } })).toBeNull();
  });
});
