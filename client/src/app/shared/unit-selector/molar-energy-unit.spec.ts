import { convertFromKilojoulesPerMole, convertFromSi } from './molar-energy-unit';

describe('convertFromKilojoulesPerMole', () => {
  it('leaves kJ/mol unchanged', () => {
    expect(convertFromKilojoulesPerMole(-241.826, 'kJ/mol')).toBe(-241.826);
  });

  it('uses the thermochemical calorie, 4.184 J exactly', () => {
    expect(convertFromKilojoulesPerMole(4.184, 'kcal/mol')).toBe(1);
    expect(convertFromKilojoulesPerMole(-418.4, 'kcal/mol')).toBeCloseTo(-100, 12);
  });
});

describe('convertFromSi', () => {
  it('turns J/mol into kJ/mol or kcal/mol', () => {
    expect(convertFromSi(-241826, 'J/mol', 'kJ/mol')).toEqual({ value: -241.826, unit: 'kJ/mol' });
    expect(convertFromSi(-4184, 'J/mol', 'kcal/mol').value).toBeCloseTo(-1, 12);
  });

  it('turns J/(mol·K) into cal/(mol·K) alongside kcal/mol', () => {
    expect(convertFromSi(188.835, 'J/(mol·K)', 'kJ/mol')).toEqual({ value: 188.835, unit: 'J/(mol·K)' });
    const inCalories = convertFromSi(41.84, 'J/(mol·K)', 'kcal/mol');
    expect(inCalories.value).toBeCloseTo(10, 12);
    expect(inCalories.unit).toBe('cal/(mol·K)');
  });

  it('passes other units through', () => {
    expect(convertFromSi(298.15, 'K', 'kcal/mol')).toEqual({ value: 298.15, unit: 'K' });
  });
});
