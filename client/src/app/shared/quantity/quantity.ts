import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { roundToUncertainty } from './round-to-uncertainty';

const SUPERSCRIPT_DIGITS: Record<string, string> = {
  '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹',
};

/**
 * A value with its uncertainty and unit in one right-aligned cell, e.g. `-241.83 ± 0.04 kJ/mol`,
 * rounded as `roundToUncertainty` describes. A missing value shows as a dash.
 */
@Component({
  selector: 'kx-quantity',
  templateUrl: './quantity.html',
  styleUrl: './quantity.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { class: 'kx-numeric' },
})
export class Quantity {
  readonly value = input.required<number | null>();
  readonly uncertainty = input<number | null | undefined>(null);
  readonly unit = input<string>('');

  protected readonly text = computed(() => quantityText(this.value(), this.uncertainty()));
}

/**
 * A value and its uncertainty as one string, rounded as `roundToUncertainty` describes, with a
 * shared power of ten where needed: `-241.826 ± 0.042`, `(1.235 ± 0.032) × 10⁻⁵`. Null for no value.
 */
export function quantityText(value: number | null, uncertainty: number | null | undefined): string | null {
  if (value === null) {
    return null;
  }
  const rounded = roundToUncertainty(value, uncertainty);
  const number = rounded.uncertainty === null ? rounded.value : `${rounded.value} ± ${rounded.uncertainty}`;
  if (rounded.exponent === null) {
    return number;
  }
  const power = `10${[...String(rounded.exponent)].map((c) => SUPERSCRIPT_DIGITS[c]).join('')}`;
  return rounded.uncertainty === null ? `${number} × ${power}` : `(${number}) × ${power}`;
}
