import { ATOMIC_WEIGHTS } from './atomic-weights';
import { FormulaError } from './errors';

/*
 * Why not mf-parser (installed, 3.9.3)? It was evaluated and does not fit our conventions:
 * it reads `CuSO4·5H2O` as H2CuO21S and `CuSO4.5H2O` as a non-integer O5.5, rejects `SO4-2`
 * and `e-`, reads `SO4^2-` as O8S and `SO4--` as neutral, treats `[...]` as isotope labels
 * (`K4[Fe(CN)6]` fails), expands group abbreviations (`Ph`, `Et`, `Me`) that collide with
 * element-symbol typos, uses its own isotope-averaged masses rather than the CIAAW 2021
 * conventional values, and managed about 92 000 formulas/s here with getInfo(). Wrapping
 * it would mean pre- and post-processing most of what users type, so this small
 * recursive-descent parser implements our grammar directly (> 2 million formulas/s).
 *
 * Grammar (whitespace allowed only around a hydrate separator):
 *   formula   := electron | component (SEP multiplier? component)* charge?
 *   electron  := 'e' followed by a charge of exactly −1   (e-, e−, e⁻, e^-)
 *   component := group+
 *   group     := ELEMENT count? | '(' component ')' count? | '[' component ']' count?
 *   SEP       := '·' | '•' | '⋅' | '∙' | '*' | '.'      (hydrates: CuSO4·5H2O, CuSO4.5H2O)
 *   count     := positive integer, or a decimal with a leading zero (Fe0.947O); subscript
 *                digits (H₂O) are accepted. A '.' after a non-zero count is a hydrate
 *                separator, so write JANAF's "Fe.947O" as Fe0.947O.
 *   charge    := '+'… | '-'…            trailing signs only: NH4+, SO4--, Fe+++
 *              | ('+'|'-') digits       SO4-2, Fe+3
 *              | '^' digits? sign | '^' sign digits?   SO4^2-, Fe^3+, SO4^-2
 *              | superscripts           SO4²⁻, Fe³⁺
 *              | '(' digits? sign ')' | '(' sign digits? ')'   SO4(2-)
 *   After a closing ']' at the end, "digits sign" is the charge of the complex, as
 *   chemists write it: [Fe(CN)6]4- has charge 4−. Elsewhere digits directly before a
 *   trailing sign are a count: NH4+ is NH4 with charge +1 (write Fe+3 or Fe³⁺ for Fe³⁺).
 * ELEMENT is a capital letter and any lowercase letters after it, and must be a symbol of
 * H…Og or the isotopes D, T.
 */

/** A parsed chemical formula: atoms per formula unit and charge. */
export interface ParsedFormula {
  /** the text that was parsed (as given) */
  readonly input: string;
  /**
   * Element symbol → atoms per formula unit. Integers for ordinary compounds; fractional
   * for non-stoichiometric phases such as Fe0.947O. The electron has no elements.
   */
  readonly elements: Readonly<Record<string, number>>;
  /** charge number z (elementary charges; NH4+ → 1, SO4^2- → −2) */
  readonly charge: number;
  /** true for the electron `e-` */
  readonly isElectron: boolean;
}

const SEPARATORS = new Set(['·', '•', '⋅', '∙', '*', '.']);
const SUBSCRIPT_ZERO = 0x2080;
const SUPERSCRIPT_DIGITS: Readonly<Record<string, number>> = {
  '⁰': 0, '¹': 1, '²': 2, '³': 3, '⁴': 4, '⁵': 5, '⁶': 6, '⁷': 7, '⁸': 8, '⁹': 9,
};
const MAX_DEPTH = 32;
const MAX_COUNT = 1e6;

type Counts = Record<string, number>;

function isUpper(code: number): boolean {
  return code >= 65 && code <= 90;
}
function isLower(code: number): boolean {
  return code >= 97 && code <= 122;
}
/** ASCII or subscript digit value, or −1. */
function digitValue(code: number): number {
  if (code >= 48 && code <= 57) return code - 48;
  if (code >= SUBSCRIPT_ZERO && code <= SUBSCRIPT_ZERO + 9) return code - SUBSCRIPT_ZERO;
  return -1;
}
function signOf(ch: string): 1 | -1 | 0 {
  if (ch === '+' || ch === '⁺') return 1;
  if (ch === '-' || ch === '−' || ch === '⁻') return -1;
  return 0;
}

