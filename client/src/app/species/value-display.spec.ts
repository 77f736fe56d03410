import { describePressure, describeUncertainty, displayValue } from './value-display';

describe('displayValue', () => {
  it('converts SI values and their uncertainty to the page unit', () => {
    expect(displayValue({ value: -241826, uncertainty: 40, unit: 'J/mol' }, 'kJ/mol')).toEqual({ value: -241.826, uncertainty: 0.04, unit: 'kJ/mol' });
    const entropy = displayValue({ value: 188.835, uncertainty: null, unit: 'J/(mol·K)' }, 'kcal/mol');
    expect(entropy.unit).toBe('cal/(mol·K)');
    expect(entropy.uncertainty).toBeNull();
  });
});

describe('describeUncertainty', () => {
  it('says whether the ± is a standard or an expanded uncertainty', () => {
    expect(describeUncertainty({ uncertainty: 0.04, uncertaintyKind: 'standard', coverageFactor: null })).toBe('standard uncertainty');
    expect(describeUncertainty({ uncertainty: 0.08, uncertaintyKind: 'expanded', coverageFactor: 2 })).toBe('expanded uncertainty, k = 2');
    expect(describeUncertainty({ uncertainty: null, uncertaintyKind: 'standard', coverageFactor: null })).toBe('');
  });
});

describe('describePressure', () => {
  it('names the standard pressures', () => {
    expect(describePressure(100000)).toBe('1 bar');
    expect(describePressure(101325)).toBe('1 atm');
    expect(describePressure(50000)).toBe('50 kPa');
    expect(describePressure(null)).toBe('');
  });
});
