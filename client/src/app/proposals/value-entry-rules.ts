import { AbstractControl, FormControl, FormGroup, ValidationErrors, ValidatorFn, Validators } from '@angular/forms';

import {
  QuantityCode,
  StandardPressure,
  TransitionKind,
  UncertaintyKind,
  ValueMethod,
  unitsFor,
} from '../shared/vocabulary/thermo-vocabulary';

/**
 * The rules a value must meet before the API takes it, checked as the steward types
 * (api/src/proposals/value-entry.ts and proposal-item-payloads.ts apply the same ones).
 */

/** A decimal as printed in a source: "-302.9", "1.5e3", "−12" (the typographic minus too). */
const DECIMAL = /^[+\-−]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

export function readDecimal(text: string): number | null {
  const trimmed = text.trim();
  return DECIMAL.test(trimmed) ? Number(trimmed.replace('−', '-')) : null;
}

const blank = (value: unknown) => value === null || value === undefined || String(value).trim() === '';

/** A decimal number, or empty (left to `required`). */
export const decimalRule: ValidatorFn = (control) => (blank(control.value) || readDecimal(String(control.value)) !== null ? null : { decimal: true });

export function siblings(control: AbstractControl): Partial<ValueEntry> {
  return (control.parent?.getRawValue() ?? {}) as Partial<ValueEntry>;
}

/**
 * On the value: S° and Cp° are positive, as are enthalpies of fusion, vaporisation and
 * sublimation (a solid–solid transition may go either way).
 */
export const positiveValueRule: ValidatorFn = (control) => {
  const value = readDecimal(String(control.value ?? ''));
  if (value === null) {
    return null;
  }
  const { quantity, transitionKind } = siblings(control);
  const mustBePositive = quantity === 'S' || quantity === 'Cp' || (quantity === 'dtrsH' && !!transitionKind && transitionKind !== 'trs');
  return mustBePositive && !(value > 0) ? { positive: true } : null;
};

/** On the uncertainty: a decimal of zero or more. */
export const uncertaintyRule: ValidatorFn = (control) => {
  if (blank(control.value)) {
    return null;
  }
  const value = readDecimal(String(control.value));
  if (value === null) {
    return { decimal: true };
  }
  return value < 0 ? { negative: true } : null;
};

/** On k: required with an expanded uncertainty, a number above 0 and at most 10. */
export const coverageFactorRule: ValidatorFn = (control) => {
  const { uncertaintyKind, uncertainty } = siblings(control);
  if (uncertaintyKind !== 'expanded' || blank(uncertainty)) {
    return null;
  }
  if (blank(control.value)) {
    return { required: true };
  }
  const k = readDecimal(String(control.value));
  return k !== null && k > 0 && k <= 10 ? null : { coverageFactor: true };
};

/** On the level of theory: required for a computed value. */
export const levelOfTheoryRule: ValidatorFn = (control) =>
  siblings(control).method === 'computed' && blank(control.value) ? { required: true } : null;

/** On the transition: required for ΔtrsH. */
export const transitionRule: ValidatorFn = (control) => (siblings(control).quantity === 'dtrsH' && blank(control.value) ? { required: true } : null);

/** On the unit: one the API reads for the chosen quantity. */
export const unitRule: ValidatorFn = (control) => {
  const quantity = siblings(control).quantity;
  return quantity && !unitsFor(quantity).includes(control.value) ? { unit: true } : null;
};

/** On the temperature: above 0 K. */
export const temperatureRule: ValidatorFn = (control) => {
  const value = readDecimal(String(control.value ?? ''));
  return value !== null && !(value > 0) ? { positive: true } : null;
};

/** What the form holds: numbers as typed (text), so the source's digits are kept. */
export interface ValueEntry {
  quantity: QuantityCode;
  transitionKind: TransitionKind | null;
  value: string;
  unit: string;
  uncertainty: string;
  uncertaintyKind: UncertaintyKind;
  coverageFactor: string;
  temperatureK: string;
  pressurePa: StandardPressure;
  method: ValueMethod | null;
  levelOfTheory: string;
  sourceLocator: string;
  notes: string;
}

export type ValueEntryForm = FormGroup<{ [K in keyof ValueEntry]: FormControl<ValueEntry[K]> }>;

export function valueEntryForm(): ValueEntryForm {
  const text = (value = '', ...validators: ValidatorFn[]) => new FormControl(value, { nonNullable: true, validators });
  return new FormGroup({
    quantity: new FormControl<QuantityCode>('dfH', { nonNullable: true, validators: Validators.required }),
    transitionKind: new FormControl<TransitionKind | null>(null, { validators: transitionRule }),
    value: text('', Validators.required, decimalRule, positiveValueRule),
    unit: text('kJ/mol', Validators.required, unitRule),
    uncertainty: text('', uncertaintyRule),
    uncertaintyKind: new FormControl<UncertaintyKind>('standard', { nonNullable: true }),
    coverageFactor: text('', coverageFactorRule),
    temperatureK: text('298.15', Validators.required, decimalRule, temperatureRule),
    pressurePa: new FormControl<StandardPressure>(100000, { nonNullable: true, validators: Validators.required }),
    method: new FormControl<ValueMethod | null>(null, { validators: Validators.required }),
    levelOfTheory: text('', levelOfTheoryRule, Validators.maxLength(500)),
    sourceLocator: text('', Validators.maxLength(500)),
    notes: text('', Validators.maxLength(2000)),
  });
}