function addInto(target: Counts, source: Counts, factor: number): void {
  for (const symbol in source) target[symbol] = (target[symbol] ?? 0) + source[symbol] * factor;
}

class FormulaParser {
  constructor(
    private readonly src: string,
    private pos: number,
    private readonly end: number,
  ) {}

  parse(): ParsedFormula {
    if (this.pos >= this.end) this.fail(this.pos, 'empty formula');
    if (this.src[this.pos] === 'e' && this.isElectronAhead()) return this.parseElectron();

    const elements: Counts = {};
    this.expectComponentStart(true);
    addInto(elements, this.parseComponent(0), 1);
    let charge = 0;
    while (this.pos < this.end) {
      const ch = this.src[this.pos];
      if (SEPARATORS.has(ch)) {
        this.pos++;
        this.skipSpaces();
        const multiplier = this.parseMultiplier();
        this.expectComponentStart(false);
        addInto(elements, this.parseComponent(0), multiplier);
        continue;
      }
      if (ch === ' ' || ch === '\t') {
        const after = this.peekNonSpace();
        if (after < this.end && SEPARATORS.has(this.src[after])) {
          this.pos = after;
          continue;
        }
        this.fail(this.pos, 'unexpected space inside a formula');
      }
      charge = this.parseCharge();
      if (this.pos < this.end) this.fail(this.pos, `unexpected '${this.src[this.pos]}' after the charge`);
    }
    for (const symbol in elements) elements[symbol] = Math.round(elements[symbol] * 1e9) / 1e9;
    return { input: this.src, elements, charge, isElectron: false };
  }

  private isElectronAhead(): boolean {
    const next = this.src[this.pos + 1];
    return next !== undefined && (signOf(next) !== 0 || next === '^');
  }

  private parseElectron(): ParsedFormula {
    const start = this.pos;
    this.pos++;
    const charge = this.parseCharge();
    if (this.pos < this.end) this.fail(this.pos, `unexpected '${this.src[this.pos]}' after the electron`);
    if (charge !== -1) this.fail(start, `the electron has charge −1, not ${charge} (write e-)`);
    return { input: this.src, elements: {}, charge: -1, isElectron: true };
  }

  private expectComponentStart(first: boolean): void {
    if (this.pos >= this.end) {
      this.fail(this.pos, first ? 'empty formula' : 'expected a formula after the hydrate separator');
    }
    const ch = this.src[this.pos];
    const code = ch.charCodeAt(0);
    if (isUpper(code) || ch === '(' || ch === '[') return;
    if (digitValue(code) >= 0) {
      this.fail(this.pos, first
        ? 'a formula cannot start with a number (put a coefficient in the equation, not the formula)'
        : 'expected a formula after the multiplier');
    }
    if (isLower(code)) this.fail(this.pos, this.unknownElementReason(this.pos));
    this.fail(this.pos, `unexpected '${ch}'`);
  }

  /** Groups until something that cannot continue a component. */
  private parseComponent(depth: number): Counts {
    if (depth > MAX_DEPTH) this.fail(this.pos, `brackets nested deeper than ${MAX_DEPTH}`);
    const counts: Counts = {};
    let groups = 0;
    while (this.pos < this.end) {
      const ch = this.src[this.pos];
      const code = ch.charCodeAt(0);
      if (isUpper(code)) {
        const symbol = this.readElement();
        const count = this.parseCount(false);
        counts[symbol] = (counts[symbol] ?? 0) + count;
      } else if (ch === '(' || ch === '[') {
        if (ch === '(' && this.isChargeAhead()) break;
        const open = this.pos;
        const close = ch === '(' ? ')' : ']';
        this.pos++;
        if (this.pos < this.end && isLower(this.src.charCodeAt(this.pos))) {
          const closing = this.src.indexOf(close, open);
          if (closing < 0 || closing >= this.end) this.fail(open, `unbalanced '${ch}'`);
          this.fail(open, `a phase label '${this.src.slice(open, closing + 1)}' is not part of a formula (use parseSpecies)`);
        }
        if (this.pos >= this.end || this.src[this.pos] === close) this.fail(open, `empty '${ch}${close}'`);
        const inner = this.parseComponent(depth + 1);
        if (this.pos >= this.end) this.fail(open, `unbalanced '${ch}'`);
        if (this.src[this.pos] !== close) {
          const found = this.src[this.pos];
          if (found === ')' || found === ']') this.fail(open, `'${ch}' is closed by '${found}' at column ${this.pos}`);
          this.fail(this.pos, `unexpected '${found}' inside '${ch}${close}'`);
        }
        this.pos++;
        const count = this.parseCount(close === ']');
        addInto(counts, inner, count);
      } else if (ch === ')' || ch === ']') {
        if (depth === 0) this.fail(this.pos, `unbalanced '${ch}'`);
        break;
      } else if (isLower(code)) {
        this.fail(this.pos, this.unknownElementReason(this.pos));
      } else {
        break;
      }
      groups++;
    }
    if (groups === 0) this.fail(this.pos, this.pos < this.end ? `unexpected '${this.src[this.pos]}'` : 'expected an element');
    return counts;
  }

