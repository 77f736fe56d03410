import type { EntityManager } from 'typeorm';
import { T_REF } from '../thermo/constants';
import { reactionAt, type ReactionParticipant } from '../thermo/reaction-thermo';
import { findRelease } from '../releases/release-snapshot';
import type { Quantity, UncertaintyKind } from '../values/value-vocabulary';
import { valueColumns } from './proposal-item-payloads';

/**
 * What a proposal's revisions would change for the people using the data: for each revised or
 * retired value, the saved reactions that use its species phase, with ΔrH° and ΔrG° at 298.15 K
 * from the latest release's recommended values before and after the change (engine:
 * reaction-thermo, Hess's law, ΔrG° = ΔrH° − T·ΔrS°), and how many people watch the species.
 * All energies in J/mol.
 */

interface Term {
  reactionId: string;
  speciesPhaseId: string;
  coefficient: number;
  composition: Record<string, number>;
  label: string;
  isReferenceState: boolean;
}

interface Recommended {
  value: number;
  u: number;
  lineageId: string;
}

export interface ReactionChange {
  old: number | null;
  new: number | null;
  change: number | null;
}

const u = (uSi: number | null, kind: UncertaintyKind | null, k: number | null) => (uSi === null ? 0 : kind === 'expanded' && k ? uSi / k : uSi);

export async function proposalImpact(manager: EntityManager, proposalId: string) {
  const release = await findRelease(manager);
  const items: Record<string, unknown>[] = await manager.query(
    `SELECT i.id, i.position, i.kind, i.payload, v.id AS "valueId", v.lineage_id AS "lineageId", v.species_phase_id AS "speciesPhaseId", v.quantity,
            v.value_si AS "valueSi", v.uncertainty_si AS "uncertaintySi", v.uncertainty_kind AS "uncertaintyKind", v.coverage_factor AS "coverageFactor",
            v.entered_value AS "enteredValue", v.entered_unit AS "enteredUnit",
            sp.phase, sp.polymorph, s.id AS "speciesId", s.name AS "speciesName", s.hill_formula AS "hillFormula"
       FROM proposal_items i
       JOIN thermo_values v ON v.id = i.target_value_id
       JOIN species_phases sp ON sp.id = v.species_phase_id
       JOIN species s ON s.id = sp.species_id
      WHERE i.proposal_id = $1 AND i.kind IN ('revise_value', 'retire_value')
      ORDER BY i.position`,
    [proposalId],
  );
  if (items.length === 0) return { release: release?.label ?? null, temperatureK: T_REF, items: [] };

  const phaseIds = [...new Set(items.map((i) => i.speciesPhaseId as string))];
  const reactions: { id: string; name: string; equation: string; owner: string; pinnedRelease: string | null }[] = await manager.query(
    `SELECT DISTINCT sr.id, sr.name, sr.equation, u.display_name AS owner, pr.label AS "pinnedRelease"
       FROM saved_reactions sr JOIN saved_reaction_terms t ON t.saved_reaction_id = sr.id JOIN users u ON u.id = sr.user_id
       LEFT JOIN releases pr ON pr.id = sr.pinned_release_id
      WHERE t.species_phase_id = ANY($1::uuid[])`,
    [phaseIds],
  );
  const terms: Term[] = reactions.length === 0 ? [] : await manager.query(
    `SELECT t.saved_reaction_id AS "reactionId", t.species_phase_id AS "speciesPhaseId", t.coefficient, s.composition,
            s.hill_formula || '(' || sp.phase || coalesce(', ' || sp.polymorph, '') || ')' AS label, sp.is_reference_state AS "isReferenceState"
       FROM saved_reaction_terms t JOIN species_phases sp ON sp.id = t.species_phase_id JOIN species s ON s.id = sp.species_id
      WHERE t.saved_reaction_id = ANY($1::uuid[])`,
    [reactions.map((r) => r.id)],
  );
  const recommended = new Map<string, Recommended>();
  if (release && terms.length > 0) {
    const rows: Record<string, unknown>[] = await manager.query(
      `SELECT m.species_phase_id AS "speciesPhaseId", m.quantity, m.lineage_id AS "lineageId", v.value_si AS "valueSi", v.uncertainty_si AS "uncertaintySi",
              v.uncertainty_kind AS "uncertaintyKind", v.coverage_factor AS "coverageFactor"
         FROM release_members m JOIN thermo_values v ON v.id = m.value_id
        WHERE m.release_id = $1 AND m.is_recommended AND m.quantity IN ('dfH', 'S') AND m.species_phase_id = ANY($2::uuid[])`,
      [release.id, [...new Set(terms.map((t) => t.speciesPhaseId))]],
    );
    for (const r of rows) {
      recommended.set(`${r.speciesPhaseId}|${r.quantity}`, {
        value: r.valueSi as number, u: u(r.uncertaintySi as number | null, r.uncertaintyKind as UncertaintyKind | null, r.coverageFactor as number | null), lineageId: r.lineageId as string,
      });
    }
  }
  const watchers: { speciesId: string; n: number }[] = await manager.query(
    `SELECT species_id AS "speciesId", count(*)::int AS n FROM watches WHERE species_id = ANY($1::uuid[]) GROUP BY species_id`,
    [[...new Set(items.map((i) => i.speciesId as string))]],
  );

  return {
    release: release?.label ?? null,
    temperatureK: T_REF,
    items: items.map((i) => {
      const quantity = i.quantity as Quantity;
      const next = i.kind === 'revise_value' ? safeColumns(i.payload as Record<string, unknown>, quantity) : null;
      const groupKey = `${i.speciesPhaseId}|${quantity}`;
      const isRecommended = recommended.get(groupKey)?.lineageId === i.lineageId;
      const override = new Map<string, Recommended | null>();
      if (isRecommended && (quantity === 'dfH' || quantity === 'S')) {
        override.set(groupKey, next ? { value: next.value, u: next.u, lineageId: i.lineageId as string } : null);
      }
      const used = reactions.filter((r) => terms.some((t) => t.reactionId === r.id && t.speciesPhaseId === i.speciesPhaseId));
      return {
        itemId: i.id,
        position: i.position,
        kind: i.kind,
        species: { id: i.speciesId, name: i.speciesName, hillFormula: i.hillFormula },
        phase: i.phase,
        polymorph: i.polymorph,
        quantity,
        old: { valueId: i.valueId, valueSi: i.valueSi, uncertaintySi: i.uncertaintySi, enteredValue: i.enteredValue, enteredUnit: i.enteredUnit },
        new: next ? { valueSi: next.value, uncertaintySi: next.uncertaintySi, enteredValue: next.enteredValue, enteredUnit: next.enteredUnit } : null,
        recommendedInRelease: isRecommended,
        watcherCount: watchers.find((w) => w.speciesId === i.speciesId)?.n ?? 0,
        savedReactions: used.map((r) => {
          const mine = terms.filter((t) => t.reactionId === r.id);
          const before = evaluate(mine, recommended, new Map());
          const after = evaluate(mine, recommended, override);
          const note = !isRecommended
            ? `this value is not the recommended one in release ${release?.label}; reactions computed with recommended values do not change`
            : quantity !== 'dfH' && quantity !== 'S'
              ? `${quantity} does not enter ΔrH° or ΔrG° at 298.15 K`
              : before.reason ?? after.reason ?? null;
          return {
            id: r.id, name: r.name, equation: r.equation, owner: r.owner, pinnedRelease: r.pinnedRelease,
            deltaH: diff(before.deltaH, after.deltaH), deltaG: diff(before.deltaG, after.deltaG), note,
          };
        }),
      };
    }),
  };
}

