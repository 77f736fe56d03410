import type { EntityManager } from 'typeorm';
import {
  checkEntropyPositive,
  checkFitReproducesReference,
  checkGibbsConsistency,
  checkHeatCapacityPositive,
  checkJointContinuity,
  checkPhaseEntropyOrder,
  checkPlausibleMagnitude,
  checkReferenceStateZero,
  checkSourceAgreement,
  checkStandardPressure,
  type CheckResult,
  type QuantityKind,
} from '../thermo/consistency-checks';
import type { PhaseState } from '../thermo/phase';
import { ThermoError } from '../thermo/errors';
import { findRelease } from '../releases/release-snapshot';
import { phaseLabel, type PhaseCode } from '../species/phase-code';
import type { FitRange } from '../values/fit-ranges';
import { QUANTITY_SYMBOLS, type Quantity, type TransitionKind, type UncertaintyKind } from '../values/value-vocabulary';
import { heatCapacityFunction } from './fit-function';
import { fitColumns, valueColumns } from './proposal-item-payloads';
import type { ResolvedItem } from './proposal-subjects';
import type { StoredCheckResult } from './proposal-vocabulary';

/**
 * The automatic consistency checks run on every item when a proposal is submitted (domain notes,
 * "Consistency checks a reviewer expects"). The engine does the judging; this module gathers what
 * each check compares with: every other source's value for the same species phase and quantity in
 * the latest published release and in other proposals still on their way (submitted … approved).
 */

/** Proposal states whose items count as pending data for comparisons. */
const PENDING_STATES = ['submitted', 'in_review', 'changes_requested', 'resubmitted', 'approved'];

/** Another source's value to compare with (SI). */
interface Comparable {
  speciesPhaseId: string;
  quantity: Quantity;
  transitionKind: TransitionKind | null;
  lineageId: string | null;
  sourceId: string;
  /** "codata-1989 (release 2026.2)" or "proposal «…»" */
  label: string;
  value: number;
  /** standard uncertainty u (0 when the source states none) */
  u: number;
  recommended: boolean;
  phase: PhaseCode;
  speciesId: string;
}

const standardU = (uSi: number | null, kind: UncertaintyKind | null, k: number | null) => (uSi === null ? 0 : kind === 'expanded' && k ? uSi / k : uSi);

function stored(result: CheckResult, extra: Record<string, unknown> = {}): StoredCheckResult {
  return {
    code: result.id,
    status: result.status === 'failure' ? 'fail' : result.status === 'warning' ? 'warn' : 'pass',
    message: result.message,
    details: { ...result.numbers, ...extra },
  };
}

const engineState = (phase: PhaseCode): PhaseState => (phase === 'aq,inf' ? 'aq' : phase);
const sameGroup = (c: Comparable, phaseId: string, quantity: Quantity, transition: TransitionKind | null) =>
  c.speciesPhaseId === phaseId && c.quantity === quantity && (c.transitionKind ?? null) === (transition ?? null);

