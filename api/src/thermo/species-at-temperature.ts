import { LN10, R, T_REF } from './constants';
import { ThermoInputError } from './errors';
import { evaluateHeatCapacity, type ThermoPoint } from './heat-capacity';
import type { ElementReference, ElementReferences, SpeciesThermoData } from './species-data';
import type { UncertainValue } from './uncertain-value';

/** Properties of a species at T, formation quantities included (SI units). */
export interface SpeciesAtTemperature extends ThermoPoint {
  /** standard uncertainty of S°(T) / (J mol⁻¹ K⁻¹) */
  readonly entropyUncertainty: number;
  /** standard uncertainty of H°(T) − H°(298.15 K) / (J mol⁻¹) */
  readonly enthalpyIncrementUncertainty: number;
  /** ΔfH°(T) / (J mol⁻¹) */
  readonly formationEnthalpy: UncertainValue;
  /** ΔfS°(T) / (J mol⁻¹ K⁻¹) */
  readonly formationEntropy: UncertainValue;
  /** ΔfG°(T) = ΔfH°(T) − T·ΔfS°(T) / (J mol⁻¹) */
  readonly formationGibbsEnergy: UncertainValue;
  /** log10 Kf = −ΔfG°/(R·T·ln 10) */
  readonly log10Kf: UncertainValue;
}

interface Increment {
  readonly point: ThermoPoint;
  readonly uH: number;
  readonly uS: number;
}

function incrementAt(
  fn: SpeciesThermoData['heatCapacity'],
  s298: UncertainValue,
  uCp: number,
  temperature: number,
  extrapolate: boolean,
  subject: string,
): Increment {
  const point = evaluateHeatCapacity(fn, temperature, { s298: s298.value, extrapolate, subject });
  const uIncrement = uCp * Math.abs(temperature - T_REF);
  const uSIncrement = uCp * Math.abs(Math.log(temperature / T_REF));
  return { point, uH: uIncrement, uS: Math.hypot(s298.uncertainty, uSIncrement) };
}

/** True when the species is itself the reference state of its only element. */
function isOwnReference(species: SpeciesThermoData, references: ElementReferences): boolean {
  const symbols = Object.keys(species.elements);
  if (symbols.length !== 1 || (species.charge ?? 0) !== 0) return false;
  const ref = references[symbols[0]];
  return ref !== undefined && ref.heatCapacity === species.heatCapacity && ref.atoms === species.elements[symbols[0]];
}

/**
 * Cp°, S°, H° − H°(298.15), −(G° − H°(298.15))/T, ΔfH°(T), ΔfG°(T) and log10 Kf of a species
 * at T, from its own functions and its elements' reference-state functions (Kirchhoff):
 * ΔfH°(T) = ΔfH°(298.15) + [H(T) − H(298.15)]species − Σ n·[H(T) − H(298.15)]element refs,
 * ΔfS°(T) = S°species(T) − Σ n·S°ref(T), ΔfG° = ΔfH° − T·ΔfS°, with n = atoms in the species
 * ÷ atoms in the reference species. An ion of charge z also forms z electrons: the reference
 * keyed 'e-' enters with n = −z (electron convention of the tables).
 *
 * S°(T) of NASA and Shomate forms comes from the fit itself; constant and tabulated forms are
 * anchored at the species' S°(298.15). A species that is its element's own reference state
 * (same function object) has ΔfH° = ΔfG° = 0 exactly at every T.
 *
 * Uncertainty (GUM, uncorrelated): ΔfH°(298.15), S°(298.15) and the Cp uncertainty of each
 * participant add in quadrature; ΔfH° and ΔfS° are treated as uncorrelated in ΔfG°.
 *
 * @param temperature T / K
 * @throws OutOfRangeError when T is outside a function's range (unless `extrapolate`)
 * @throws ThermoInputError when an element has no reference-state data
 */
export function speciesAtTemperature(
  species: SpeciesThermoData,
  temperature: number,
  references: ElementReferences,
  options: { extrapolate?: boolean } = {},
): SpeciesAtTemperature {
  const extrapolate = options.extrapolate ?? false;
  const label = species.label ?? 'species';
  const own = incrementAt(species.heatCapacity, species.entropy, species.heatCapacityUncertainty ?? 0, temperature, extrapolate, label);
  const { point } = own;
  const rt = R * temperature * LN10;

  const base = {
    ...point,
    entropyUncertainty: own.uS,
    enthalpyIncrementUncertainty: own.uH,
  };
  if (isOwnReference(species, references)) {
    const zero = { value: 0, uncertainty: 0 };
    return { ...base, formationEnthalpy: zero, formationEntropy: zero, formationGibbsEnergy: zero, log10Kf: zero };
  }

  const participants: Array<{ n: number; ref: ElementReference; subject: string }> = [];
  for (const symbol of Object.keys(species.elements)) {
    const ref = references[symbol];
    if (!ref) throw new ThermoInputError('references', `no reference-state data for element ${symbol} (needed by ${label})`);
    participants.push({ n: species.elements[symbol] / ref.atoms, ref, subject: ref.label ?? `reference state of ${symbol}` });
  }
  const z = species.charge ?? 0;
  if (z !== 0) {
    const ref = references['e-'];
    if (!ref) throw new ThermoInputError('references', `${label} is an ion: give the electron reference under 'e-'`);
    participants.push({ n: -z, ref, subject: ref.label ?? 'electron reference' });
  }

  let dH = species.formationEnthalpy.value + point.enthalpyIncrement;
  let dS = point.entropy;
  let varH = species.formationEnthalpy.uncertainty ** 2 + own.uH ** 2;
  let varS = own.uS ** 2;
  let extrapolated = point.extrapolated;
  for (const { n, ref, subject } of participants) {
    const inc = incrementAt(ref.heatCapacity, ref.entropy, ref.heatCapacityUncertainty ?? 0, temperature, extrapolate, subject);
    dH -= n * inc.point.enthalpyIncrement;
    dS -= n * inc.point.entropy;
    varH += n * n * inc.uH * inc.uH;
    varS += n * n * inc.uS * inc.uS;
    extrapolated ||= inc.point.extrapolated;
  }
  const dG = dH - temperature * dS;
  const uG = Math.sqrt(varH + temperature * temperature * varS);
  return {
    ...base,
    extrapolated,
    formationEnthalpy: { value: dH, uncertainty: Math.sqrt(varH) },
    formationEntropy: { value: dS, uncertainty: Math.sqrt(varS) },
    formationGibbsEnergy: { value: dG, uncertainty: uG },
    log10Kf: { value: -dG / rt, uncertainty: uG / rt },
  };
}
