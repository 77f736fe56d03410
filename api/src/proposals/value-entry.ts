import { JOULES_PER } from '../thermo/units';
import type { Quantity, UncertaintyKind } from '../values/value-vocabulary';

/**
 * Reading a number as a steward typed it (a decimal with a unit) into SI, keeping the text as
 * entered for provenance. Used by proposal items and by the bulk import.
 */

/** Energy per amount: J/mol (ΔfH°, ΔfG°, ΔtrsH). Factor to J/mol; power of ten when exact. */
const MOLAR_ENERGY_UNITS: Readonly<Record<string, { factor: number; power?: number; label: string }>> = {
  'j/mol': { factor: 1, power: 0, label: 'J/mol' },
  'kj/mol': { factor: 1000, power: 3, label: 'kJ/mol' },
  'cal/mol': { factor: JOULES_PER.cal, label: 'cal/mol' },
  'kcal/mol': { factor: JOULES_PER.kcal, label: 'kcal/mol' },
};

/** Energy per amount and temperature: J/(mol·K) (S°, Cp°). */
const MOLAR_ENTROPY_UNITS: Readonly<Record<string, { factor: number; power?: number; label: string }>> = {
  'j/(mol·k)': { factor: 1, power: 0, label: 'J/(mol·K)' },
  'cal/(mol·k)': { factor: JOULES_PER.cal, label: 'cal/(mol·K)' },
};

/** Spellings people type for the same unit ("J/mol/K", "J mol-1 K-1", "kJ mol⁻¹"), folded to the keys above. */
function foldUnit(text: string): string {
  const compact = text.toLowerCase().replace(/\s+/g, '').replace(/[⋅∙•*·]/g, '');
  const perMolPerK = /^(k?j|k?cal)(\/\(molk\)|\/\(kmol\)|\/mol\/k|\/k\/mol|mol-1k-1|mol⁻¹k⁻¹|k-1mol-1|k⁻¹mol⁻¹)$/.exec(compact);
  if (perMolPerK) return `${perMolPerK[1]}/(mol·k)`;
  const perMol = /^(k?j|k?cal)(\/mol|mol-1|mol⁻¹)$/.exec(compact);
  if (perMol) return `${perMol[1]}/mol`;
  return compact;
}

export const MOLAR_ENERGY_QUANTITIES: readonly Quantity[] = ['dfH', 'dfG', 'dtrsH'];

export function unitFor(quantity: Quantity, unit: string): { factor: number; power?: number; label: string } | undefined {
  const table = MOLAR_ENERGY_QUANTITIES.includes(quantity) ? MOLAR_ENERGY_UNITS : MOLAR_ENTROPY_UNITS;
  return table[foldUnit(unit)];
}

export function unitsAccepted(quantity: Quantity): string {
  const table = MOLAR_ENERGY_QUANTITIES.includes(quantity) ? MOLAR_ENERGY_UNITS : MOLAR_ENTROPY_UNITS;
  return Object.values(table).map((u) => u.label).join(', ');
}

const DECIMAL = /^([+\-−]?)(\d+(?:\.\d*)?|\.\d+)(?:[eE]([+-]?\d+))?$/;

/** A decimal number as typed ("-302.9", "1.5e3", "−12"); undefined when it is not one. */
export function readDecimal(text: string | number): { text: string; value: number } | undefined {
  if (typeof text === 'number') return Number.isFinite(text) ? { text: String(text), value: text } : undefined;
  const trimmed = text.trim();
  const match = DECIMAL.exec(trimmed);
  if (!match) return undefined;
  const normalized = `${match[1] === '−' ? '-' : match[1]}${match[2]}${match[3] !== undefined ? `e${match[3]}` : ''}`;
  const value = Number(normalized);
  return Number.isFinite(value) ? { text: trimmed.replace('−', '-'), value } : undefined;
}

/**
 * value × 10^power without the binary rounding of a multiplication: "-302.9" kJ/mol gives
 * exactly the double nearest to −302900 J/mol.
 */
export function scaleDecimal(text: string, power: number): number {
  if (power === 0) return Number(text);
  if (/e/i.test(text)) return Number(text) * 10 ** power;
  return Number(`${text}e${power}`);
}

export interface EnteredValue {
  /** SI: J/mol or J/(mol·K) */
  valueSi: number;
  /** as stated (standard u or expanded U), SI; null when none is given */
  uncertaintySi: number | null;
  uncertaintyKind: UncertaintyKind | null;
  coverageFactor: number | null;
  /** standard uncertainty u (U/k for an expanded one), SI; null when none */
  standardUncertaintySi: number | null;
  /** e.g. "-302.6 ± 0.4" */
  enteredValue: string;
  /** the unit's canonical spelling, e.g. "kJ/mol" */
  enteredUnit: string;
}

