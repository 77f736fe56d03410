import { convertFromSi } from '../shared/unit-selector/molar-energy-unit';
import { phaseText, quantitySymbol } from '../shared/vocabulary/thermo-vocabulary';
import { ChangeEntry, MemberSnapshot } from './releases-api';

/** A change-log line ready to show: what, how it changed, and the two versions in words. */
export interface ChangeRow {
  readonly speciesId: string;
  readonly species: string;
  readonly formula: string;
  /** e.g. "ΔfH°(l)" or "Cp°(T) fit (g)". */
  readonly what: string;
  readonly change: ChangeEntry['change'];
  /** e.g. "new version", "now recommended". */
  readonly reason: string;
  readonly before: string;
  readonly after: string;
}

/** A version in words: `-302.6 ± 0.4 kJ/mol (qpc-tc03-2025, recommended)`; fits by form and range. */
export function snapshotText(snapshot: MemberSnapshot | null): string {
  if (!snapshot) {
    return '—';
  }
  const note = `${snapshot.source}${snapshot.recommended ? ', recommended' : ''}`;
  if (snapshot.kind === 'fit') {
    return `${snapshot.form} fit ${snapshot.tMin}–${snapshot.tMax} K (${note})`;
  }
  const value = convertFromSi(snapshot.value, snapshot.unit, 'kJ/mol');
  const uncertainty = snapshot.uncertainty === null ? null : convertFromSi(snapshot.uncertainty, snapshot.unit, 'kJ/mol').value;
  return `${trim(value.value)}${uncertainty === null ? '' : ` ± ${trim(uncertainty)}`} ${value.unit} (${note})`;
}

/** The change log as rows, in the API's order (by formula, species, phase and quantity). */
export function changeRows(entries: readonly ChangeEntry[]): ChangeRow[] {
  return entries.map((entry) => ({
    speciesId: entry.speciesId,
    species: entry.name,
    formula: entry.formula,
    what:
      entry.kind === 'fit'
        ? `Cp°(T) fit (${phaseText(entry.phase, entry.polymorph)})`
        : `${quantitySymbol(entry.quantity, entry.transitionKind)}(${phaseText(entry.phase, entry.polymorph)})`,
    change: entry.change,
    reason: entry.reason,
    before: snapshotText(entry.before),
    after: snapshotText(entry.after),
  }));
}

/** Up to 6 significant digits, without trailing zeros. */
function trim(value: number): string {
  return String(Number(value.toPrecision(6)));
}
