import fc from 'fast-check';
import { gcd, lcm, Rational } from './rational';
import { expectProperty } from './testing/expect-property';

describe('Rational (exact arithmetic)', () => {
  // Arithmetic of the rationals (mathematics; no published source needed).
  it('normalises sign and common factors', () => {
    expect(Rational.of(2, -4).toString()).toBe('-1/2');
    expect(Rational.of(6, 3).toString()).toBe('2');
    expect(Rational.of(0, -7).equals(Rational.ZERO)).toBeTrue();
  });

  it('parses integers, decimals and fractions exactly, and refuses the rest', () => {
    expect(Rational.parse('3')?.toString()).toBe('3');
    expect(Rational.parse('0.5')?.toString()).toBe('1/2');
    expect(Rational.parse('.25')?.toString()).toBe('1/4');
    expect(Rational.parse('1/3')?.toString()).toBe('1/3');
    expect(Rational.parse('-2.50')?.toString()).toBe('-5/2');
    for (const bad of ['', '.', '1/0', 'a', '1e3', '1//2']) expect(Rational.parse(bad)).withContext(bad).toBeNull();
  });

  it('takes a double by its shortest decimal form (0.947 → 947/1000)', () => {
    expect(Rational.fromNumber(0.947).toString()).toBe('947/1000');
    expect(Rational.fromNumber(1e-7).toString()).toBe('1/10000000');
    expect(Rational.fromNumber(-3).toString()).toBe('-3');
  });

  it('adds, subtracts, multiplies and divides exactly (property)', () => {
    const r = fc.tuple(fc.integer({ min: -1000, max: 1000 }), fc.integer({ min: 1, max: 1000 })).map(([n, d]) => Rational.of(n, d));
    expectProperty(
      fc.property(r, r, (a, b) => {
        expect(a.add(b).sub(b).equals(a)).toBeTrue();
        if (!b.isZero()) expect(a.mul(b).div(b).equals(a)).toBeTrue();
        expect(a.add(b).compare(a)).toBe(b.sign());
        expect(Math.abs(a.add(b).toNumber() - (a.toNumber() + b.toNumber()))).toBeLessThan(1e-12);
      }),
      { numRuns: 500 },
    );
  });

  it('computes gcd and lcm of BigInts', () => {
    expect(gcd(12n, 18n)).toBe(6n);
    expect(gcd(0n, 0n)).toBe(1n);
    expect(lcm(4n, 6n)).toBe(12n);
  });

  it('refuses a zero denominator and division by zero', () => {
    expect(() => Rational.of(1, 0)).toThrowError(RangeError);
    expect(() => Rational.ONE.div(Rational.ZERO)).toThrowError(RangeError);
  });
});
