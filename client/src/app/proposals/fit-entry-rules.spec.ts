import { fitEntryForm, fitEntryFromPayload, fitPayload, fitRangeForm, parseNumberList, parsePoints, revalidateFit } from './fit-entry-rules';

describe('fit entry rules', () => {
  function fit(form: 'shomate' | 'nasa7' | 'constant' | 'tabulated', ranges: { tMin: string; tMax: string; numbers: string }[]) {
    const entry = fitEntryForm();
    entry.controls.ranges.clear();
    for (const range of ranges) {
      entry.controls.ranges.push(fitRangeForm(range));
    }
    entry.controls.form.setValue(form);
    entry.controls.method.setValue('evaluated');
    revalidateFit(entry);
    return entry;
  }

  it('reads pasted coefficients separated by spaces, commas and line breaks, with Fortran exponents', () => {
    expect(parseNumberList('2.9525764E+00 1.3969E-03,\n-4.9262D-07; 7')).toEqual([2.9525764, 0.0013969, -4.9262e-7, 7]);
    expect(parseNumberList('30.09 six')).toBeNull();
    expect(parsePoints('280 140\n300 144')).toEqual([[280, 140], [300, 144]]);
    expect(parsePoints('280 140 300')).toBeNull();
  });

  it('accepts a complete Shomate fit', () => {
    expect(fit('shomate', [{ tMin: '298.15', tMax: '1000', numbers: '30.09 6.83 6.79 -2.53 0.082 -250.9 223.4 -241.8' }]).valid).toBeTrue();
  });

  it('asks for the number of coefficients the form takes', () => {
    const entry = fit('nasa7', [{ tMin: '200', tMax: '1000', numbers: '3.5 0 0 0 0' }]);
    expect(entry.controls.ranges.at(0).errors?.['numbers']).toBe('A nasa7 range needs exactly 7 coefficients; 5 given.');
    entry.controls.form.setValue('constant');
    entry.controls.ranges.at(0).controls.numbers.setValue('29.1');
    revalidateFit(entry);
    expect(entry.valid).toBeTrue();
  });

  it('refuses a range that runs backwards', () => {
    const entry = fit('constant', [{ tMin: '1000', tMax: '300', numbers: '29.1' }]);
    expect(entry.controls.ranges.at(0).errors?.['range']).toContain('0 K < Tmin < Tmax');
  });

  it('requires ranges that follow each other without a gap', () => {
    const entry = fit('constant', [
      { tMin: '300', tMax: '1000', numbers: '29' },
      { tMin: '1100', tMax: '3000', numbers: '33' },
    ]);
    expect(entry.controls.ranges.errors?.['ranges']).toBe('Range 2 starts at 1100 K, not where range 1 ends (1000 K).');
  });

  it('checks tabulated points: at least two, rising temperatures inside the range, positive Cp°', () => {
    expect(fit('tabulated', [{ tMin: '280', tMax: '340', numbers: '280 140' }]).controls.ranges.at(0).errors?.['numbers']).toContain('at least two');
    expect(fit('tabulated', [{ tMin: '280', tMax: '340', numbers: '300 144\n290 142' }]).controls.ranges.at(0).errors?.['numbers']).toContain('increase');
    expect(fit('tabulated', [{ tMin: '280', tMax: '340', numbers: '280 140\n360 150' }]).controls.ranges.at(0).errors?.['numbers']).toContain('within 280–340 K');
    expect(fit('tabulated', [{ tMin: '280', tMax: '340', numbers: '280 140\n340 -1' }]).controls.ranges.at(0).errors?.['numbers']).toContain('positive');
    expect(fit('tabulated', [{ tMin: '280', tMax: '340', numbers: '280 140\n340 150' }]).valid).toBeTrue();
  });

  it('requires the level of theory of a computed fit', () => {
    const entry = fit('constant', [{ tMin: '300', tMax: '1000', numbers: '29' }]);
    entry.controls.method.setValue('computed');
    revalidateFit(entry);
    expect(entry.controls.levelOfTheory.hasError('required')).toBeTrue();
  });

  it('writes the payload with the fit’s limits taken from its ranges, and reads it back', () => {
    const entry = fit('constant', [
      { tMin: '300', tMax: '1000', numbers: '29' },
      { tMin: '1000', tMax: '3000', numbers: '33' },
    ]);
    const payload = fitPayload(entry.getRawValue());
    expect(payload).toEqual({
      form: 'constant',
      tMin: 300,
      tMax: 3000,
      ranges: [
        { tMin: 300, tMax: 1000, coefficients: [29] },
        { tMin: 1000, tMax: 3000, coefficients: [33] },
      ],
      pressurePa: 100000,
      method: 'evaluated',
    });
    expect(fitEntryFromPayload(payload).ranges).toEqual([
      { tMin: '300', tMax: '1000', numbers: '29' },
      { tMin: '1000', tMax: '3000', numbers: '33' },
    ]);
  });
});
