import { AbstractControl, ValidationErrors } from '@angular/forms';

/** Most temperatures one table, plot or reaction evaluation asks the API for. */
export const MAX_TEMPERATURES = 200;

/** The standard reference temperature, K. */
export const REFERENCE_TEMPERATURE = 298.15;

/**
 * A round step (1, 2, 2.5 or 5 × 10ⁿ K) that divides `span` K into about `points` intervals,
 * for plots that should be smooth without asking for thousands of points.
 */
export function niceStep(span: number, points: number): number {
  const raw = span / Math.max(1, points);
  const power = 10 ** Math.floor(Math.log10(raw));
  const multiple = [1, 2, 2.5, 5, 10].find((m) => m * power >= raw) ?? 10;
  return multiple * power;
}

/**
 * Temperatures (K) from `tMin` to `tMax`: both ends, and between them the round multiples of
 * `step`. A multiple closer than half a step to an end is left out, so 298.15 K is followed by
 * 400 K, not by 300 K. Values are rounded to 0.01 K to keep floating-point noise out of URLs.
 */
export function temperatureList(tMin: number, tMax: number, step: number): number[] {
  if (!(tMax > tMin) || !(step > 0)) {
    return [round(tMin)];
  }
  const list = [round(tMin)];
  for (let multiple = Math.ceil((tMin + step / 2) / step) * step; multiple <= tMax - step / 2; multiple += step) {
    list.push(round(multiple));
  }
  list.push(round(tMax));
  return list;
}

function round(kelvin: number): number {
  return Math.round(kelvin * 100) / 100;
}

/**
 * On a form group with `tMin`, `tMax` and `tStep` controls (K): the range must not run backwards
 * and must not give more than MAX_TEMPERATURES temperatures. The error's value is the sentence to show.
 */
export function temperatureRangeRules(group: AbstractControl): ValidationErrors | null {
  const { tMin, tMax, tStep } = group.value as { tMin: number; tMax: number; tStep: number };
  if (!(tMax >= tMin)) {
    return { range: 'The highest temperature must not be below the lowest.' };
  }
  if (tStep > 0 && temperatureList(tMin, tMax, tStep).length > MAX_TEMPERATURES) {
    return { range: `That gives more than ${MAX_TEMPERATURES} temperatures; choose a larger step.` };
  }
  return null;
}