  private readElement(): string {
    const start = this.pos;
    this.pos++;
    while (this.pos < this.end && isLower(this.src.charCodeAt(this.pos))) this.pos++;
    const symbol = this.src.slice(start, this.pos);
    if (!ATOMIC_WEIGHTS.has(symbol)) this.fail(start, `unknown element '${symbol}'`);
    return symbol;
  }

  private unknownElementReason(at: number): string {
    let stop = at;
    while (stop < this.end && /[A-Za-z]/.test(this.src[stop])) stop++;
    const word = this.src.slice(at, Math.max(stop, at + 1));
    return `unknown element '${word}' (element symbols start with a capital letter)`;
  }

  /** Count after an element or bracket; 1 when absent. */
  private parseCount(afterSquareBracket: boolean): number {
    const start = this.pos;
    if (start >= this.end || digitValue(this.src.charCodeAt(start)) < 0) return 1;
    if (afterSquareBracket && this.isComplexChargeAhead()) return 1;
    let value = 0;
    while (this.pos < this.end) {
      const d = digitValue(this.src.charCodeAt(this.pos));
      if (d < 0) break;
      value = value * 10 + d;
      this.pos++;
    }
    if (value === 0 && this.src[this.pos] === '.' && digitValue(this.src.charCodeAt(this.pos + 1) || 0) >= 0) {
      this.pos++;
      value = this.readFraction();
    }
    if (value === 0) this.fail(start, 'a count of zero');
    if (value > MAX_COUNT) this.fail(start, `count ${value} is implausibly large`);
    return value;
  }

  /** Digits after a decimal point → their value as a fraction (0.947 for "947"). */
  private readFraction(): number {
    const start = this.pos;
    while (this.pos < this.end && digitValue(this.src.charCodeAt(this.pos)) >= 0) this.pos++;
    return Number('0.' + this.src.slice(start, this.pos).replace(/[₀-₉]/g, (c) => String(c.charCodeAt(0) - SUBSCRIPT_ZERO)));
  }

  /** Multiplier of a hydrate component (the 5 of ·5H2O); 1 when absent. */
  private parseMultiplier(): number {
    const start = this.pos;
    while (this.pos < this.end && /[0-9]/.test(this.src[this.pos])) this.pos++;
    if (this.pos === start) return 1;
    if (this.src[this.pos] === '.' && /[0-9]/.test(this.src[this.pos + 1] ?? '')) {
      this.pos++;
      while (this.pos < this.end && /[0-9]/.test(this.src[this.pos])) this.pos++;
    }
    const value = Number(this.src.slice(start, this.pos));
    if (!(value > 0)) this.fail(start, 'a multiplier of zero');
    if (value > MAX_COUNT) this.fail(start, `multiplier ${value} is implausibly large`);
    this.skipSpaces();
    return value;
  }

  private skipSpaces(): void {
    while (this.pos < this.end && (this.src[this.pos] === ' ' || this.src[this.pos] === '\t')) this.pos++;
  }

  private peekNonSpace(): number {
    let at = this.pos;
    while (at < this.end && (this.src[at] === ' ' || this.src[at] === '\t')) at++;
    return at;
  }

  /** '(' that opens a charge such as (2-) or (+), closed at the end of the formula. */
  private isChargeAhead(): boolean {
    if (this.src[this.pos] !== '(') return false;
    return /^\((\d*[+\-−]|[+\-−]\d*)\)$/.test(this.src.slice(this.pos, this.end));
  }

  /** "digits sign" ending the formula right after ']' (the charge of a complex ion). */
  private isComplexChargeAhead(): boolean {
    return /^\d+[+\-−]$/.test(this.src.slice(this.pos, this.end));
  }