function safeColumns(payload: Record<string, unknown>, quantity: Quantity) {
  try {
    const c = valueColumns(payload, quantity);
    return { value: c.entry.valueSi, u: c.entry.standardUncertaintySi ?? 0, uncertaintySi: c.entry.uncertaintySi, enteredValue: c.entry.enteredValue, enteredUnit: c.entry.enteredUnit };
  } catch {
    return null;
  }
}

const diff = (before: number | null, after: number | null): ReactionChange => ({
  old: before,
  new: after,
  change: before !== null && after !== null ? after - before : null,
});

/** ΔrH° and ΔrG° at 298.15 K / (J/mol) with the given values; null (with the reason) when a value is missing. */
function evaluate(terms: Term[], recommended: Map<string, Recommended>, override: Map<string, Recommended | null>): { deltaH: number | null; deltaG: number | null; reason?: string } {
  const pick = (phaseId: string, q: 'dfH' | 'S') => (override.has(`${phaseId}|${q}`) ? override.get(`${phaseId}|${q}`) ?? undefined : recommended.get(`${phaseId}|${q}`));
  const missingH = terms.filter((t) => !pick(t.speciesPhaseId, 'dfH') && !t.isReferenceState);
  if (missingH.length > 0) return { deltaH: null, deltaG: null, reason: `no recommended ΔfH° for ${missingH.map((t) => t.label).join(', ')}` };
  const missingS = terms.filter((t) => !pick(t.speciesPhaseId, 'S'));
  const participants: ReactionParticipant[] = terms.map((t) => {
    const h = pick(t.speciesPhaseId, 'dfH');
    const s = pick(t.speciesPhaseId, 'S');
    return {
      nu: t.coefficient,
      data: {
        label: t.label,
        elements: t.composition,
        formationEnthalpy: h ? { value: h.value, uncertainty: h.u } : { value: 0, uncertainty: 0 },
        entropy: s ? { value: s.value, uncertainty: s.u } : { value: 0, uncertainty: 0 },
        // Only 298.15 K is evaluated, where the heat-capacity function does not enter.
        heatCapacity: { kind: 'constant', cp: 0, tMin: 1, tMax: 10000 },
      },
    };
  });
  const at = reactionAt(participants, T_REF);
  if (missingS.length > 0) return { deltaH: at.deltaH.value, deltaG: null, reason: `no recommended S° for ${missingS.map((t) => t.label).join(', ')}` };
  return { deltaH: at.deltaH.value, deltaG: at.deltaG.value };
}
