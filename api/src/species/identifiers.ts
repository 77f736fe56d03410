/**
 * Format checks for species identifiers, the same rules as the database CHECK constraints
 * (`kx_cas_rn_is_valid`, `species_inchikey_format`), so the API can name the problem first.
 */

const CAS_RN = /^[1-9][0-9]{1,6}-[0-9]{2}-[0-9]$/;
const INCHIKEY = /^[A-Z]{14}-[A-Z]{8}[SN][A-Z]-[A-Z]$/;

/**
 * Check digit of a CAS Registry Number from its other digits: the last of those digits times 1,
 * the one before times 2, and so on, summed, modulo 10 (the registry's published rule).
 * @param digits the digits before the check digit, without hyphens (e.g. "773218" for water)
 */
export function casCheckDigit(digits: string): number {
  let total = 0;
  for (let i = 0; i < digits.length; i++) total += (digits.length - i) * Number(digits[i]);
  return total % 10;
}

/** True for a well-formed CAS RN (2–7, 2 and 1 digits, no leading zero) whose check digit is right. */
export function isValidCasRn(text: string): boolean {
  if (!CAS_RN.test(text)) return false;
  const digits = text.replace(/-/g, '');
  return casCheckDigit(digits.slice(0, -1)) === Number(digits.at(-1));
}

/** True for the 27-character standard InChIKey layout (14-10-1 upper-case letters). */
export function isInchiKeyFormat(text: string): boolean {
  return INCHIKEY.test(text);
}