  /** Reads a charge at `pos` in any accepted notation. */
  private parseCharge(): number {
    const start = this.pos;
    const ch = this.src[this.pos];
    if (this.src[this.pos - 1] === ']' && this.isComplexChargeAhead()) {
      const digits = this.readAsciiDigits();
      const sign = signOf(this.src[this.pos]);
      this.pos++;
      return this.chargeFromDigitsAndSign(digits, sign, start);
    }
    if (ch === '(' && this.isChargeAhead()) {
      const body = this.src.slice(this.pos + 1, this.end - 1);
      this.pos = this.end;
      return this.chargeFromDigitsAndSign(body.replace(/[+\-−]/, ''), signOf(body.replace(/\d/g, '')), start);
    }
    if (ch === '^') {
      this.pos++;
      const digitsBefore = this.readAsciiDigits();
      const sign = signOf(this.src[this.pos] ?? '');
      if (sign === 0) this.fail(this.pos, "expected '+' or '-' in the charge");
      this.pos++;
      const digitsAfter = digitsBefore === '' ? this.readAsciiDigits() : '';
      return this.chargeFromDigitsAndSign(digitsBefore || digitsAfter, sign, start);
    }
    if (ch in SUPERSCRIPT_DIGITS || ch === '⁺' || ch === '⁻') {
      let magnitude = 0;
      let digits = 0;
      while (this.pos < this.end && this.src[this.pos] in SUPERSCRIPT_DIGITS) {
        magnitude = magnitude * 10 + SUPERSCRIPT_DIGITS[this.src[this.pos]];
        digits++;
        this.pos++;
      }
      const sign = signOf(this.src[this.pos] ?? '');
      if (sign === 0) this.fail(this.pos, "expected '⁺' or '⁻' after the superscript digits");
      this.pos++;
      if (digits === 0) {
        let n = 1;
        while (this.pos < this.end && signOf(this.src[this.pos]) === sign) {
          n++;
          this.pos++;
        }
        return sign * n;
      }
      return this.chargeFromDigitsAndSign(String(magnitude), sign, start);
    }
    const sign = signOf(ch);
    if (sign === 0) this.fail(this.pos, `unexpected '${ch}'`);
    this.pos++;
    const digits = this.readAsciiDigits();
    if (digits !== '') return this.chargeFromDigitsAndSign(digits, sign, start);
    let n = 1;
    while (this.pos < this.end && signOf(this.src[this.pos]) !== 0) {
      if (signOf(this.src[this.pos]) !== sign) this.fail(this.pos, "mixed '+' and '-' in the charge");
      n++;
      this.pos++;
    }
    return sign * n;
  }

  private readAsciiDigits(): string {
    const start = this.pos;
    while (this.pos < this.end && /[0-9]/.test(this.src[this.pos])) this.pos++;
    return this.src.slice(start, this.pos);
  }

  private chargeFromDigitsAndSign(digits: string, sign: number, at: number): number {
    if (sign === 0) this.fail(at, "expected '+' or '-' in the charge");
    const magnitude = digits === '' ? 1 : Number(digits);
    if (magnitude === 0) this.fail(at, 'a charge of zero');
    if (magnitude > 99) this.fail(at, `charge ${magnitude} is implausibly large`);
    return sign * magnitude;
  }

  private fail(column: number, reason: string): never {
    throw new FormulaError(this.src, column, reason);
  }
}

/**
 * Parses a chemical formula as people type it: `CH3OH`, `Ca(OH)2`, `K4[Fe(CN)6]`,
 * `CuSO4·5H2O` (also `.5H2O`, `*5H2O`), `NH4+`, `SO4-2`, `SO4^2-`, `SO4--`, `SO4²⁻`, `e-`,
 * `D2O`. Leading and trailing whitespace is ignored; phase labels are not part of a formula
 * (see `parseSpecies`).
 *
 * @throws FormulaError with the 0-based column and the reason
 */
export function parseFormula(text: string): ParsedFormula {
  let start = 0;
  let end = text.length;
  while (start < end && /\s/.test(text[start])) start++;
  while (end > start && /\s/.test(text[end - 1])) end--;
  return new FormulaParser(text, start, end).parse();
}

/** Like `parseFormula`, but returns the error instead of throwing it. */
export function tryParseFormula(
  text: string,
): { ok: true; formula: ParsedFormula } | { ok: false; error: FormulaError } {
  try {
    return { ok: true, formula: parseFormula(text) };
  } catch (error) {
    if (error instanceof FormulaError) return { ok: false, error };
    throw error;
  }
}
