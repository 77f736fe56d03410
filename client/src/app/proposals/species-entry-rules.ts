import { ValidatorFn } from '@angular/forms';

/**
 * Rules for a new species (an add_species item), as the API checks them
 * (api/src/proposals/proposal-item-payloads.ts, api/src/species/identifiers.ts).
 */

/** A CAS Registry Number with a correct check digit: 2–7 digits, 2 digits, 1 check digit. */
export function isValidCasRn(text: string): boolean {
  const match = /^(\d{2,7})-(\d{2})-(\d)$/.exec(text.trim());
  if (!match) {
    return false;
  }
  const digits = (match[1] + match[2]).split('').reverse();
  const sum = digits.reduce((total, digit, index) => total + Number(digit) * (index + 1), 0);
  return sum % 10 === Number(match[3]);
}

/** A standard 27-character InChIKey. */
export function isInchiKey(text: string): boolean {
  return /^[A-Z]{14}-[A-Z]{10}-[A-Z]$/.test(text.trim());
}

/** Formula text as chemists type it: element symbols, counts, brackets, a charge or a dot. */
export function looksLikeFormula(text: string): boolean {
  const trimmed = text.trim();
  return /^[A-Z]/.test(trimmed) && /^[A-Za-z0-9()[\]·.*+\-^ ]+$/.test(trimmed);
}

const optional = (test: (text: string) => boolean, error: string): ValidatorFn => (control) =>
  String(control.value ?? '').trim() === '' || test(String(control.value)) ? null : { [error]: true };

export const casRnRule = optional(isValidCasRn, 'casRn');
export const inchiKeyRule = optional(isInchiKey, 'inchikey');
export const formulaRule = optional(looksLikeFormula, 'formula');
