import {
  ValueEntry,
  entryFromPayload,
  readDecimal,
  revalidateDependents,
  valueEntryForm,
  valueEntryMessage,
  valuePayload,
} from './value-entry-rules';

function filled(change: Partial<ValueEntry> = {}) {
  const form = valueEntryForm();
  form.setValue({
    quantity: 'dfH',
    transitionKind: null,
    value: '-302.6',
    unit: 'kJ/mol',
    uncertainty: '0.4',
    uncertaintyKind: 'standard',
    coverageFactor: '',
    temperatureK: '298.15',
    pressurePa: 100000,
    method: 'measured',
    levelOfTheory: '',
    sourceLocator: 'Table 3',
    notes: '',
    ...change,
  });
  revalidateDependents(form);
  return form;
}

describe('value entry rules', () => {
  it('accepts a complete measured value', () => {
    expect(filled().valid).toBeTrue();
  });

  it('reads decimals as printed, with a typographic minus, and refuses anything else', () => {
    expect(readDecimal('-302.6')).toBe(-302.6);
    expect(readDecimal('−12')).toBe(-12);
    expect(readDecimal('1.5e3')).toBe(1500);
    expect(readDecimal('.5')).toBe(0.5);
    expect(readDecimal('12 kJ')).toBeNull();
    expect(readDecimal('1,5')).toBeNull();
    expect(filled({ value: 'about 300' }).controls.value.errors).toEqual({ decimal: true });
  });

  it('requires the value, the temperature and the method', () => {
    const form = filled({ value: '', temperatureK: '', method: null });
    expect(form.controls.value.hasError('required')).toBeTrue();
    expect(form.controls.temperatureK.hasError('required')).toBeTrue();
    expect(form.controls.method.hasError('required')).toBeTrue();
    expect(valueEntryMessage('method', form.controls.method.errors)).toBe('Say how the value was obtained.');
  });

  it('requires k with an expanded uncertainty, and only then', () => {
    const expanded = filled({ uncertaintyKind: 'expanded' });
    expect(expanded.controls.coverageFactor.hasError('required')).toBeTrue();
    expect(valueEntryMessage('coverageFactor', expanded.controls.coverageFactor.errors)).toContain('coverage factor k');
    expect(filled({ uncertaintyKind: 'expanded', coverageFactor: '2' }).valid).toBeTrue();
    expect(filled({ uncertaintyKind: 'expanded', coverageFactor: '12' }).controls.coverageFactor.errors).toEqual({ coverageFactor: true });
    expect(filled({ uncertaintyKind: 'standard', coverageFactor: '' }).valid).toBeTrue();
  });

  it('refuses a negative uncertainty', () => {
    const form = filled({ uncertainty: '-0.4' });
    expect(form.controls.uncertainty.errors).toEqual({ negative: true });
    expect(valueEntryMessage('uncertainty', form.controls.uncertainty.errors)).toBe('An uncertainty is zero or positive.');
  });

  it('requires the level of theory for a computed value', () => {
    expect(filled({ method: 'computed' }).controls.levelOfTheory.hasError('required')).toBeTrue();
    expect(filled({ method: 'computed', levelOfTheory: 'G4' }).valid).toBeTrue();
    expect(filled({ method: 'estimated' }).controls.levelOfTheory.valid).toBeTrue();
  });

  it('keeps S°, Cp° and enthalpies of fusion, vaporisation and sublimation positive', () => {
    expect(filled({ quantity: 'S', unit: 'J/(mol·K)', value: '-5' }).controls.value.errors).toEqual({ positive: true });
    expect(valueEntryMessage('value', { positive: true }, 'Cp')).toBe('A heat capacity Cp° is positive.');
    expect(filled({ quantity: 'dtrsH', transitionKind: 'vap', value: '-1' }).controls.value.hasError('positive')).toBeTrue();
    expect(filled({ quantity: 'dtrsH', transitionKind: 'trs', value: '-1' }).valid).toBeTrue();
    expect(filled({ quantity: 'dfH', value: '-1' }).valid).toBeTrue();
  });

  it('requires the transition for ΔtrsH', () => {
    expect(filled({ quantity: 'dtrsH', transitionKind: null, value: '35.1' }).controls.transitionKind.hasError('required')).toBeTrue();
  });

  it('accepts only units that fit the quantity', () => {
    expect(filled({ quantity: 'S', unit: 'kJ/mol', value: '193.6' }).controls.unit.errors).toEqual({ unit: true });
    expect(filled({ quantity: 'S', unit: 'cal/(mol·K)', value: '46.3' }).valid).toBeTrue();
  });

  it('refuses a temperature at or below 0 K', () => {
    expect(filled({ temperatureK: '0' }).controls.temperatureK.hasError('positive')).toBeTrue();
  });
});

describe('valuePayload', () => {
  it('writes the numbers as typed, with k only for an expanded uncertainty', () => {
    const form = filled({ uncertaintyKind: 'expanded', coverageFactor: '2', value: '−302.6' });
    expect(valuePayload(form.getRawValue(), { withQuantity: true })).toEqual({
      quantity: 'dfH',
      value: '-302.6',
      unit: 'kJ/mol',
      uncertainty: '0.4',
      uncertaintyKind: 'expanded',
      coverageFactor: 2,
      temperatureK: 298.15,
      pressurePa: 100000,
      method: 'measured',
      sourceLocator: 'Table 3',
    });
  });

  it('leaves out the quantity for a revision and the uncertainty fields without an uncertainty', () => {
    const payload = valuePayload(filled({ uncertainty: '' }).getRawValue(), { withQuantity: false });
    expect(Object.keys(payload)).toEqual(['value', 'unit', 'temperatureK', 'pressurePa', 'method', 'sourceLocator']);
  });

  it('reads a stored payload back into the form', () => {
    const entry = entryFromPayload({ value: '177.6', unit: 'J/(mol·K)', uncertainty: '1.4', uncertaintyKind: 'expanded', coverageFactor: 2, pressurePa: 100000, method: 'measured' }, 'Cp');
    expect(entry.quantity).toBe('Cp');
    expect(entry.coverageFactor).toBe('2');
    expect(entry.temperatureK).toBe('298.15');
  });
});
