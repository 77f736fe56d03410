import { RoundedQuantity, roundToUncertainty } from './round-to-uncertainty';

// Common practice under the GUM (JCGM 100:2008, 7.2.6): state the uncertainty with two
// significant digits and round the value to the same decimal place.
describe('roundToUncertainty', () => {
  const cases: ReadonlyArray<{
    readonly why: string;
    readonly value: number;
    readonly uncertainty: number | null;
    readonly expected: RoundedQuantity;
  }> = [
    { why: 'keeps a value already at the uncertainty\'s place', value: -241.826, uncertainty: 0.042, expected: { value: '-241.826', uncertainty: '0.042', exponent: null } },
    { why: 'rounds the value to the uncertainty\'s last digit', value: -393.5123, uncertainty: 0.13, expected: { value: '-393.51', uncertainty: '0.13', exponent: null } },
    { why: 'rounds the uncertainty to two significant digits', value: 12.345, uncertainty: 1.2345, expected: { value: '12.3', uncertainty: '1.2', exponent: null } },
    { why: 'rounds half away from zero', value: 12.345, uncertainty: 1.25, expected: { value: '12.3', uncertainty: '1.3', exponent: null } },
    { why: 'treats 0.145 as the decimal it was written as', value: 0.145, uncertainty: 0.145, expected: { value: '0.15', uncertainty: '0.15', exponent: null } },
    { why: 'rounds a negative value half away from zero', value: -2.675, uncertainty: 0.015, expected: { value: '-2.675', uncertainty: '0.015', exponent: null } },
    { why: 'rounds a negative value at a coarser place', value: -2.675, uncertainty: 0.15, expected: { value: '-2.68', uncertainty: '0.15', exponent: null } },
    { why: 'keeps two digits when rounding carries into a new decade', value: 1.23456, uncertainty: 0.0996, expected: { value: '1.23', uncertainty: '0.10', exponent: null } },
    { why: 'pads the value with zeros to the uncertainty\'s place', value: 5, uncertainty: 0.05, expected: { value: '5.00', uncertainty: '0.05', exponent: null } },
    { why: 'keeps an uncertainty stated with one digit as stated', value: -285.83, uncertainty: 0.04, expected: { value: '-285.83', uncertainty: '0.04', exponent: null } },
    { why: 'keeps two digits of an uncertainty that rounds to a round number', value: 0.2, uncertainty: 0.504, expected: { value: '0.20', uncertainty: '0.50', exponent: null } },
    { why: 'drops the sign of a value that rounds to zero', value: -0.004, uncertainty: 0.5, expected: { value: '0.0', uncertainty: '0.5', exponent: null } },
    { why: 'rounds large uncertainties to tens and hundreds', value: 123456, uncertainty: 1234, expected: { value: '123500', uncertainty: '1200', exponent: null } },
    { why: 'shows a value without uncertainty with its own digits', value: -285.83, uncertainty: null, expected: { value: '-285.83', uncertainty: null, exponent: null } },
    { why: 'treats a zero uncertainty as an exact value', value: 0, uncertainty: 0, expected: { value: '0', uncertainty: null, exponent: null } },
    { why: 'shares a power of ten for small numbers', value: 1.2345e-5, uncertainty: 3.2e-7, expected: { value: '1.235', uncertainty: '0.032', exponent: -5 } },
    { why: 'shares a power of ten for large numbers', value: 2.5e9, uncertainty: 3.5e7, expected: { value: '2.500', uncertainty: '0.035', exponent: 9 } },
    { why: 'keeps plain decimals down to 10^-4', value: 0.00012, uncertainty: 0.000015, expected: { value: '0.000120', uncertainty: '0.000015', exponent: null } },
    { why: 'uses a power of ten for a small value without uncertainty', value: 1.5e-7, uncertainty: null, expected: { value: '1.5', uncertainty: null, exponent: -7 } },
  ];

  for (const { why, value, uncertainty, expected } of cases) {
    it(`${why}: ${value} ± ${uncertainty}`, () => {
      expect(roundToUncertainty(value, uncertainty)).toEqual(expected);
    });
  }

  it('rounds the uncertainty to one significant digit when asked', () => {
    expect(roundToUncertainty(-241.826, 0.042, 1)).toEqual({ value: '-241.83', uncertainty: '0.04', exponent: null });
  });

  it('rejects a negative uncertainty', () => {
    expect(() => roundToUncertainty(1, -0.1)).toThrowError(RangeError);
  });

  it('rejects non-finite numbers', () => {
    expect(() => roundToUncertainty(Number.NaN, 0.1)).toThrowError(RangeError);
    expect(() => roundToUncertainty(1, Number.POSITIVE_INFINITY)).toThrowError(RangeError);
  });

  it('rejects a significant-digit count below one', () => {
    expect(() => roundToUncertainty(1, 0.1, 0)).toThrowError(RangeError);
  });
});
