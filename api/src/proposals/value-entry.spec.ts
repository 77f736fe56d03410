import { readDecimal, readEnteredValue, unitFor } from './value-entry';

describe('reading a value as entered', () => {
  // Unit factors: 1 cal (thermochemical) = 4.184 J exactly (domain notes; NIST SP 811, B.8).
  const units: [Parameters<typeof unitFor>[0], string, number | undefined][] = [
    ['dfH', 'kJ/mol', 1000],
    ['dfH', 'kJ mol-1', 1000],
    ['dfH', 'kJ mol⁻¹', 1000],
    ['dfH', 'J/mol', 1],
    ['dfH', 'kcal/mol', 4184],
    ['dfG', 'cal/mol', 4.184],
    ['S', 'J/(mol·K)', 1],
    ['S', 'J/(mol*K)', 1],
    ['S', 'J/mol/K', 1],
    ['Cp', 'J mol-1 K-1', 1],
    ['Cp', 'cal/(mol K)', 4.184],
    ['S', 'kJ/mol', undefined],
    ['dfH', 'J/(mol·K)', undefined],
    ['dfH', 'eV', undefined],
  ];
  for (const [quantity, unit, factor] of units) {
    it(`${unit} for ${quantity}: ${factor ?? 'refused'}`, () => expect(unitFor(quantity, unit)?.factor).toBe(factor));
  }

  it('scales kJ/mol by a power of ten without binary rounding', () => {
    const read = readEnteredValue('dfH', { value: '-302.9', unit: 'kJ/mol', uncertainty: '0.5', uncertaintyKind: 'expanded', coverageFactor: 2 });
    expect(read.ok).toBeTrue();
    if (!read.ok) return;
    expect(read.entry.valueSi).toBe(-302900);
    expect(read.entry.uncertaintySi).toBe(500);
    expect(read.entry.standardUncertaintySi).toBe(250);
    expect(read.entry.enteredValue).toBe('-302.9 ± 0.5');
    expect(read.entry.enteredUnit).toBe('kJ/mol');
    // A decimal shift, not a multiplication: 1.005 × 1000 in binary floating point is 1004.9999999999999.
    expect(readEnteredValue('dfH', { value: '1.005', unit: 'kJ/mol' }).ok && (readEnteredValue('dfH', { value: '1.005', unit: 'kJ/mol' }) as { entry: { valueSi: number } }).entry.valueSi).toBe(1005);
  });

  it('converts thermochemical calories and keeps the text as entered', () => {
    const read = readEnteredValue('S', { value: '16.75', unit: 'cal/(mol·K)' });
    expect(read.ok && read.entry.valueSi).toBeCloseTo(16.75 * 4.184, 12);
    expect(read.ok && read.entry.enteredValue).toBe('16.75');
    expect(read.ok && read.entry.uncertaintyKind).toBeNull();
  });

  it('names every problem with its field', () => {
    const read = readEnteredValue('dfH', { value: 'about 5', unit: 'kJ', uncertainty: '-1', uncertaintyKind: 'expanded' });
    expect(read.ok).toBeFalse();
    if (read.ok) return;
    expect(read.problems.map((p) => p.field).sort()).toEqual(['coverageFactor', 'uncertainty', 'unit', 'value']);
  });

  it('needs k for an expanded uncertainty and refuses k for a standard one', () => {
    expect(readEnteredValue('dfH', { value: '1', unit: 'kJ/mol', uncertainty: '1', uncertaintyKind: 'expanded' }).ok).toBeFalse();
    expect(readEnteredValue('dfH', { value: '1', unit: 'kJ/mol', uncertainty: '1', coverageFactor: 2 }).ok).toBeFalse();
    expect(readEnteredValue('dfH', { value: '1', unit: 'kJ/mol', uncertainty: '1' }).ok).toBeTrue();
  });

  it('reads decimals with a Unicode minus and exponents', () => {
    expect(readDecimal('−12.5')).toEqual({ text: '-12.5', value: -12.5 });
    expect(readDecimal('1.5e3')?.value).toBe(1500);
    expect(readDecimal('1,5')).toBeUndefined();
    expect(readDecimal('')).toBeUndefined();
  });
});
