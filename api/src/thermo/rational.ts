/**
 * Exact rational numbers on BigInt, for balancing equations without rounding.
 * Always normalised: denominator > 0, gcd(numerator, denominator) = 1.
 */
export class Rational {
  static readonly ZERO = new Rational(0n, 1n);
  static readonly ONE = new Rational(1n, 1n);

  private constructor(
    readonly num: bigint,
    readonly den: bigint,
  ) {}

  /** num/den, normalised. @throws RangeError when den is 0 */
  static of(num: bigint | number, den: bigint | number = 1n): Rational {
    let n = BigInt(num);
    let d = BigInt(den);
    if (d === 0n) throw new RangeError('zero denominator');
    if (d < 0n) {
      n = -n;
      d = -d;
    }
    const g = gcd(n < 0n ? -n : n, d);
    return g === 1n ? new Rational(n, d) : new Rational(n / g, d / g);
  }

  /**
   * Exact value of a decimal or fraction string: "3", "-0.25", "1/2", "1.5e3" is not accepted.
   * @returns null when the text is not such a number
   */
  static parse(text: string): Rational | null {
    const fraction = /^([+-]?\d+)\/(\d+)$/.exec(text);
    if (fraction) return fraction[2] === '0' || /^0+$/.test(fraction[2]) ? null : Rational.of(BigInt(fraction[1]), BigInt(fraction[2]));
    const decimal = /^([+-]?)(\d*)(?:\.(\d*))?$/.exec(text);
    if (!decimal || (decimal[2] === '' && (decimal[3] ?? '') === '')) return null;
    const digits = (decimal[2] || '0') + (decimal[3] ?? '');
    const scale = 10n ** BigInt((decimal[3] ?? '').length);
    return Rational.of(BigInt((decimal[1] === '-' ? '-' : '') + digits), scale);
  }

  /**
   * Exact rational from a finite JavaScript number via its shortest decimal representation
   * (0.947 → 947/1000), which is what a person typed.
   */
  static fromNumber(value: number): Rational {
    if (!Number.isFinite(value)) throw new RangeError(`not a finite number: ${value}`);
    if (Number.isInteger(value)) return Rational.of(BigInt(value));
    const text = String(value);
    const exp = /^(-?)(\d+)(?:\.(\d+))?e([+-]\d+)$/.exec(text);
    if (!exp) return Rational.parse(text)!;
    const mantissa = Rational.parse(`${exp[1]}${exp[2]}.${exp[3] ?? ''}`)!;
    const power = Number(exp[4]);
    const factor = 10n ** BigInt(Math.abs(power));
    return power >= 0 ? mantissa.mul(Rational.of(factor)) : mantissa.div(Rational.of(factor));
  }

  add(other: Rational): Rational {
    return Rational.of(this.num * other.den + other.num * this.den, this.den * other.den);
  }
  sub(other: Rational): Rational {
    return Rational.of(this.num * other.den - other.num * this.den, this.den * other.den);
  }
  mul(other: Rational): Rational {
    return Rational.of(this.num * other.num, this.den * other.den);
  }
  div(other: Rational): Rational {
    if (other.num === 0n) throw new RangeError('division by zero');
    return Rational.of(this.num * other.den, this.den * other.num);
  }
  neg(): Rational {
    return new Rational(-this.num, this.den);
  }
  abs(): Rational {
    return this.num < 0n ? this.neg() : this;
  }
  isZero(): boolean {
    return this.num === 0n;
  }
  isInteger(): boolean {
    return this.den === 1n;
  }
  sign(): -1 | 0 | 1 {
    return this.num === 0n ? 0 : this.num > 0n ? 1 : -1;
  }
  equals(other: Rational): boolean {
    return this.num === other.num && this.den === other.den;
  }
  compare(other: Rational): number {
    const diff = this.num * other.den - other.num * this.den;
    return diff === 0n ? 0 : diff > 0n ? 1 : -1;
  }
  toNumber(): number {
    return Number(this.num) / Number(this.den);
  }
  /** "3", "-1/2" */
  toString(): string {
    return this.den === 1n ? this.num.toString() : `${this.num}/${this.den}`;
  }
}

/** Greatest common divisor of non-negative BigInts (gcd(0, 0) = 1 so it can divide). */
export function gcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a === 0n ? 1n : a;
}

/** Least common multiple of positive BigInts. */
export function lcm(a: bigint, b: bigint): bigint {
  return (a / gcd(a, b)) * b;
}
