import { equilibriumConstantText, showReactionQuantity } from './reaction-display';

describe('showReactionQuantity', () => {
  it('keeps kJ/mol or converts to kcal/mol', () => {
    expect(showReactionQuantity({ value: -802.3, uncertainty: 0.4, unit: 'kJ/mol' }, 'kJ/mol', 'kJ/mol')).toEqual({ value: -802.3, uncertainty: 0.4, unit: 'kJ/mol' });
    const kcal = showReactionQuantity({ value: -418.4, uncertainty: 4.184, unit: 'kJ/mol' }, 'kJ/mol', 'kcal/mol');
    expect(kcal.value).toBeCloseTo(-100, 10);
    expect(kcal.uncertainty).toBeCloseTo(1, 10);
    expect(kcal.unit).toBe('kcal/mol');
  });

  it('turns entropies into cal/(mol·K) alongside kcal/mol', () => {
    const shown = showReactionQuantity({ value: -5.0, uncertainty: null, unit: 'J/(mol·K)' }, 'J/(mol·K)', 'kcal/mol');
    expect(shown.unit).toBe('cal/(mol·K)');
    expect(shown.uncertainty).toBeNull();
  });
});

describe('equilibriumConstantText', () => {
  it('shows four significant digits with a shared power of ten', () => {
    expect(equilibriumConstantText(1.234567e40)).toBe('1.235 × 10⁴⁰');
    expect(equilibriumConstantText(3.5)).toBe('3.5');
    expect(equilibriumConstantText(Infinity)).toBe('beyond 10³⁰⁸');
  });
});
