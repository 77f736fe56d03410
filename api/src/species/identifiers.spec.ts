import fc from 'fast-check';
import { casCheckDigit, isInchiKeyFormat, isValidCasRn } from './identifiers';

describe('CAS Registry Numbers', () => {
  // Registry numbers of common substances (from memory; each also passes the database's own check
  // when the reference set loads). The rule: digits weighted 1, 2, 3 … from the right, sum mod 10.
  const known = ['7732-18-5', '124-38-9', '630-08-0', '74-82-8', '64-17-5', '67-56-1', '7664-41-7', '7727-37-9', '7782-44-7'];

  it('accepts well-known registry numbers', () => {
    for (const rn of known) expect(isValidCasRn(rn)).withContext(rn).toBeTrue();
  });

  it('computes the check digit of water by hand: 8·1 + 1·2 + 2·3 + 3·4 + 7·5 + 7·6 = 105 → 5', () => {
    expect(casCheckDigit('773218')).toBe(5);
  });

  it('refuses a wrong check digit, a wrong layout and a leading zero', () => {
    for (const rn of ['7732-18-4', '7732185', '7732-1-85', '07732-18-5', '12345678-12-3', '1-23-4', 'abcd-ef-g', '']) {
      expect(isValidCasRn(rn)).withContext(rn).toBeFalse();
    }
  });

  it('refuses every other check digit for any body of digits', () => {
    fc.assert(fc.property(fc.integer({ min: 10, max: 9_999_999 }), fc.integer({ min: 0, max: 99 }), fc.integer({ min: 1, max: 9 }), (head, middle, shift) => {
      const body = `${head}${String(middle).padStart(2, '0')}`;
      const right = casCheckDigit(body);
      const rn = (digit: number) => `${head}-${String(middle).padStart(2, '0')}-${digit}`;
      return isValidCasRn(rn(right)) && !isValidCasRn(rn((right + shift) % 10));
    }));
  });
});

describe('InChIKey layout', () => {
  it('accepts the standard 14-10-1 layout and refuses others', () => {
    expect(isInchiKeyFormat('XLYOFNOQVPJJNP-UHFFFAOYSA-N')).toBeTrue();
    expect(isInchiKeyFormat('XLYOFNOQVPJJNP-UHFFFAOYSA')).toBeFalse();
    expect(isInchiKeyFormat('xlyofnoqvpjjnp-uhfffaoysa-n')).toBeFalse();
    expect(isInchiKeyFormat('XLYOFNOQVPJJNP-UHFFFAOYXA-N')).toBeFalse();
  });
});