/** Runs the checks on every resolved item; returns each item's results (an empty list for none). */
export async function runChecks(manager: EntityManager, proposalId: string, resolved: ResolvedItem[]): Promise<Map<string, StoredCheckResult[]>> {
  const release = await findRelease(manager);
  const speciesIds = [...new Set(resolved.map((r) => r.species?.id).filter((x): x is string => !!x))];
  const phaseIds = [...new Set(resolved.map((r) => r.phase?.id).filter((x): x is string => !!x))];

  const inRelease: Comparable[] = release && speciesIds.length > 0
    ? (await manager.query(
        `SELECT v.species_phase_id AS "speciesPhaseId", v.quantity, v.transition_kind AS "transitionKind", v.lineage_id AS "lineageId",
                v.source_id AS "sourceId", s.short_key AS "sourceKey", v.value_si AS value, v.uncertainty_si AS "uSi",
                v.uncertainty_kind AS "uKind", v.coverage_factor AS k, m.is_recommended AS recommended, sp.phase, sp.species_id AS "speciesId"
           FROM release_members m
           JOIN thermo_values v ON v.id = m.value_id
           JOIN species_phases sp ON sp.id = m.species_phase_id
           JOIN sources s ON s.id = v.source_id
          WHERE m.release_id = $1 AND sp.species_id = ANY($2::uuid[])`,
        [release.id, speciesIds],
      )).map((r: Record<string, unknown>) => ({
        ...(r as object),
        label: `${r.sourceKey} (release ${release.label})`,
        u: standardU(r.uSi as number | null, r.uKind as UncertaintyKind | null, r.k as number | null),
      }) as Comparable)
    : [];

  const pending: Comparable[] = [];
  if (phaseIds.length > 0) {
    const rows: Record<string, unknown>[] = await manager.query(
      `SELECT i.kind, i.payload, i.source_id AS "sourceId", s.short_key AS "sourceKey", p.title,
              coalesce(i.species_phase_id, tv.species_phase_id) AS "speciesPhaseId", tv.quantity AS "targetQuantity",
              tv.transition_kind AS "targetTransition", tv.lineage_id AS "lineageId", sp.phase, sp.species_id AS "speciesId"
         FROM proposal_items i
         JOIN proposals p ON p.id = i.proposal_id
         LEFT JOIN thermo_values tv ON tv.id = i.target_value_id
         LEFT JOIN sources s ON s.id = i.source_id
         JOIN species_phases sp ON sp.id = coalesce(i.species_phase_id, tv.species_phase_id)
        WHERE p.id <> $1 AND p.state = ANY($2::text[]) AND i.kind IN ('add_value', 'revise_value')
          AND coalesce(i.species_phase_id, tv.species_phase_id) = ANY($3::uuid[])`,
      [proposalId, PENDING_STATES, phaseIds],
    );
    for (const r of rows) {
      const payload = r.payload as Record<string, unknown>;
      const quantity = (r.kind === 'revise_value' ? r.targetQuantity : payload.quantity) as Quantity;
      if (!r.sourceId || !quantity) continue;
      try {
        const columns = valueColumns(payload, quantity);
        pending.push({
          speciesPhaseId: r.speciesPhaseId as string, quantity, transitionKind: (r.kind === 'revise_value' ? r.targetTransition : payload.transitionKind ?? null) as TransitionKind | null,
          lineageId: (r.lineageId as string | null) ?? null, sourceId: r.sourceId as string, label: `${r.sourceKey} (pending proposal «${r.title}»)`,
          value: columns.entry.valueSi, u: columns.entry.standardUncertaintySi ?? 0, recommended: false, phase: r.phase as PhaseCode, speciesId: r.speciesId as string,
        });
      } catch {
        // an unfinished item of another proposal: nothing to compare with
      }
    }
  }

  const needsElements = resolved.some((r) => r.quantity === 'dfG' && (r.item.kind === 'add_value' || r.item.kind === 'revise_value'));
  const elementEntropies = needsElements && release ? await referenceEntropies(manager, release.id) : new Map<string, { atoms: number; entropy: number }>();

  // This proposal's own numbers, for checks that combine several quantities of one phase.
  const own = new Map<string, number>();
  const phaseKey = (r: ResolvedItem) => r.phase?.id ?? `item:${r.phase?.itemId}`;
  for (const r of resolved) {
    if ((r.item.kind === 'add_value' || r.item.kind === 'revise_value') && r.problems.length === 0 && r.quantity && r.phase) {
      own.set(`${phaseKey(r)}|${r.quantity}`, valueColumns(r.item.payload, r.quantity).entry.valueSi);
    }
  }
  const recommendedInRelease = (phaseId: string | null | undefined, quantity: Quantity) =>
    phaseId ? inRelease.find((c) => c.speciesPhaseId === phaseId && c.quantity === quantity && c.recommended) : undefined;
  const numberFor = (r: ResolvedItem, quantity: Quantity) => own.get(`${phaseKey(r)}|${quantity}`) ?? recommendedInRelease(r.phase?.id, quantity)?.value;

  const results = new Map<string, StoredCheckResult[]>();
  for (const r of resolved) {
    try {
      results.set(r.item.id, r.problems.length > 0 ? [{ code: 'item-complete', status: 'fail', message: r.problems.map((p) => p.message).join('; ') }] : checksFor(r));
    } catch (error) {
      if (!(error instanceof ThermoError)) throw error;
      results.set(r.item.id, [{ code: 'engine-input', status: 'fail', message: `the checks could not run on this item: ${error.message}` }]);
    }
  }
  return results;

  function checksFor(r: ResolvedItem): StoredCheckResult[] {
    const species = r.species!;
    const phase = r.phase;
    const label = phase ? `${species.name}, ${species.hillFormula}(${phaseLabel(phase.phase, phase.polymorph)})` : species?.name ?? 'species';
    const atoms = Object.values(species?.composition ?? {}).reduce((a, b) => a + b, 0);
    switch (r.item.kind) {
      case 'add_species':
        return [{ code: 'formula', status: 'pass', message: `${species.formula} reads as ${species.hillFormula} (charge ${species.charge})`, details: { composition: species.composition } }];
      case 'add_phase':
        return [{ code: 'phase', status: 'pass', message: `${label}: new phase${phase?.isReferenceState ? ', marked as the reference state of the element' : ''}` }];
      case 'retire_value': {
        const target = r.targetValue!;
        const recommended = inRelease.find((c) => c.lineageId === target.lineageId && c.recommended);
        return [recommended
          ? { code: 'retires-recommended', status: 'warn', message: `${QUANTITY_SYMBOLS[target.quantity]} of ${label} is the recommended value in release ${release?.label}; the editor must recommend another value in the next release` }
          : { code: 'retirement', status: 'pass', message: `retires version ${target.versionNo} of ${QUANTITY_SYMBOLS[target.quantity]} of ${label}` }];
      }
      case 'recommend':
        return [{ code: 'recommend', status: 'pass', message: `asks the editor to recommend this ${r.targetFit ? 'fit' : 'value'} for ${label}` }];
      case 'add_fit':
      case 'replace_fit':
        return fitChecks(r, label);
      case 'add_value':
      case 'revise_value':
        return valueChecks(r, label, atoms);
    }
  }

  function valueChecks(r: ResolvedItem, label: string, atoms: number): StoredCheckResult[] {
    const quantity = r.quantity!;
    const phase = r.phase!;
    const columns = valueColumns(r.item.payload, quantity);
    const value = columns.entry.valueSi;
    const u = columns.entry.standardUncertaintySi ?? 0;
    const state = engineState(phase.phase);
    const symbol = QUANTITY_SYMBOLS[quantity];
    const out: StoredCheckResult[] = [];

    out.push(stored(checkStandardPressure({ label, pressure: columns.pressurePa, phase: state, entropy: quantity === 'S' ? value : undefined })));

    const ownLineage = r.targetValue?.lineageId ?? null;
    const others = phase.id
      ? [...inRelease, ...pending].filter((c) => sameGroup(c, phase.id!, quantity, r.transitionKind ?? null) && c.sourceId !== r.item.sourceId && (ownLineage === null || c.lineageId !== ownLineage))
      : [];

    const kind: QuantityKind | undefined = quantity === 'dfH' ? 'formationEnthalpy' : quantity === 'S' ? 'entropy' : quantity === 'Cp' ? 'heatCapacity' : undefined;
    if (kind) {
      const reference = others.find((c) => c.recommended) ?? others[0];
      out.push(stored(checkPlausibleMagnitude({ label, kind, value, phase: state, atoms, reference: reference?.value, referenceSource: reference?.label })));
    }
    if ((quantity === 'dfH' || quantity === 'dfG') && phase.isReferenceState) {
      out.push(stored(quantity === 'dfH'
        ? checkReferenceStateZero({ label, formationEnthalpy: value })
        : checkReferenceStateZero({ label, formationEnthalpy: numberFor(r, 'dfH') ?? 0, formationGibbsEnergy: value })));
    }
    if (quantity === 'S') {
      out.push(stored(checkEntropyPositive({ label, entropy: value })));
      const byPhase: Partial<Record<'gas' | 'liquid' | 'crystal', number>> = {};
      const slot = (p: PhaseCode) => (p === 'g' ? 'gas' : p === 'l' ? 'liquid' : p === 'cr' ? 'crystal' : undefined);
      if (r.species?.id && Math.abs(columns.temperatureK - 298.15) < 1e-6) {
        for (const c of inRelease) {
          const s = slot(c.phase);
          if (s && c.quantity === 'S' && c.recommended && c.speciesId === r.species!.id && c.speciesPhaseId !== phase.id) byPhase[s] ??= c.value;
        }
        const mine = slot(phase.phase);
        if (mine && Object.keys(byPhase).length > 0) {
          byPhase[mine] = value;
          out.push(stored(checkPhaseEntropyOrder({ label: r.species!.name, temperature: 298.15, ...byPhase })));
        }
      }
    }
    if (quantity === 'Cp') {
      out.push(stored(checkHeatCapacityPositive({
        label, idealGas: phase.phase === 'g',
        heatCapacity: { kind: 'constant', cp: value, tMin: columns.temperatureK * 0.999, tMax: columns.temperatureK * 1.001 },
        entropy: numberFor(r, 'S') ?? 0,
      })));
    }
    if (quantity === 'dfG') {
      const dfH = numberFor(r, 'dfH');
      const s = numberFor(r, 'S');
      const elements = Object.entries(r.species!.composition).map(([el, n]) => {
        const ref = elementEntropies.get(el);
        return ref ? { n: n / ref.atoms, entropy: ref.entropy } : undefined;
      });
      if (dfH !== undefined && s !== undefined && elements.every((e) => e !== undefined)) {
        out.push(stored(checkGibbsConsistency({ label, temperature: columns.temperatureK, formationEnthalpy: dfH, formationGibbsEnergy: value, entropy: s, elementEntropies: elements as { n: number; entropy: number }[] })));
      }
    }

    if (r.targetValue && r.item.kind === 'revise_value') {
      const previous = r.targetValue;
      const result = checkSourceAgreement({
        quantity: symbol, value: { value, uncertainty: u }, other: { value: previous.valueSi, uncertainty: standardU(previous.uncertaintySi, previous.uncertaintyKind, previous.coverageFactor) },
        otherSource: `version ${previous.versionNo} of this value`,
      });
      out.push({ ...stored(result, { previousValueId: previous.id }), code: 'previous-version' });
    }
    if (!phase.id) {
      out.push({ code: 'source-agreement', status: 'pass', message: `${label} is new in the catalogue: no other source to compare with` });
    } else if (others.length === 0) {
      out.push({ code: 'source-agreement', status: 'warn', message: `No other source holds ${symbol} of ${label} yet: nothing to compare with` });
    } else {
      for (const other of others) {
        out.push(stored(checkSourceAgreement({ quantity: symbol, value: { value, uncertainty: u }, other: { value: other.value, uncertainty: other.u }, otherSource: other.label }), { otherSource: other.label }));
      }
    }
    return out;
  }

  function fitChecks(r: ResolvedItem, label: string): StoredCheckResult[] {
    const columns = fitColumns(r.item.payload);
    const fn = heatCapacityFunction(columns.form, columns.ranges as FitRange[]);
    const out: StoredCheckResult[] = [];
    out.push(stored(checkStandardPressure({ label, pressure: columns.pressurePa, phase: engineState(r.phase!.phase) })));
    if (!fn) {
      out.push({ code: 'fit-form', status: 'warn', message: `a ${columns.form} fit over several ranges cannot be checked by the engine` });
      return out;
    }
    const entropy = numberFor(r, 'S');
    out.push(stored(checkHeatCapacityPositive({ label, heatCapacity: fn, idealGas: r.phase!.phase === 'g', entropy })));
    out.push(stored(checkJointContinuity({ label, heatCapacity: fn })));
    const dfH = numberFor(r, 'dfH');
    if (dfH !== undefined && entropy !== undefined) {
      const uOf = (q: Quantity) => recommendedInRelease(r.phase?.id, q)?.u ?? 0;
      out.push(stored(checkFitReproducesReference({ label, heatCapacity: fn, formationEnthalpy: { value: dfH, uncertainty: uOf('dfH') }, entropy: { value: entropy, uncertainty: uOf('S') } })));
    } else {
      out.push({ code: 'fit-reproduces-reference', status: 'warn', message: `${label} has no ΔfH° and S° at 298.15 K to compare the fit with` });
    }
    return out;
  }
}


/**
 * S°(298.15 K) of each element's reference state in a release (recommended values of phases
 * marked as reference states of one-element species), per formula unit of the reference species.
 */
async function referenceEntropies(manager: EntityManager, releaseId: string): Promise<Map<string, { atoms: number; entropy: number }>> {
  const rows: { composition: Record<string, number>; entropy: number }[] = await manager.query(
    `SELECT s.composition, v.value_si AS entropy
       FROM release_members m
       JOIN thermo_values v ON v.id = m.value_id
       JOIN species_phases sp ON sp.id = m.species_phase_id
       JOIN species s ON s.id = sp.species_id
      WHERE m.release_id = $1 AND m.is_recommended AND m.quantity = 'S' AND sp.is_reference_state`,
    [releaseId],
  );
  const map = new Map<string, { atoms: number; entropy: number }>();
  for (const r of rows) {
    const elements = Object.entries(r.composition);
    if (elements.length === 1) map.set(elements[0][0], { atoms: elements[0][1], entropy: r.entropy });
  }
  return map;
}

/** True when any stored result failed: approval then needs a justification. */
export function hasFailedCheck(checks: (StoredCheckResult[] | null)[]): boolean {
  return checks.some((list) => (list ?? []).some((c) => c.status === 'fail'));
}
