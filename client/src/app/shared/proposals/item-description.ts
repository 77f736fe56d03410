import {
  FitForm,
  METHODS,
  QuantityCode,
  STANDARD_PRESSURES,
  TransitionKind,
  phaseText,
  quantitySymbol,
} from '../vocabulary/thermo-vocabulary';
import { ITEM_KIND_LABELS, ItemPayload, ProposalItem } from './proposal';

/** An item in words: what it is, what it is about, and its numbers as entered. */
export interface ItemDescription {
  /** e.g. "New value". */
  readonly kind: string;
  /** e.g. "ΔfH°(l) of propan-1-ol". */
  readonly subject: string;
  /** e.g. "-302.6 ± 0.4 kJ/mol (expanded, k = 2) at 298.15 K, 1 bar, measured". */
  readonly detail: string;
  /** The value as entered, for side-by-side comparisons; null for items without one. */
  readonly enteredValue: string | null;
}

/** Species names by id, for items that name a catalogue species by its id only. */
export type SpeciesNames = ReadonlyMap<string, string>;

/**
 * Describes an item from its payload (api/src/proposals/proposal-item-payloads.ts documents the
 * fields of each kind). Numbers are shown as the steward typed them, with their unit.
 */
export function describeItem(item: Pick<ProposalItem, 'kind' | 'payload'>, names: SpeciesNames = new Map()): ItemDescription {
  const p = item.payload;
  const kind = ITEM_KIND_LABELS[item.kind];
  switch (item.kind) {
    case 'add_species': {
      const identifiers = [text(p, 'casRn') && `CAS RN ${text(p, 'casRn')}`, text(p, 'inchikey') && `InChIKey ${text(p, 'inchikey')}`].filter(Boolean);
      return { kind, subject: `${text(p, 'name') ?? 'unnamed'} (${text(p, 'formula') ?? 'no formula'})`, detail: identifiers.join(', '), enteredValue: null };
    }
    case 'add_phase':
      return {
        kind,
        subject: `${speciesName(p, names)} (${phaseText(text(p, 'phase') ?? '?', text(p, 'polymorph'))})`,
        detail: p['isReferenceState'] === true ? 'reference state of the element' : '',
        enteredValue: null,
      };
    case 'add_value': {
      const quantity = text(p, 'quantity') as QuantityCode | null;
      const symbol = quantity ? quantitySymbol(quantity, text(p, 'transitionKind') as TransitionKind | null) : 'value';
      return { kind, subject: `${symbol}(${subjectPhase(p)}) of ${speciesName(p, names)}`, detail: valueDetail(p), enteredValue: enteredValue(p) };
    }
    case 'revise_value':
      return { kind, subject: `new version of value ${shortId(text(p, 'valueId'))}`, detail: valueDetail(p), enteredValue: enteredValue(p) };
    case 'retire_value':
      return { kind, subject: `value ${shortId(text(p, 'valueId'))}`, detail: `Reason: ${text(p, 'reason') ?? 'none given'}`, enteredValue: null };
    case 'add_fit':
      return { kind, subject: `Cp°(T) (${subjectPhase(p)}) of ${speciesName(p, names)}`, detail: fitDetail(p), enteredValue: null };
    case 'replace_fit':
      return { kind, subject: `new version of fit ${shortId(text(p, 'fitId'))}`, detail: fitDetail(p), enteredValue: null };
    case 'recommend': {
      const target = text(p, 'valueId') ? `value ${shortId(text(p, 'valueId'))}` : `fit ${shortId(text(p, 'fitId'))}`;
      return { kind, subject: `make ${target} the recommended one`, detail: text(p, 'note') ?? '', enteredValue: null };
    }
  }
}

/** `-302.6 ± 0.4 kJ/mol`, as typed. */
export function enteredValue(p: ItemPayload): string | null {
  const value = text(p, 'value');
  if (value === null) {
    return null;
  }
  const uncertainty = text(p, 'uncertainty');
  const unit = text(p, 'unit') ?? '';
  return `${value}${uncertainty !== null ? ` ± ${uncertainty}` : ''} ${unit}`.trim();
}

function valueDetail(p: ItemPayload): string {
  const parts: string[] = [enteredValue(p) ?? 'no value'];
  if (text(p, 'uncertainty') !== null) {
    parts[0] += p['uncertaintyKind'] === 'expanded' ? ` (expanded, k = ${text(p, 'coverageFactor') ?? '?'})` : ' (standard)';
  }
  parts.push(`${text(p, 'temperatureK') ?? '298.15'} K`);
  const pressure = STANDARD_PRESSURES.find((choice) => choice.value === Number(p['pressurePa']));
  parts.push(pressure ? pressure.label.split(' (')[0] : 'no standard pressure');
  const method = METHODS.find((choice) => choice.value === p['method'])?.label;
  if (method) {
    parts.push(text(p, 'levelOfTheory') ? `${method}, ${text(p, 'levelOfTheory')}` : method);
  }
  if (text(p, 'sourceLocator')) {
    parts.push(text(p, 'sourceLocator')!);
  }
  return parts.join(', ');
}

function fitDetail(p: ItemPayload): string {
  const form = text(p, 'form') as FitForm | null;
  const ranges = Array.isArray(p['ranges']) ? p['ranges'].length : 0;
  return `${form ?? 'no form'}, ${text(p, 'tMin') ?? '?'}–${text(p, 'tMax') ?? '?'} K, ${ranges} range${ranges === 1 ? '' : 's'}`;
}

function subjectPhase(p: ItemPayload): string {
  return text(p, 'phase') ? phaseText(text(p, 'phase')!, text(p, 'polymorph')) : 'phase by id';
}

function speciesName(p: ItemPayload, names: SpeciesNames): string {
  const id = text(p, 'speciesId');
  return text(p, 'species') ?? (id ? names.get(id) ?? `species ${shortId(id)}` : 'a species');
}

function shortId(id: string | null): string {
  return id ? id.slice(0, 8) : '?';
}

function text(p: ItemPayload, key: string): string | null {
  const value = p[key];
  if (typeof value === 'number') {
    return String(value);
  }
  return typeof value === 'string' && value.trim() !== '' ? value.trim() : null;
}
