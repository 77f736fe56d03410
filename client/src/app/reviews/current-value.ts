import { CatalogueSpecies, CatalogueValue, findPhase, valuesOf } from '../shared/catalogue/catalogue-api';
import { ProposalItem } from '../shared/proposals/proposal';
import { QuantityCode, TransitionKind } from '../shared/vocabulary/thermo-vocabulary';

/** What the latest release holds that an item would change: the value it revises or retires, or the recommended one it competes with. */
export interface CurrentValue {
  readonly value: CatalogueValue;
  readonly recommended: boolean;
  /** How the item relates to it. */
  readonly relation: 'revises' | 'retires' | 'recommended now';
  /** Other values of the same species phase and quantity. */
  readonly others: number;
}

/** The species whose record an item needs for the comparison: resolved at submission, or named in its payload. */
export function speciesIdOf(item: Pick<ProposalItem, 'speciesId' | 'payload'>): string | null {
  const named = item.payload['speciesId'];
  return item.speciesId ?? (typeof named === 'string' ? named : null);
}

/**
 * The current value an item stands against in `record` (the species in the latest release):
 * for a revision or retirement the targeted value; for a new value the recommended value of the
 * same species phase and quantity, if any.
 */
export function currentValueFor(item: Pick<ProposalItem, 'kind' | 'payload'>, record: CatalogueSpecies | null): CurrentValue | null {
  if (!record) {
    return null;
  }
  if (item.kind === 'revise_value' || item.kind === 'retire_value') {
    const id = item.payload['valueId'];
    for (const phase of record.phases) {
      for (const quantity of phase.quantities) {
        const values = valuesOf(quantity);
        const value = values.find((v) => v.id === id);
        if (value) {
          return {
            value,
            recommended: quantity.recommended?.id === value.id,
            relation: item.kind === 'revise_value' ? 'revises' : 'retires',
            others: values.length - 1,
          };
        }
      }
    }
    return null;
  }
  if (item.kind === 'add_value') {
    const p = item.payload;
    const phase = typeof p['phase'] === 'string' ? findPhase(record, p['phase'], (p['polymorph'] as string | undefined) ?? null) : undefined;
    const quantity = phase?.quantities.find(
      (q) => q.quantity === (p['quantity'] as QuantityCode) && (q.quantity !== 'dtrsH' || q.transitionKind === (p['transitionKind'] as TransitionKind)),
    );
    if (!quantity?.recommended) {
      return null;
    }
    return { value: quantity.recommended, recommended: true, relation: 'recommended now', others: quantity.alternatives.length };
  }
  return null;
}