export interface EntryProblem {
  field: string;
  message: string;
}

/**
 * Reads value, unit and uncertainty for `quantity`. Problems name the field; an uncertainty
 * kind defaults to standard, and an expanded uncertainty needs its coverage factor k.
 */
export function readEnteredValue(
  quantity: Quantity,
  input: { value?: unknown; unit?: unknown; uncertainty?: unknown; uncertaintyKind?: unknown; coverageFactor?: unknown },
): { ok: true; entry: EnteredValue } | { ok: false; problems: EntryProblem[] } {
  const problems: EntryProblem[] = [];
  const value = typeof input.value === 'string' || typeof input.value === 'number' ? readDecimal(input.value) : undefined;
  if (!value) problems.push({ field: 'value', message: `value must be a decimal number (got ${JSON.stringify(input.value ?? null)})` });
  const unit = typeof input.unit === 'string' ? unitFor(quantity, input.unit) : undefined;
  if (!unit) problems.push({ field: 'unit', message: `unit must be one of ${unitsAccepted(quantity)} for ${quantity} (got ${JSON.stringify(input.unit ?? null)})` });

  const hasUncertainty = input.uncertainty !== undefined && input.uncertainty !== null && input.uncertainty !== '';
  let uncertainty: { text: string; value: number } | undefined;
  if (hasUncertainty) {
    uncertainty = typeof input.uncertainty === 'string' || typeof input.uncertainty === 'number' ? readDecimal(input.uncertainty) : undefined;
    if (!uncertainty) problems.push({ field: 'uncertainty', message: `uncertainty must be a decimal number (got ${JSON.stringify(input.uncertainty)})` });
    else if (uncertainty.value < 0) problems.push({ field: 'uncertainty', message: `uncertainty must be zero or positive (got ${uncertainty.text})` });
  }
  const kindGiven = input.uncertaintyKind !== undefined && input.uncertaintyKind !== null && input.uncertaintyKind !== '';
  let kind: UncertaintyKind | null = null;
  if (kindGiven) {
    if (input.uncertaintyKind === 'standard' || input.uncertaintyKind === 'expanded') kind = input.uncertaintyKind;
    else problems.push({ field: 'uncertaintyKind', message: `uncertaintyKind must be standard or expanded (got ${JSON.stringify(input.uncertaintyKind)})` });
    if (!hasUncertainty) problems.push({ field: 'uncertaintyKind', message: 'uncertaintyKind is given without an uncertainty' });
  } else if (hasUncertainty) {
    kind = 'standard';
  }
  let k: number | null = null;
  const kGiven = input.coverageFactor !== undefined && input.coverageFactor !== null && input.coverageFactor !== '';
  if (kGiven) {
    const parsed = typeof input.coverageFactor === 'string' || typeof input.coverageFactor === 'number' ? readDecimal(input.coverageFactor) : undefined;
    if (!parsed || !(parsed.value > 0 && parsed.value <= 10)) problems.push({ field: 'coverageFactor', message: `coverageFactor must be a number above 0 and at most 10 (got ${JSON.stringify(input.coverageFactor)})` });
    else k = parsed.value;
  }
  if (kind === 'expanded' && k === null && !problems.some((p) => p.field === 'coverageFactor')) {
    problems.push({ field: 'coverageFactor', message: 'an expanded uncertainty needs its coverage factor k (e.g. 2)' });
  }
  if (kind !== 'expanded' && kGiven && !problems.some((p) => p.field === 'coverageFactor')) {
    problems.push({ field: 'coverageFactor', message: 'a coverage factor belongs to an expanded uncertainty only' });
  }
  if (problems.length > 0 || !value || !unit) return { ok: false, problems };

  const toSi = (text: string, n: number) => (unit.power !== undefined ? scaleDecimal(text, unit.power) : n * unit.factor);
  const valueSi = toSi(value.text, value.value);
  const uncertaintySi = uncertainty ? toSi(uncertainty.text, uncertainty.value) : null;
  const standard = uncertaintySi === null ? null : kind === 'expanded' ? uncertaintySi / k! : uncertaintySi;
  return {
    ok: true,
    entry: {
      valueSi,
      uncertaintySi,
      uncertaintyKind: uncertaintySi === null ? null : kind,
      coverageFactor: kind === 'expanded' ? k : null,
      standardUncertaintySi: standard,
      enteredValue: uncertainty ? `${value.text} ± ${uncertainty.text}` : value.text,
      enteredUnit: unit.label,
    },
  };
}
