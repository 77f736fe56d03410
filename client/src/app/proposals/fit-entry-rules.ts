import { AbstractControl, FormArray, FormControl, FormGroup, ValidationErrors, ValidatorFn, Validators } from '@angular/forms';

import { COEFFICIENT_COUNTS, FitForm, StandardPressure, ValueMethod } from '../shared/vocabulary/thermo-vocabulary';
import { FitRangeInput } from '../shared/heat-capacity/heat-capacity';
import { levelOfTheoryRule, readDecimal } from './value-entry-rules';

/**
 * A heat-capacity fit as the steward enters it: the form, one or more temperature ranges that
 * follow each other without gaps, and per range its coefficients (pasted or typed, separated by
 * spaces, commas or line breaks; Fortran `D` exponents are read) or, for a table, `T Cp` lines.
 * The rules are the API's (api/src/values/fit-ranges.ts).
 */

/** Numbers in pasted text: "2.9525764E+00 1.3969E-03", "30.092, 6.832", "1.0D-05"; null if any piece is not a number. */
export function parseNumberList(text: string): number[] | null {
  const pieces = text.trim().split(/[\s,;]+/).filter(Boolean);
  if (pieces.length === 0) {
    return [];
  }
  const numbers = pieces.map((piece) => readDecimal(piece.replace(/[dD]/, 'e')));
  return numbers.every((n): n is number => n !== null) ? numbers : null;
}

/** `T Cp` pairs, one per line (or all on one line); null when the numbers do not pair up. */
export function parsePoints(text: string): [number, number][] | null {
  const numbers = parseNumberList(text);
  if (numbers === null || numbers.length % 2 !== 0) {
    return null;
  }
  const points: [number, number][] = [];
  for (let i = 0; i < numbers.length; i += 2) {
    points.push([numbers[i], numbers[i + 1]]);
  }
  return points;
}

export interface FitRangeEntry {
  tMin: string;
  tMax: string;
  /** Coefficients, or `T Cp` lines for a tabulated fit. */
  numbers: string;
}

export type FitRangeForm = FormGroup<{ [K in keyof FitRangeEntry]: FormControl<string> }>;

export interface FitEntry {
  form: FitForm;
  ranges: FitRangeEntry[];
  pressurePa: StandardPressure;
  method: ValueMethod | null;
  levelOfTheory: string;
  sourceLocator: string;
  notes: string;
}

export type FitEntryForm = FormGroup<{
  form: FormControl<FitForm>;
  ranges: FormArray<FitRangeForm>;
  pressurePa: FormControl<StandardPressure>;
  method: FormControl<ValueMethod | null>;
  levelOfTheory: FormControl<string>;
  sourceLocator: FormControl<string>;
  notes: FormControl<string>;
}>;

function fitFormOf(range: AbstractControl): FitForm | undefined {
  return (range.parent?.parent as FitEntryForm | null)?.controls.form.value;
}

/** On one range: 0 K < Tmin < Tmax, and the numbers the form needs. */
export const fitRangeRule: ValidatorFn = (control) => {
  const range = (control as FitRangeForm).getRawValue();
  const tMin = readDecimal(range.tMin);
  const tMax = readDecimal(range.tMax);
  const errors: ValidationErrors = {};
  if (tMin === null || tMax === null || !(tMin > 0 && tMax > tMin)) {
    errors['range'] = 'Give Tmin and Tmax in kelvin with 0 K < Tmin < Tmax.';
  }
  const form = fitFormOf(control);
  if (form === 'tabulated') {
    const points = parsePoints(range.numbers);
    if (points === null || points.length < 2) {
      errors['numbers'] = 'Give at least two “T Cp” pairs, one per line.';
    } else if (points.some(([, cp]) => !(cp > 0))) {
      errors['numbers'] = 'Cp° must be positive at every point.';
    } else if (points.some(([t], i) => i > 0 && !(t > points[i - 1][0]))) {
      errors['numbers'] = 'The temperatures must increase from one point to the next.';
    } else if (tMin !== null && tMax !== null && points.some(([t]) => t < tMin || t > tMax)) {
      errors['numbers'] = `Every point must lie within ${tMin}–${tMax} K.`;
    }
  } else if (form) {
    const expected = COEFFICIENT_COUNTS[form];
    const coefficients = parseNumberList(range.numbers);
    if (coefficients === null) {
      errors['numbers'] = 'Only numbers, separated by spaces, commas or line breaks.';
    } else if (coefficients.length !== expected) {
      errors['numbers'] = `A ${form} range needs exactly ${expected} coefficient${expected === 1 ? '' : 's'}; ${coefficients.length} given.`;
    }
  }
  return Object.keys(errors).length > 0 ? errors : null;
};

