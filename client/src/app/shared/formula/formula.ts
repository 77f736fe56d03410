import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

/** A run of a formula's text: plain, or a subscript count of atoms. */
export interface FormulaPart {
  readonly text: string;
  readonly subscript: boolean;
}

/**
 * Splits a chemical formula into plain text and subscript counts: a number right after an
 * element symbol or a closing bracket counts atoms (H2O → H, 2, O); a number elsewhere is a
 * multiplier and stays on the line (CuSO4·5H2O keeps the 5).
 */
export function formulaParts(formula: string): FormulaPart[] {
  const parts: FormulaPart[] = [];
  for (const match of formula.matchAll(/(\d+(?:\.\d+)?)|([^\d]+)/g)) {
    const digits = match[1];
    const previous = match.index === 0 ? '' : formula[match.index - 1];
    const counts = digits !== undefined && /[A-Za-z)\]]/.test(previous);
    const last = parts.at(-1);
    if (last && last.subscript === counts) {
      parts[parts.length - 1] = { text: last.text + match[0], subscript: counts };
    } else {
      parts.push({ text: match[0], subscript: counts });
    }
  }
  return parts;
}

/** The charge as chemists write it in a superscript: 2+, −, 3−; empty for a neutral species. */
export function chargeText(charge: number | null | undefined): string {
  if (!charge) {
    return '';
  }
  const size = Math.abs(charge) === 1 ? '' : String(Math.abs(charge));
  return `${size}${charge > 0 ? '+' : '−'}`;
}

/** A chemical formula with subscript atom counts and a superscript charge: `<kx-formula formula="H2O" />`. */
@Component({
  selector: 'kx-formula',
  template: `@for (part of parts(); track $index) {@if (part.subscript) {<sub>{{ part.text }}</sub>} @else {<span>{{ part.text }}</span>}}@if (charge()) {<sup>{{ charge() }}</sup>}`,
  styles: `
    :host {
      white-space: nowrap;
    }
    sub,
    sup {
      font-size: 0.75em;
      line-height: 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Formula {
  readonly formula = input.required<string>();
  readonly charge = input<string, number | null | undefined>('', { transform: chargeText });

  protected readonly parts = computed(() => formulaParts(this.formula()));
}
