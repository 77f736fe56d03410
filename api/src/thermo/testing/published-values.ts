/**
 * Published values the thermo specs and the engine benchmark check against. Each block names
 * its source and how sure the copy is (see /work/shared/reference-data/published-values.md).
 * Units as published; the specs convert to SI.
 */
import type { Nasa7Function, Nasa9Function, ShomateFunction } from '../heat-capacity';
import { NASA_TM_4513_SETS } from '../../reference-data/nasa-tm-4513';

/** kJ → J */
export const kJ = (value: number) => value * 1000;

/**
 * NASA 7-coefficient sets, McBride, Gordon & Reno, NASA TM-4513 (1993), ranges 200–1000–6000 K.
 * N2 and H2O: as given in published-values.md (copy attributing them to TM-4513). The others
 * as reproduced in Cantera's data/nasa_gas.yaml, whose header cites TM-4513 and whose N2 and
 * H2O sets match the ones above digit for digit; the low-range O2 and H2 sets also agree
 * with GRI-Mech 3.0 copies. Not checked against the report itself: the specs verify each
 * set against the JANAF rows before relying on it.
 */
const nasa7 = (low: number[], high: number[]): Nasa7Function => ({
  kind: 'nasa7',
  ranges: [
    { tMin: 200, tMax: 1000, coefficients: low },
    { tMin: 1000, tMax: 6000, coefficients: high },
  ],
});

export const TM4513 = Object.fromEntries(
  Object.entries(NASA_TM_4513_SETS).map(([name, set]) => [name, nasa7([...set.low], [...set.high])]),
) as Record<keyof typeof NASA_TM_4513_SETS, Nasa7Function>;

/**
 * NASA 9-coefficient set of N2 (McBride, Zehe & Gordon, NASA TP-2002-211556), from memory of
 * the CEA thermo.inp entry, corroborated by several public copies (e.g. Cantera's NASA9
 * documentation example); verified in the specs against the JANAF N2 rows.
 */
export const TP2002_N2: Nasa9Function = {
  kind: 'nasa9',
  ranges: [
    {
      tMin: 200, tMax: 1000,
      coefficients: [2.210371497e4, -3.81846182e2, 6.08273836, -8.53091441e-3, 1.384646189e-5, -9.62579362e-9, 2.519705809e-12],
      b1: 7.10846086e2, b2: -1.076003744e1,
    },
    {
      tMin: 1000, tMax: 6000,
      coefficients: [5.87712406e5, -2.239249073e3, 6.06694922, -6.1396855e-4, 1.491806679e-7, -1.923105485e-11, 1.061954386e-15],
      b1: 1.283210415e4, b2: -1.586640027e1,
    },
    {
      tMin: 6000, tMax: 20000,
      coefficients: [8.31013916e8, -6.42073354e5, 2.020264635e2, -3.065092046e-2, 2.486903333e-6, -9.70595411e-11, 1.437538881e-15],
      b1: 4.93870704e6, b2: -1.67209974e3,
    },
  ],
};

/**
 * Shomate coefficients of the NIST Chemistry WebBook (from Chase 1998, NIST-JANAF 4th ed.),
 * from memory, corroborated by several public copies that cite the WebBook; verified in the
 * specs against the JANAF rows.
 */
export const WEBBOOK_SHOMATE: { N2: ShomateFunction; H2O: ShomateFunction } = {
  N2: {
    kind: 'shomate',
    ranges: [
      { tMin: 100, tMax: 500, A: 28.98641, B: 1.853978, C: -9.647459, D: 16.63537, E: 0.000117, F: -8.671914, G: 226.4168, H: 0 },
      { tMin: 500, tMax: 2000, A: 19.50583, B: 19.88705, C: -8.598535, D: 1.369784, E: 0.527601, F: -4.935202, G: 212.39, H: 0 },
      { tMin: 2000, tMax: 6000, A: 35.51872, B: 1.128728, C: -0.196103, D: 0.014662, E: -4.55376, F: -18.97091, G: 224.981, H: 0 },
    ],
  },
  H2O: {
    kind: 'shomate',
    ranges: [
      { tMin: 500, tMax: 1700, A: 30.092, B: 6.832514, C: 6.793435, D: -2.53448, E: 0.082139, F: -250.881, G: 223.3967, H: -241.8264 },
      { tMin: 1700, tMax: 6000, A: 41.96426, B: 8.622053, C: -1.49978, D: 0.098119, E: -11.15764, F: -272.1797, G: 219.7809, H: -241.8264 },
    ],
  },
};

/** One JANAF row: Cp°, S°, −(G°−H°298)/T in J/(mol·K); H°−H°298, ΔfH°, ΔfG° in kJ/mol. */
export interface JanafRow {
  readonly cp: number;
  readonly s: number;
  readonly gef: number;
  readonly dh: number;
  readonly dfH: number;
  readonly dfG: number;
}

/** NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998); confirmed in two copies. */
export const JANAF: Readonly<Record<string, Readonly<Record<number, JanafRow>>>> = {
  N2: {
    298.15: { cp: 29.124, s: 191.609, gef: 191.609, dh: 0, dfH: 0, dfG: 0 },
    1000: { cp: 32.697, s: 228.17, gef: 206.708, dh: 21.463, dfH: 0, dfG: 0 },
  },
  O2: {
    298.15: { cp: 29.376, s: 205.147, gef: 205.147, dh: 0, dfH: 0, dfG: 0 },
    1000: { cp: 34.87, s: 243.578, gef: 220.875, dh: 22.703, dfH: 0, dfG: 0 },
  },
  H2: {
    298.15: { cp: 28.836, s: 130.68, gef: 130.68, dh: 0, dfH: 0, dfG: 0 },
    1000: { cp: 30.205, s: 166.216, gef: 145.536, dh: 20.68, dfH: 0, dfG: 0 },
  },
  H2O: {
    298.15: { cp: 33.59, s: 188.834, gef: 188.834, dh: 0, dfH: -241.826, dfG: -228.582 },
    1000: { cp: 41.268, s: 232.738, gef: 206.738, dh: 26.0, dfH: -247.857, dfG: -192.59 },
  },
  CO: {
    298.15: { cp: 29.142, s: 197.653, gef: 197.653, dh: 0, dfH: -110.527, dfG: -137.163 },
    1000: { cp: 33.183, s: 234.538, gef: 212.848, dh: 21.69, dfH: -111.983, dfG: -200.275 },
  },
  CH4: { 298.15: { cp: 35.639, s: 186.251, gef: 186.251, dh: 0, dfH: -74.873, dfG: -50.768 } },
  'H2O(l)': { 298.15: { cp: 75.351, s: 69.95, gef: 69.95, dh: 0, dfH: -285.83, dfG: -237.141 } },
  NH3: { 298.15: { cp: 35.652, s: 192.774, gef: 192.774, dh: 0, dfH: -45.898, dfG: -16.367 } },
};

/**
 * CODATA Key Values for Thermodynamics (Cox, Wagman & Medvedev, 1989): ΔfH° in kJ/mol,
 * S° in J/(mol·K), each ± as printed; "how sure" as in published-values.md.
 */
export const CODATA_1989 = {
  'H2(g)': { dfH: [0, 0], s: [130.68, 0.003] },
  'O2(g)': { dfH: [0, 0], s: [205.152, 0.005] },
  'N2(g)': { dfH: [0, 0], s: [191.609, 0.004] },
  'C(cr, graphite)': { dfH: [0, 0], s: [5.74, 0.1] },
  'H2O(l)': { dfH: [-285.83, 0.04], s: [69.95, 0.03] },
  'H2O(g)': { dfH: [-241.826, 0.04], s: [188.835, 0.01] },
  'CO2(g)': { dfH: [-393.51, 0.13], s: [213.785, 0.01] },
  'CO(g)': { dfH: [-110.53, 0.17], s: [197.66, 0.004] },
  'NH3(g)': { dfH: [-45.94, 0.35], s: [192.77, 0.05] },
} as const;

/**
 * NBS Tables (Wagman et al., J. Phys. Chem. Ref. Data 11, Suppl. 2, 1982): ΔfH°, ΔfG° in
 * kJ/mol; S°, Cp° in J/(mol·K). ΔfH°, ΔfG°, S° corroborated; Cp° from memory (cross-checked
 * in the specs against JANAF where JANAF has the species).
 */
export const NBS_1982 = {
  'CH4(g)': { dfH: -74.81, dfG: -50.72, s: 186.264, cp: 35.309 },
  'CO(g)': { dfH: -110.525, dfG: -137.168, s: 197.674, cp: 29.142 },
  'CO2(g)': { dfH: -393.509, dfG: -394.359, s: 213.74, cp: 37.11 },
  'H2O(l)': { dfH: -285.83, dfG: -237.129, s: 69.91, cp: 75.291 },
  'H2(g)': { dfH: 0, dfG: 0, s: 130.684, cp: 28.824 },
  'O2(g)': { dfH: 0, dfG: 0, s: 205.138, cp: 29.355 },
  'N2(g)': { dfH: 0, dfG: 0, s: 191.61, cp: 29.125 },
  'C2H6(g)': { dfH: -84.68, dfG: -32.82, s: 229.6, cp: 52.63 },
  'CH3OH(l)': { dfH: -238.66, dfG: -166.27, s: 126.8, cp: 81.6 },
  'CH3OH(g)': { dfH: -200.66, dfG: -161.96, s: 239.81, cp: 43.89 },
  'C2H5OH(l)': { dfH: -277.69, dfG: -174.78, s: 160.7, cp: 111.46 },
  'C2H5OH(g)': { dfH: -235.1, dfG: -168.49, s: 282.7, cp: 65.44 },
  /** NH3(g) as quoted in issue 3 for the NBS ammonia-synthesis check */
  'NH3(g)': { dfH: -46.11, s: 192.45 },
} as const;