/**
 * Re-checks the fields whose rules read other fields; call it whenever the form's value changes
 * (a change of quantity, uncertainty kind or method can make another field valid or not).
 */
export function revalidateDependents(form: ValueEntryForm): void {
  for (const name of ['transitionKind', 'value', 'unit', 'coverageFactor', 'levelOfTheory'] as const) {
    form.controls[name].updateValueAndValidity({ emitEvent: false });
  }
}

/** The fields every entry shares: how it was obtained and where in its source it stands. */
export type ProvenanceField = 'method' | 'levelOfTheory' | 'sourceLocator' | 'notes';

/** The sentence to show for a provenance field's first error; `entry` names what is entered ("value", "fit"). */
export function provenanceMessage(field: ProvenanceField, errors: ValidationErrors | null, entry: string): string {
  return valueEntryMessage(field, errors, undefined, entry);
}

/** The sentence to show for a field's first error; `entry` names what is entered in messages about the method. */
export function valueEntryMessage(field: keyof ValueEntry, errors: ValidationErrors | null, quantity?: QuantityCode, entry = 'value'): string {
  if (!errors) {
    return '';
  }
  if (errors['required']) {
    return (
      {
        value: 'Enter the value as the source prints it.',
        unit: 'Choose the unit.',
        coverageFactor: 'An expanded uncertainty needs its coverage factor k (e.g. 2).',
        temperatureK: 'Enter the temperature in kelvin (298.15 for standard values).',
        method: `Say how the ${entry} was obtained.`,
        levelOfTheory: `A computed ${entry} needs its level of theory (e.g. G4, CCSD(T)/CBS).`,
        transitionKind: 'Say which transition this enthalpy belongs to.',
      } as Partial<Record<keyof ValueEntry, string>>
    )[field] ?? 'Required.';
  }
  if (errors['decimal']) {
    return 'Enter a decimal number, e.g. -302.6 or 1.5e3.';
  }
  if (errors['positive']) {
    if (field === 'temperatureK') {
      return 'The temperature must be above 0 K.';
    }
    return quantity === 'S'
      ? 'A third-law entropy S° is positive.'
      : quantity === 'Cp'
        ? 'A heat capacity Cp° is positive.'
        : 'An enthalpy of fusion, vaporisation or sublimation is positive.';
  }
  if (errors['negative']) {
    return 'An uncertainty is zero or positive.';
  }
  if (errors['coverageFactor']) {
    return 'k is a number above 0 and at most 10.';
  }
  if (errors['unit']) {
    return 'That unit does not fit the quantity.';
  }
  if (errors['maxlength']) {
    return `At most ${(errors['maxlength'] as { requiredLength: number }).requiredLength} characters.`;
  }
  return 'Check this field.';
}

/** The numbers part of an add_value or revise_value payload, as the API reads it. */
export function valuePayload(entry: ValueEntry, options: { withQuantity: boolean }): Record<string, unknown> {
  const payload: Record<string, unknown> = {};
  if (options.withQuantity) {
    payload['quantity'] = entry.quantity;
    if (entry.quantity === 'dtrsH' && entry.transitionKind) {
      payload['transitionKind'] = entry.transitionKind;
    }
  }
  payload['value'] = entry.value.trim().replace('−', '-');
  payload['unit'] = entry.unit;
  if (entry.uncertainty.trim() !== '') {
    payload['uncertainty'] = entry.uncertainty.trim();
    payload['uncertaintyKind'] = entry.uncertaintyKind;
    if (entry.uncertaintyKind === 'expanded') {
      payload['coverageFactor'] = Number(entry.coverageFactor);
    }
  }
  payload['temperatureK'] = Number(entry.temperatureK);
  payload['pressurePa'] = entry.pressurePa;
  payload['method'] = entry.method;
  for (const key of ['levelOfTheory', 'sourceLocator', 'notes'] as const) {
    if (entry[key].trim() !== '') {
      payload[key] = entry[key].trim();
    }
  }
  return payload;
}

/** The form's value from a stored payload, for editing an item (quantity from the payload or the revised value). */
export function entryFromPayload(payload: Readonly<Record<string, unknown>>, quantity?: QuantityCode): Partial<ValueEntry> {
  const text = (key: string) => (payload[key] === undefined || payload[key] === null ? '' : String(payload[key]));
  const entry: Partial<ValueEntry> = {
    quantity: (payload['quantity'] as QuantityCode | undefined) ?? quantity ?? 'dfH',
    transitionKind: (payload['transitionKind'] as TransitionKind | undefined) ?? null,
    value: text('value'),
    unit: text('unit'),
    uncertainty: text('uncertainty'),
    uncertaintyKind: payload['uncertaintyKind'] === 'expanded' ? 'expanded' : 'standard',
    coverageFactor: text('coverageFactor'),
    temperatureK: text('temperatureK') || '298.15',
    pressurePa: payload['pressurePa'] === 101325 ? 101325 : 100000,
    method: (payload['method'] as ValueMethod | undefined) ?? null,
    levelOfTheory: text('levelOfTheory'),
    sourceLocator: text('sourceLocator'),
    notes: text('notes'),
  };
  return entry;
}
