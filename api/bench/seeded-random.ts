/**
 * A small, fast, seeded pseudo-random generator (sfc32, seeded through a string hash) so that the
 * benchmark data set is the same on every machine and every run. Not for anything secret.
 */
export class SeededRandom {
  private a: number;
  private b: number;
  private c: number;
  private d: number;

  /** Every distinct seed text starts an independent stream. */
  constructor(seed: string) {
    const h = cyrb128(seed);
    this.a = h[0];
    this.b = h[1];
    this.c = h[2];
    this.d = h[3];
    for (let i = 0; i < 12; i++) this.nextUint32();
  }

  nextUint32(): number {
    const t = (((this.a + this.b) | 0) + this.d) | 0;
    this.d = (this.d + 1) | 0;
    this.a = this.b ^ (this.b >>> 9);
    this.b = (this.c + (this.c << 3)) | 0;
    this.c = (this.c << 21) | (this.c >>> 11);
    this.c = (this.c + t) | 0;
    return t >>> 0;
  }

  /** Uniform in [0, 1). */
  next(): number {
    return this.nextUint32() / 4294967296;
  }

  /** Uniform in [min, max). */
  uniform(min: number, max: number): number {
    return min + (max - min) * this.next();
  }

  /** Integer in [min, max], both included. */
  int(min: number, max: number): number {
    return min + Math.floor(this.next() * (max - min + 1));
  }

  chance(probability: number): boolean {
    return this.next() < probability;
  }

  pick<T>(items: readonly T[]): T {
    return items[Math.floor(this.next() * items.length)];
  }

  /** An item chosen with the given relative weights. */
  weighted<T>(items: readonly (readonly [T, number])[]): T {
    let total = 0;
    for (const [, w] of items) total += w;
    let r = this.next() * total;
    for (const [item, w] of items) {
      r -= w;
      if (r < 0) return item;
    }
    return items[items.length - 1][0];
  }

  /** Standard normal deviate (Box–Muller). */
  normal(mean = 0, sd = 1): number {
    const u = 1 - this.next();
    const v = this.next();
    return mean + sd * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  }

  /** Log-uniform in [min, max): for quantities spread over orders of magnitude (uncertainties). */
  logUniform(min: number, max: number): number {
    return Math.exp(this.uniform(Math.log(min), Math.log(max)));
  }

  /** Fisher–Yates, in place. */
  shuffle<T>(items: T[]): T[] {
    for (let i = items.length - 1; i > 0; i--) {
      const j = Math.floor(this.next() * (i + 1));
      [items[i], items[j]] = [items[j], items[i]];
    }
    return items;
  }
}

/**
 * A name-based identifier for a generated row: the same kind and key give the same UUID on every
 * run. A fast 128-bit string hash (not SHA-1 like seeds-demo's `seedId`: the data set needs
 * millions of them), laid out as an RFC 9562 version-8 (custom) UUID.
 */
export function benchId(kind: string, key: string): string {
  const [a, b, c, d] = cyrb128(`kelvindex-bench/${kind}/${key}`);
  const hex = (n: number) => n.toString(16).padStart(8, '0');
  const h = hex(a) + hex(((b & 0xffff0fff) | 0x00008000) >>> 0) + hex(((c & 0x3fffffff) | 0x80000000) >>> 0) + hex(d);
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

/** 128-bit string hash (cyrb128) used to seed the four sfc32 state words. */
function cyrb128(text: string): [number, number, number, number] {
  let h1 = 1779033703, h2 = 3144134277, h3 = 1013904242, h4 = 2773480762;
  for (let i = 0; i < text.length; i++) {
    const k = text.charCodeAt(i);
    h1 = h2 ^ Math.imul(h1 ^ k, 597399067);
    h2 = h3 ^ Math.imul(h2 ^ k, 2869860233);
    h3 = h4 ^ Math.imul(h3 ^ k, 951274213);
    h4 = h1 ^ Math.imul(h4 ^ k, 2716044179);
  }
  h1 = Math.imul(h3 ^ (h1 >>> 18), 597399067);
  h2 = Math.imul(h4 ^ (h2 >>> 22), 2869860233);
  h3 = Math.imul(h1 ^ (h3 >>> 17), 951274213);
  h4 = Math.imul(h2 ^ (h4 >>> 19), 2716044179);
  h1 ^= h2 ^ h3 ^ h4;
  h2 ^= h1;
  h3 ^= h1;
  h4 ^= h1;
  return [h1 >>> 0, h2 >>> 0, h3 >>> 0, h4 >>> 0];
}
