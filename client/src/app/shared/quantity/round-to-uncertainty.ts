/** A value and its uncertainty as display strings, rounded to the same decimal place. */
export interface RoundedQuantity {
  /** The value, ASCII minus sign, so that a copied number pastes into a spreadsheet. */
  readonly value: string;
  /** The uncertainty, or null when none was stated (or it is zero: an exact value). */
  readonly uncertainty: string | null;
  /** Power of ten both strings are scaled by, or null in plain decimal notation. */
  readonly exponent: number | null;
}

/** The digits of |x| read as d0.d1d2… × 10^exponent; no digits means zero. */
interface DecimalDigits {
  readonly digits: string;
  readonly exponent: number;
}

const ZERO: DecimalDigits = { digits: '', exponent: 0 };

/** Outside 10^-5 ≤ |x| < 10^6 the numbers are shown in scientific notation. */
const SMALLEST_PLAIN_EXPONENT = -4;
const LARGEST_PLAIN_EXPONENT = 5;

/**
 * Rounds a value and its uncertainty for display, following common practice under the GUM
 * (JCGM 100:2008, 7.2.6): the uncertainty to `significantDigits` significant digits (2 by
 * default), the value to the same decimal place. Both are in the same unit, whatever it is.
 * An uncertainty stated with fewer digits keeps them (± 0.04 is not padded to ± 0.040: that
 * would claim more than the source says); the value is padded to the uncertainty's place.
 *
 * Rounding is half away from zero on the shortest decimal form of each number (so 0.145 is
 * treated as the decimal 0.145, not as its binary neighbour 0.14499…). Without an uncertainty
 * the value is shown with the digits it has. Very large or small numbers share one power of ten.
 *
 * @throws RangeError for a non-finite value, or an uncertainty that is negative or not finite.
 */
export function roundToUncertainty(
  value: number,
  uncertainty: number | null | undefined,
  significantDigits = 2,
): RoundedQuantity {
  if (!Number.isFinite(value)) {
    throw new RangeError(`Cannot display a non-finite value: ${value}`);
  }
  if (uncertainty != null && !(Number.isFinite(uncertainty) && uncertainty >= 0)) {
    throw new RangeError(`An uncertainty must be finite and not negative: ${uncertainty}`);
  }
  if (!Number.isInteger(significantDigits) || significantDigits < 1) {
    throw new RangeError(`Significant digits must be a positive integer: ${significantDigits}`);
  }

  const negative = value < 0;
  const exactValue = toDecimalDigits(value);

  if (uncertainty == null || uncertainty === 0) {
    const place = exactValue.digits === '' ? 0 : exactValue.exponent - exactValue.digits.length + 1;
    const exponent = scientificExponent(exactValue, ZERO);
    return {
      value: render(exactValue, place, exponent, negative),
      uncertainty: null,
      exponent,
    };
  }

  const exactUncertainty = toDecimalDigits(uncertainty);
  const digitsShown = Math.min(significantDigits, exactUncertainty.digits.length);
  let place = exactUncertainty.exponent - (digitsShown - 1);
  let roundedUncertainty = roundAtPlace(exactUncertainty, place);
  if (roundedUncertainty.exponent > exactUncertainty.exponent) {
    // 0.0996 became 0.100: keep the stated number of significant digits, 0.10.
    place = roundedUncertainty.exponent - (digitsShown - 1);
    roundedUncertainty = roundAtPlace(roundedUncertainty, place);
  }
  const roundedValue = roundAtPlace(exactValue, place);
  const exponent = scientificExponent(roundedValue, roundedUncertainty);

  return {
    value: render(roundedValue, place, exponent, negative),
    uncertainty: render(roundedUncertainty, place, exponent, false),
    exponent,
  };
}

function toDecimalDigits(x: number): DecimalDigits {
  if (x === 0) {
    return ZERO;
  }
  // toExponential() without an argument gives the shortest digits that identify the number.
  const [mantissa, exponent] = Math.abs(x).toExponential().split('e');
  return { digits: mantissa.replace('.', ''), exponent: Number(exponent) };
}

/** Rounds half away from zero to a multiple of 10^place; the digits then end at `place`. */
function roundAtPlace(number: DecimalDigits, place: number): DecimalDigits {
  if (number.digits === '') {
    return ZERO;
  }
  const kept = number.exponent - place + 1;
  if (kept < 0) {
    return ZERO;
  }
  if (kept === 0) {
    return number.digits[0] >= '5' ? { digits: '1', exponent: place } : ZERO;
  }
  const digits = number.digits.slice(0, kept).padEnd(kept, '0');
  if ((number.digits[kept] ?? '0') < '5') {
    return { digits, exponent: number.exponent };
  }
  const incremented = incrementDigits(digits);
  return {
    digits: incremented,
    exponent: number.exponent + (incremented.length - digits.length),
  };
}

function incrementDigits(digits: string): string {
  const result = digits.split('');
  for (let index = result.length - 1; index >= 0; index--) {
    if (result[index] !== '9') {
      result[index] = String(Number(result[index]) + 1);
      return result.join('');
    }
    result[index] = '0';
  }
  return '1' + result.join('');
}

/** The shared power of ten for scientific notation, or null when plain decimals read better. */
function scientificExponent(value: DecimalDigits, uncertainty: DecimalDigits): number | null {
  const magnitude = value.digits !== '' ? value : uncertainty;
  if (magnitude.digits === '') {
    return null;
  }
  return magnitude.exponent < SMALLEST_PLAIN_EXPONENT || magnitude.exponent > LARGEST_PLAIN_EXPONENT
    ? magnitude.exponent
    : null;
}

/** Writes the digits in plain decimals down to 10^place, after scaling by 10^-exponent. */
function render(number: DecimalDigits, place: number, exponent: number | null, negative: boolean): string {
  const shift = exponent ?? 0;
  const numberExponent = number.exponent - shift;
  const lastPlace = place - shift;
  const firstPlace = number.digits === '' ? 0 : Math.max(numberExponent, 0);

  let text = '';
  for (let position = firstPlace; position >= Math.min(lastPlace, 0); position--) {
    if (position === -1) {
      text += '.';
    }
    const index = numberExponent - position;
    text += index >= 0 && index < number.digits.length ? number.digits[index] : '0';
  }
  return negative && number.digits !== '' ? `-${text}` : text;
}
