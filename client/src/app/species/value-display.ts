import { MolarEnergyUnit, convertFromSi } from '../shared/unit-selector/molar-energy-unit';
import { ThermoValue, ValueMethod } from './species-record';

/** A value converted from SI to the page's units, ready for `<kx-quantity>`. */
export interface DisplayedValue {
  readonly value: number;
  readonly uncertainty: number | null;
  readonly unit: string;
}

export function displayValue(value: Pick<ThermoValue, 'value' | 'uncertainty' | 'unit'>, unit: MolarEnergyUnit): DisplayedValue {
  const converted = convertFromSi(value.value, value.unit, unit);
  return {
    value: converted.value,
    uncertainty: value.uncertainty === null ? null : convertFromSi(value.uncertainty, value.unit, unit).value,
    unit: converted.unit,
  };
}

/** What the ± means (GUM): a standard uncertainty u, or an expanded U = k·u. */
export function describeUncertainty(value: Pick<ThermoValue, 'uncertainty' | 'uncertaintyKind' | 'coverageFactor'>): string {
  if (value.uncertainty === null) {
    return '';
  }
  if (value.uncertaintyKind === 'expanded') {
    return value.coverageFactor ? `expanded uncertainty, k = ${value.coverageFactor}` : 'expanded uncertainty';
  }
  return 'standard uncertainty';
}

/** A pressure in Pa as a reader expects it: `1 bar`, `1 atm`, otherwise kPa. */
export function describePressure(pascals: number | null): string {
  if (pascals === null) {
    return '';
  }
  if (pascals === 100_000) {
    return '1 bar';
  }
  if (pascals === 101_325) {
    return '1 atm';
  }
  return `${pascals / 1000} kPa`;
}

const METHOD_LABELS: Record<ValueMethod, string> = {
  measured: 'measured',
  evaluated: 'critically evaluated',
  computed: 'computed',
  estimated: 'estimated',
};

export function describeMethod(method: ValueMethod): string {
  return METHOD_LABELS[method] ?? method;
}

