import type { EntityManager } from 'typeorm';
import { hillFormula, type ParsedSpecies } from '../thermo';
import { phaseLabel, toPhaseCode, type PhaseCode } from '../species/phase-code';

/** A species of an equation, looked up in a release. */
export interface Candidate {
  speciesPhaseId: string;
  speciesId: string;
  formula: string;
  name: string;
  hillFormula: string;
  phase: PhaseCode;
  polymorph: string | null;
}

export interface Suggestion {
  id: string;
  name: string;
  formula: string;
  phase: string;
}

export interface Resolution {
  /** species label as written → the species phase it names */
  resolved: Map<string, Candidate>;
  /** labels that name nothing in the release */
  missing: string[];
  /** labels that name several species or phases */
  ambiguous: string[];
  /** why each unresolved label failed */
  reasons: Map<string, string>;
  /** label → what the release does hold with that formula */
  suggestions: Record<string, Suggestion[]>;
}

const suggestion = (c: Candidate): Suggestion => ({ id: c.speciesId, name: c.name, formula: c.formula, phase: phaseLabel(c.phase, c.polymorph) });

/**
 * Finds the species phase each written species names in a release, by Hill formula and phase
 * (one indexed query for the whole equation). Isomers sharing a Hill formula are told apart by
 * the formula as written (C2H5OH against CH3OCH3); a species written without a phase must hold
 * data in exactly one phase.
 */
export async function resolveSpecies(manager: EntityManager, releaseId: string, written: ParsedSpecies[]): Promise<Resolution> {
  const result: Resolution = { resolved: new Map(), missing: [], ambiguous: [], reasons: new Map(), suggestions: {} };
  const unique = [...new Map(written.map((s) => [s.label, s])).values()];
  const hills = [...new Set(unique.map((s) => hillFormula(s.formula)))];
  const rows: Candidate[] = await manager.query(
    `SELECT sp.id AS "speciesPhaseId", s.id AS "speciesId", s.formula, s.name, s.hill_formula AS "hillFormula", sp.phase, sp.polymorph
       FROM species s JOIN species_phases sp ON sp.species_id = s.id
      WHERE s.hill_formula = ANY($2::text[])
        AND EXISTS (SELECT 1 FROM release_members m WHERE m.release_id = $1 AND m.species_phase_id = sp.id)
      ORDER BY s.name, sp.phase, sp.polymorph NULLS FIRST`,
    [releaseId, hills],
  );
  for (const species of unique) {
    const label = species.label;
    const sameFormula = rows.filter((r) => r.hillFormula === hillFormula(species.formula));
    const fail = (kind: 'missing' | 'ambiguous', reason: string, shown: Candidate[]) => {
      result[kind].push(label);
      result.reasons.set(label, reason);
      if (shown.length > 0) result.suggestions[label] = shown.map(suggestion);
    };
    if (sameFormula.length === 0) {
      fail('missing', 'no species with this formula holds data in the release', []);
      continue;
    }
    let candidates = sameFormula;
    if (species.phase) {
      const code = toPhaseCode(species.phase);
      candidates = code ? candidates.filter((c) => c.phase === code.phase && (code.polymorph === null || c.polymorph === code.polymorph)) : [];
      if (candidates.length === 0) {
        fail('missing', `no data for this phase; the release holds ${[...new Set(sameFormula.map((c) => phaseLabel(c.phase, c.polymorph)))].join(', ')}`, sameFormula);
        continue;
      }
    }
    const speciesIds = new Set(candidates.map((c) => c.speciesId));
    if (speciesIds.size > 1) {
      const asWritten = candidates.filter((c) => c.formula.replace(/\s+/g, '') === species.formulaText.replace(/\s+/g, ''));
      if (new Set(asWritten.map((c) => c.speciesId)).size === 1) candidates = asWritten;
    }
    if (new Set(candidates.map((c) => c.speciesId)).size > 1) {
      fail('ambiguous', `several species share this formula (${[...new Set(candidates.map((c) => c.name))].join(', ')}); write the formula as the catalogue does`, candidates);
      continue;
    }
    if (candidates.length > 1) {
      fail('ambiguous', `holds data in several phases (${candidates.map((c) => phaseLabel(c.phase, c.polymorph)).join(', ')}); write the phase, e.g. ${species.formulaText}(${phaseLabel(candidates[0].phase, candidates[0].polymorph)})`, candidates);
      continue;
    }
    result.resolved.set(label, candidates[0]);
  }
  return result;
}