/** On the list of ranges: at least one, each starting where the one before it ends. */
export const fitRangesRule: ValidatorFn = (control) => {
  const ranges = (control as FormArray<FitRangeForm>).getRawValue();
  if (ranges.length === 0) {
    return { ranges: 'Add at least one temperature range.' };
  }
  for (let i = 1; i < ranges.length; i++) {
    const previousEnd = readDecimal(ranges[i - 1].tMax);
    const start = readDecimal(ranges[i].tMin);
    if (previousEnd !== null && start !== null && previousEnd !== start) {
      return { ranges: `Range ${i + 1} starts at ${start} K, not where range ${i} ends (${previousEnd} K).` };
    }
  }
  return null;
};

export function fitRangeForm(entry: Partial<FitRangeEntry> = {}): FitRangeForm {
  return new FormGroup(
    {
      tMin: new FormControl(entry.tMin ?? '', { nonNullable: true, validators: Validators.required }),
      tMax: new FormControl(entry.tMax ?? '', { nonNullable: true, validators: Validators.required }),
      numbers: new FormControl(entry.numbers ?? '', { nonNullable: true, validators: Validators.required }),
    },
    { validators: fitRangeRule },
  );
}

export function fitEntryForm(): FitEntryForm {
  return new FormGroup({
    form: new FormControl<FitForm>('shomate', { nonNullable: true }),
    ranges: new FormArray([fitRangeForm({ tMin: '298.15', tMax: '1000' })], { validators: fitRangesRule }),
    pressurePa: new FormControl<StandardPressure>(100000, { nonNullable: true }),
    method: new FormControl<ValueMethod | null>(null, { validators: Validators.required }),
    levelOfTheory: new FormControl('', { nonNullable: true, validators: [levelOfTheoryRule, Validators.maxLength(500)] }),
    sourceLocator: new FormControl('', { nonNullable: true, validators: Validators.maxLength(500) }),
    notes: new FormControl('', { nonNullable: true, validators: Validators.maxLength(2000) }),
  });
}

/** Re-checks the rules that read other fields (the ranges read the form; the level of theory the method). */
export function revalidateFit(form: FitEntryForm): void {
  for (const range of form.controls.ranges.controls) {
    range.updateValueAndValidity({ emitEvent: false });
  }
  form.controls.ranges.updateValueAndValidity({ emitEvent: false });
  form.controls.levelOfTheory.updateValueAndValidity({ emitEvent: false });
}

/** The ranges as numbers, leaving out what does not read (for the live plot while typing). */
export function fitRanges(entry: Pick<FitEntry, 'form' | 'ranges'>): FitRangeInput[] {
  return entry.ranges.flatMap((range): FitRangeInput[] => {
    const tMin = readDecimal(range.tMin);
    const tMax = readDecimal(range.tMax);
    if (tMin === null || tMax === null || !(tMax > tMin)) {
      return [];
    }
    if (entry.form === 'tabulated') {
      const points = parsePoints(range.numbers);
      return points ? [{ tMin, tMax, points }] : [];
    }
    const coefficients = parseNumberList(range.numbers);
    return coefficients && coefficients.length > 0 ? [{ tMin, tMax, coefficients }] : [];
  });
}

/** The fit part of an add_fit or replace_fit payload, as the API reads it. */
export function fitPayload(entry: FitEntry): Record<string, unknown> {
  const ranges = fitRanges(entry).map((range) =>
    entry.form === 'tabulated' ? { tMin: range.tMin, tMax: range.tMax, points: range.points } : { tMin: range.tMin, tMax: range.tMax, coefficients: range.coefficients },
  );
  const payload: Record<string, unknown> = {
    form: entry.form,
    tMin: ranges[0]?.tMin,
    tMax: ranges.at(-1)?.tMax,
    ranges,
    pressurePa: entry.pressurePa,
    method: entry.method,
  };
  for (const key of ['levelOfTheory', 'sourceLocator', 'notes'] as const) {
    if (entry[key].trim() !== '') {
      payload[key] = entry[key].trim();
    }
  }
  return payload;
}

/** A stored fit payload back in the form's terms, for editing. */
export function fitEntryFromPayload(payload: Readonly<Record<string, unknown>>): FitEntry {
  const ranges = Array.isArray(payload['ranges']) ? (payload['ranges'] as { tMin: number; tMax: number; coefficients?: number[]; points?: [number, number][] }[]) : [];
  return {
    form: (payload['form'] as FitForm | undefined) ?? 'shomate',
    ranges: ranges.map((range) => ({
      tMin: String(range.tMin),
      tMax: String(range.tMax),
      numbers: range.points ? range.points.map(([t, cp]) => `${t} ${cp}`).join('\n') : (range.coefficients ?? []).join(' '),
    })),
    pressurePa: payload['pressurePa'] === 101325 ? 101325 : 100000,
    method: (payload['method'] as ValueMethod | undefined) ?? null,
    levelOfTheory: typeof payload['levelOfTheory'] === 'string' ? payload['levelOfTheory'] : '',
    sourceLocator: typeof payload['sourceLocator'] === 'string' ? payload['sourceLocator'] : '',
    notes: typeof payload['notes'] === 'string' ? payload['notes'] : '',
  };
}
