import { CatalogueSpecies, valuesOf } from '../shared/catalogue/catalogue-api';
import { convertFromSi } from '../shared/unit-selector/molar-energy-unit';
import { PhaseCode, QuantityCode, TransitionKind, phaseText, quantitySymbol } from '../shared/vocabulary/thermo-vocabulary';
import { RecommendationGap, ReleaseWorkspace } from './releases-api';

/** One candidate for the recommended member of a group, shown side by side with the others. */
export interface Candidate {
  readonly kind: 'value' | 'fit';
  readonly id: string;
  readonly recommended: boolean;
  /** kJ/mol or J/(mol·K) for values; the form and range for fits. */
  readonly value: number | null;
  readonly uncertainty: number | null;
  readonly unit: string;
  readonly uncertaintyText: string;
  readonly description: string;
  readonly sourceKey: string;
  readonly citation: string;
  readonly method: string;
}

/** A species phase and quantity with several members (sources disagree) or without one recommended member. */
export interface RecommendationGroup {
  readonly key: string;
  readonly speciesPhaseId: string;
  readonly speciesId: string;
  readonly speciesName: string;
  /** e.g. "ΔfH°(l)". */
  readonly label: string;
  readonly quantity: QuantityCode;
  readonly candidates: readonly Candidate[];
  /** True when the group has no single recommended member: publishing waits for a choice. */
  readonly needsChoice: boolean;
}

/** Where each changed or incomplete species phase lives: its id by species, phase and polymorph. */
export function speciesPhaseIds(workspace: ReleaseWorkspace): Map<string, string> {
  const ids = new Map<string, string>();
  for (const species of workspace.changeLog.species) {
    for (const entry of [...species.added, ...species.revised, ...species.retired, ...species.removed, ...species.recommendation]) {
      ids.set(phaseKey(species.speciesId, entry.phase, entry.polymorph), entry.speciesPhaseId);
    }
  }
  return ids;
}

export function phaseKey(speciesId: string, phase: string, polymorph: string | null): string {
  return `${speciesId}|${phase}|${polymorph ?? ''}`;
}

/**
 * The groups the editor decides on among `records` (species as the release in preparation holds
 * them): every phase and quantity with two or more members, or one the API lists as lacking a
 * single recommended member. Only phases whose id the workspace names can be chosen for.
 */
export function recommendationGroups(records: readonly CatalogueSpecies[], phaseIds: ReadonlyMap<string, string>, gaps: readonly RecommendationGap[]): RecommendationGroup[] {
  const groups: RecommendationGroup[] = [];
  for (const record of records) {
    for (const phase of record.phases) {
      const speciesPhaseId = phaseIds.get(phaseKey(record.id, phase.phase, phase.polymorph)) ?? gaps.find((g) => g.speciesName === record.name && g.phase === phase.phase && (g.polymorph ?? null) === (phase.polymorph ?? null))?.speciesPhaseId;
      if (!speciesPhaseId) {
        continue;
      }
      for (const quantity of phase.quantities) {
        const values = valuesOf(quantity);
        const gap = gaps.some((g) => g.speciesPhaseId === speciesPhaseId && g.memberKind === 'value' && g.quantity === quantity.quantity && (g.transitionKind ?? null) === (quantity.transitionKind ?? null));
        if (values.length < 2 && !gap) {
          continue;
        }
        groups.push({
          key: `${speciesPhaseId}|${quantity.quantity}|${quantity.transitionKind ?? ''}`,
          speciesPhaseId,
          speciesId: record.id,
          speciesName: record.name,
          label: `${quantitySymbol(quantity.quantity, quantity.transitionKind as TransitionKind | null)}(${phaseText(phase.phase as PhaseCode, phase.polymorph)})`,
          quantity: quantity.quantity,
          needsChoice: gap,
          candidates: values.map((value) => {
            const shown = convertFromSi(value.value, value.unit, 'kJ/mol');
            return {
              kind: 'value' as const,
              id: value.id,
              recommended: quantity.recommended?.id === value.id,
              value: shown.value,
              uncertainty: value.uncertainty === null ? null : convertFromSi(value.uncertainty, value.unit, 'kJ/mol').value,
              unit: shown.unit,
              uncertaintyText:
                value.uncertainty === null ? 'none stated' : value.uncertaintyKind === 'expanded' ? `expanded U, k = ${value.coverageFactor}` : 'standard u',
              description: `${value.temperature} K, ${value.pressure === 101325 ? '1 atm' : '1 bar'}`,
              sourceKey: value.source.key,
              citation: value.source.citation,
              method: value.methodDetail ? `${value.method}, ${value.methodDetail}` : value.method,
            };
          }),
        });
      }
      const fitGap = gaps.some((g) => g.speciesPhaseId === speciesPhaseId && g.memberKind === 'fit');
      if (phase.fits.length >= 2 || fitGap) {
        groups.push({
          key: `${speciesPhaseId}|fit`,
          speciesPhaseId,
          speciesId: record.id,
          speciesName: record.name,
          label: `Cp°(T) fit (${phaseText(phase.phase as PhaseCode, phase.polymorph)})`,
          quantity: 'Cp',
          needsChoice: fitGap,
          candidates: phase.fits.map((fit) => ({
            kind: 'fit' as const,
            id: fit.id,
            recommended: fit.recommended,
            value: null,
            uncertainty: null,
            unit: '',
            uncertaintyText: '',
            description: `${fit.form}, ${fit.tMin}–${fit.tMax} K`,
            sourceKey: fit.source.key,
            citation: fit.source.citation,
            method: '',
          })),
        });
      }
    }
  }
  return groups;
}
