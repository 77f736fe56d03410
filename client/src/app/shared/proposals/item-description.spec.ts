import { describeItem, enteredValue } from './item-description';

describe('describeItem', () => {
  it('describes a new value with its uncertainty, conditions and method as entered', () => {
    const described = describeItem(
      {
        kind: 'add_value',
        payload: {
          species: 'propan-1-ol', phase: 'l', quantity: 'dfH', value: '-302.6', unit: 'kJ/mol', uncertainty: '0.4',
          uncertaintyKind: 'expanded', coverageFactor: 2, temperatureK: 298.15, pressurePa: 100000, method: 'measured',
        },
      },
    );
    expect(described.kind).toBe('New value');
    expect(described.subject).toBe('ΔfH°(l) of propan-1-ol');
    expect(described.detail).toBe('-302.6 ± 0.4 kJ/mol (expanded, k = 2), 298.15 K, 1 bar, measured');
    expect(described.enteredValue).toBe('-302.6 ± 0.4 kJ/mol');
  });

  it('names a catalogue species from the names it is given, and a transition by its kind', () => {
    const described = describeItem(
      { kind: 'add_value', payload: { speciesId: 'abc-123', phase: 'l', quantity: 'dtrsH', transitionKind: 'vap', value: '35.1', unit: 'kJ/mol', pressurePa: 101325, method: 'computed', levelOfTheory: 'G4' } },
      new Map([['abc-123', 'ethyl acetate']]),
    );
    expect(described.subject).toBe('ΔvapH(l) of ethyl acetate');
    expect(described.detail).toBe('35.1 kJ/mol, 298.15 K, 1 atm, computed, G4');
  });

  it('describes species, phases, fits and retirements', () => {
    expect(describeItem({ kind: 'add_species', payload: { name: 'butan-1-ol', formula: 'CH3CH2CH2CH2OH', casRn: '71-36-3' } }).subject).toBe(
      'butan-1-ol (CH3CH2CH2CH2OH)',
    );
    expect(describeItem({ kind: 'add_phase', payload: { species: 'carbon', phase: 'cr', polymorph: 'graphite' } }).subject).toBe('carbon (cr, graphite)');
    expect(describeItem({ kind: 'add_fit', payload: { species: 'N2', phase: 'g', form: 'nasa7', tMin: 200, tMax: 6000, ranges: [{}, {}] } }).detail).toBe(
      'nasa7, 200–6000 K, 2 ranges',
    );
    expect(describeItem({ kind: 'retire_value', payload: { valueId: '0123456789', reason: 'duplicate entry' } }).detail).toBe('Reason: duplicate entry');
  });

  it('shows a value without an uncertainty as just the number and unit', () => {
    expect(enteredValue({ value: '144.2', unit: 'J/(mol·K)' })).toBe('144.2 J/(mol·K)');
    expect(enteredValue({ unit: 'kJ/mol' })).toBeNull();
  });
});
