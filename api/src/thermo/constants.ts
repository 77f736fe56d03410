/** Physical constants and the standard conditions Kelvindex computes at (SI units). */

/** Molar gas constant R / (J mol⁻¹ K⁻¹); CODATA 2018, exact since the 2019 SI redefinition. */
export const R = 8.314462618;

/** Reference temperature of formation values / K. */
export const T_REF = 298.15;

/** Standard pressure p° / Pa (1 bar; IUPAC recommendation, Pure Appl. Chem. 54, 1239, 1982). */
export const P_STD = 1e5;

/** One standard atmosphere / Pa (the standard pressure of older tables). */
export const P_ATM = 101325;

/** 0 °C in kelvin (exact). */
export const CELSIUS_ZERO = 273.15;

/** ln 10, used to turn ln K into log10 K. */
export const LN10 = Math.LN10;
