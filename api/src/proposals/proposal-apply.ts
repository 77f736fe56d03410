import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { parseFormula } from '../thermo/formula';
import { molarMass } from '../thermo/molar-mass';
import type { FitRange } from '../values/fit-ranges';
import { addFit, reviseFit, reviseValue, retireValue } from '../values/value-versions';
import { ConflictError } from '../shared/errors';
import { fitColumns, valueColumns } from './proposal-item-payloads';
import type { ResolvedItem } from './proposal-subjects';

const CHUNK = 2000;

export interface AppliedCounts {
  species: number;
  phases: number;
  values: number;
  revisions: number;
  retirements: number;
  fits: number;
}

/**
 * Writes what an approved proposal adds, inside the approval's transaction: species and phases
 * first, then values and fits as new rows (a revision or retirement supersedes the latest version;
 * the database refuses a second successor, so a value revised by two proposals is applied once and
 * the second approval is a conflict). Each item then points at what it created (`result_…`).
 */
export async function applyProposal(manager: EntityManager, resolved: ResolvedItem[], people: { authorId: string; reviewerId: string }): Promise<AppliedCounts> {
  const unresolved = resolved.filter((r) => r.problems.length > 0);
  if (unresolved.length > 0) {
    throw new ConflictError('The catalogue changed since the proposal was submitted; it cannot be applied as it is. Request changes instead.', {
      problems: unresolved.flatMap((r) => r.problems.map((p) => ({ itemId: r.item.id, position: r.item.position, ...p }))),
    });
  }
  const counts: AppliedCounts = { species: 0, phases: 0, values: 0, revisions: 0, retirements: 0, fits: 0 };
  const newSpecies = new Map<string, string>();
  const newPhases = new Map<string, { phaseId: string; speciesId: string }>();
  const results: { itemId: string; speciesId: string | null; phaseId: string | null; valueId: string | null; fitId: string | null }[] = [];
  const speciesIdOf = (r: ResolvedItem) => r.species?.id ?? (r.species?.itemId ? newSpecies.get(r.species.itemId) : undefined) ?? null;
  const phaseIdOf = (r: ResolvedItem) => r.phase?.id ?? (r.phase?.itemId ? newPhases.get(r.phase.itemId)?.phaseId : undefined) ?? null;

  for (const r of resolved) {
    const p = r.item.payload;
    if (r.item.kind === 'add_species') {
      const parsed = parseFormula(String(p.formula));
      const [row] = await manager.query(
        `INSERT INTO species (formula, hill_formula, charge, composition, molar_mass, name, synonyms, inchi, inchikey, cas_rn, smiles, notes)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12) RETURNING id`,
        [r.species!.formula, r.species!.hillFormula, parsed.charge, JSON.stringify(parsed.elements), molarMass(parsed), r.species!.name,
          (p.synonyms as string[] | undefined) ?? [], p.inchi ?? null, p.inchikey ?? null, p.casRn ?? null, p.smiles ?? null, p.notes ?? null],
      );
      newSpecies.set(r.item.id, row.id);
      results.push({ itemId: r.item.id, speciesId: row.id, phaseId: null, valueId: null, fitId: null });
      counts.species++;
    } else if (r.item.kind === 'add_phase') {
      const speciesId = speciesIdOf(r)!;
      const [row] = await manager.query(
        `INSERT INTO species_phases (species_id, phase, polymorph, is_reference_state, notes) VALUES ($1, $2, $3, $4, $5) RETURNING id`,
        [speciesId, r.phase!.phase, r.phase!.polymorph, r.phase!.isReferenceState, p.notes ?? null],
      );
      newPhases.set(r.item.id, { phaseId: row.id, speciesId });
      results.push({ itemId: r.item.id, speciesId, phaseId: row.id, valueId: null, fitId: null });
      counts.phases++;
    }
  }

  const by = { enteredBy: people.authorId, approvedBy: people.reviewerId };
  const newValues: Record<string, unknown>[] = [];
  for (const r of resolved) {
    const p = r.item.payload;
    switch (r.item.kind) {
      case 'add_value': {
        const c = valueColumns(p, r.quantity!);
        const id = randomUUID();
        newValues.push({
          id, species_phase_id: phaseIdOf(r), quantity: r.quantity, transition_kind: c.transitionKind, transition_label: c.transitionLabel,
          value_si: c.entry.valueSi, uncertainty_si: c.entry.uncertaintySi, uncertainty_kind: c.entry.uncertaintyKind, coverage_factor: c.entry.coverageFactor,
          temperature_k: c.temperatureK, pressure_pa: c.pressurePa, method: c.method, level_of_theory: c.levelOfTheory, source_id: r.item.sourceId,
          source_locator: c.sourceLocator, entered_value: c.entry.enteredValue, entered_unit: c.entry.enteredUnit, entered_by: by.enteredBy,
          approved_by: by.approvedBy, proposal_item_id: r.item.id, notes: c.notes,
        });
        results.push({ itemId: r.item.id, speciesId: speciesIdOf(r), phaseId: phaseIdOf(r), valueId: id, fitId: null });
        counts.values++;
        break;
      }
      case 'revise_value': {
        const c = valueColumns(p, r.quantity!);
        const v = await reviseValue(manager, r.targetValue!.id, {
          valueSi: c.entry.valueSi, uncertaintySi: c.entry.uncertaintySi, uncertaintyKind: c.entry.uncertaintyKind, coverageFactor: c.entry.coverageFactor,
          temperatureK: c.temperatureK, pressurePa: c.pressurePa, method: c.method, levelOfTheory: c.levelOfTheory, sourceId: r.item.sourceId!,
          sourceLocator: c.sourceLocator, enteredValue: c.entry.enteredValue, enteredUnit: c.entry.enteredUnit, notes: c.notes, proposalItemId: r.item.id, ...by,
        });
        results.push({ itemId: r.item.id, speciesId: speciesIdOf(r), phaseId: v.speciesPhaseId, valueId: v.id, fitId: null });
        counts.revisions++;
        break;
      }
      case 'retire_value': {
        const v = await retireValue(manager, r.targetValue!.id, String(p.reason).trim(), { ...by, proposalItemId: r.item.id });
        results.push({ itemId: r.item.id, speciesId: speciesIdOf(r), phaseId: v.speciesPhaseId, valueId: v.id, fitId: null });
        counts.retirements++;
        break;
      }
      case 'add_fit':
      case 'replace_fit': {
        const c = fitColumns(p);
        const columns = {
          form: c.form, tMinK: c.tMinK, tMaxK: c.tMaxK, ranges: c.ranges as FitRange[], pressurePa: c.pressurePa, method: c.method, levelOfTheory: c.levelOfTheory,
          sourceId: r.item.sourceId!, sourceLocator: c.sourceLocator, notes: c.notes, proposalItemId: r.item.id, ...by,
        };
        const fit = r.item.kind === 'add_fit'
          ? await addFit(manager, { ...columns, speciesPhaseId: phaseIdOf(r)! })
          : await reviseFit(manager, r.targetFit!.id, columns);
        results.push({ itemId: r.item.id, speciesId: speciesIdOf(r), phaseId: fit.speciesPhaseId, valueId: null, fitId: fit.id });
        counts.fits++;
        break;
      }
      default:
        break;
    }
  }

  for (let i = 0; i < newValues.length; i += CHUNK) {
    await manager.query(
      `INSERT INTO thermo_values (id, lineage_id, version_no, species_phase_id, quantity, transition_kind, transition_label, value_si, uncertainty_si,
                                  uncertainty_kind, coverage_factor, temperature_k, pressure_pa, method, level_of_theory, source_id, source_locator,
                                  entered_value, entered_unit, entered_by, approved_by, proposal_item_id, notes)
       SELECT x.id, x.id, 1, x.species_phase_id, x.quantity, x.transition_kind, x.transition_label, x.value_si, x.uncertainty_si,
              x.uncertainty_kind, x.coverage_factor, x.temperature_k, x.pressure_pa, x.method, x.level_of_theory, x.source_id, x.source_locator,
              x.entered_value, x.entered_unit, x.entered_by, x.approved_by, x.proposal_item_id, x.notes
         FROM jsonb_to_recordset($1::jsonb) AS x(id uuid, species_phase_id uuid, quantity text, transition_kind text, transition_label text,
              value_si double precision, uncertainty_si double precision, uncertainty_kind text, coverage_factor double precision,
              temperature_k double precision, pressure_pa double precision, method text, level_of_theory text, source_id uuid, source_locator text,
              entered_value text, entered_unit text, entered_by uuid, approved_by uuid, proposal_item_id uuid, notes text)`,
      [JSON.stringify(newValues.slice(i, i + CHUNK))],
    );
  }
  for (let i = 0; i < results.length; i += CHUNK) {
    await manager.query(
      `UPDATE proposal_items i
          SET result_species_id = x.species_id, result_species_phase_id = x.phase_id, result_value_id = x.value_id, result_fit_id = x.fit_id
         FROM jsonb_to_recordset($1::jsonb) AS x(item_id uuid, species_id uuid, phase_id uuid, value_id uuid, fit_id uuid)
        WHERE i.id = x.item_id`,
      [JSON.stringify(results.slice(i, i + CHUNK).map((r) => ({ item_id: r.itemId, species_id: r.speciesId, phase_id: r.phaseId, value_id: r.valueId, fit_id: r.fitId })))],
    );
  }
  return counts;
}
