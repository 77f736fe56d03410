import type { Request } from 'express';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../app-context';
import type { Principal } from '../auth/principal';
import { recordAudit } from '../audit/audit.service';
import { queryRows } from '../db/returned-rows';
import { hillFormula } from '../thermo/formula-format';
import { checkBalance, stoichiometricNumbers, tryParseReaction } from '../thermo/reaction';
import { toPhaseCode, phaseLabel } from '../species/phase-code';
import { ConflictError, NotFoundError, UnprocessableError } from '../shared/errors';

export interface SavedReactionItem {
  id: string;
  name: string;
  equation: string;
  /** K */
  tMin: number;
  /** K */
  tMax: number;
  createdAt: Date;
}

/**
 * Reactions engineers keep. The equation is parsed and balanced by the engine and each species is
 * found in the catalogue (formula as entered, else Hill formula and charge, in the phase written),
 * so that a proposal's impact report can find the reactions a revision touches. The temperature
 * range is kept as the evaluation temperatures [tMin, tMax].
 */
export class SavedReactionsService {
  constructor(private readonly ctx: AppContext) {}

  async list(user: Principal): Promise<{ items: SavedReactionItem[] }> {
    const rows: { id: string; name: string; equation: string; temperatures: number[]; createdAt: Date }[] = await this.ctx.dataSource.query(
      `SELECT id, name, equation, temperatures_k AS temperatures, created_at AS "createdAt" FROM saved_reactions WHERE user_id = $1 ORDER BY lower(name), id`,
      [user.userId],
    );
    return { items: rows.map(view) };
  }

  async create(user: Principal, body: { name: string; equation: string; tMin: number; tMax: number }, req: Request): Promise<SavedReactionItem> {
    if (!(body.tMax >= body.tMin)) throw new UnprocessableError(`tMax (${body.tMax} K) must not be below tMin (${body.tMin} K)`, { fields: [{ field: 'tMax', message: 'below tMin' }] });
    const parsed = tryParseReaction(body.equation);
    if (!parsed.ok) {
      throw new UnprocessableError(`The equation cannot be read: ${parsed.error.message}`, { fields: [{ field: 'equation', message: parsed.error.message }] });
    }
    const balance = checkBalance(parsed.reaction);
    if (!balance.balanced) throw new UnprocessableError(`The equation is ${balance.message}`, { fields: [{ field: 'equation', message: balance.message }] });
    return this.ctx.dataSource.transaction(async (m) => {
      const [taken] = await m.query(`SELECT id FROM saved_reactions WHERE user_id = $1 AND name = $2`, [user.userId, body.name.trim()]);
      if (taken) throw new ConflictError(`You already have a saved reaction named "${body.name.trim()}"`, { id: taken.id });
      const terms: { speciesPhaseId: string; nu: number }[] = [];
      for (const entry of stoichiometricNumbers(parsed.reaction)) {
        if (entry.nu === 0) continue;
        terms.push({ speciesPhaseId: await this.speciesPhase(m, entry.species), nu: entry.nu });
      }
      if (terms.length === 0) throw new UnprocessableError('Nothing changes in this equation: every species appears on both sides with the same coefficient', { fields: [{ field: 'equation', message: 'no net change' }] });
      const temperatures = body.tMin === body.tMax ? [body.tMin] : [body.tMin, body.tMax];
      const [row] = await m.query(
        `INSERT INTO saved_reactions (user_id, name, equation, temperatures_k) VALUES ($1, $2, $3, $4)
         RETURNING id, name, equation, temperatures_k AS temperatures, created_at AS "createdAt"`,
        [user.userId, body.name.trim(), body.equation.trim(), temperatures],
      );
      if (terms.length > 0) {
        await m.query(
          `INSERT INTO saved_reaction_terms (saved_reaction_id, species_phase_id, coefficient)
           SELECT $1, x.species_phase_id, x.coefficient FROM jsonb_to_recordset($2::jsonb) AS x(species_phase_id uuid, coefficient double precision)`,
          [row.id, JSON.stringify(terms.map((t) => ({ species_phase_id: t.speciesPhaseId, coefficient: t.nu })))],
        );
      }
      await recordAudit(m, { action: 'saved_reaction.create', actor: user, entityType: 'saved_reaction', entityId: row.id, details: { name: row.name, equation: row.equation } }, req);
      return view(row);
    });
  }

  private async speciesPhase(m: EntityManager, species: ReturnType<typeof stoichiometricNumbers>[number]['species']): Promise<string> {
    if (!species.phase) throw new UnprocessableError(`Give the phase of ${species.label}, e.g. ${species.formulaText}(g)`, { fields: [{ field: 'equation', message: `no phase for ${species.label}` }] });
    const phase = toPhaseCode(species.phase);
    if (!phase) throw new UnprocessableError(`The catalogue keeps no data for the phase of ${species.label}`, { fields: [{ field: 'equation', message: `unsupported phase in ${species.label}` }] });
    const hill = hillFormula(species.formula);
    const candidates: { id: string; speciesId: string; exact: boolean }[] = await m.query(
      `SELECT sp.id, s.id AS "speciesId", s.formula = $1 AS exact
         FROM species s JOIN species_phases sp ON sp.species_id = s.id
        WHERE (s.formula = $1 OR (s.hill_formula = $2 AND s.charge = $3)) AND sp.phase = $4 AND sp.polymorph IS NOT DISTINCT FROM $5`,
      [species.formulaText, hill, species.formula.charge, phase.phase, phase.polymorph],
    );
    const exact = candidates.filter((c) => c.exact);
    const pick = exact.length === 1 ? exact : candidates;
    const label = `${species.formulaText}(${phaseLabel(phase.phase, phase.polymorph)})`;
    if (pick.length === 0) throw new UnprocessableError(`${label} is not in the catalogue`, { fields: [{ field: 'equation', message: `${label} not found` }] });
    if (new Set(pick.map((c) => c.speciesId)).size > 1) {
      throw new UnprocessableError(`${label} is ambiguous: several species have the formula ${hill}; write the formula as the catalogue spells it (e.g. CH3CH2OH)`, { fields: [{ field: 'equation', message: `${label} ambiguous` }] });
    }
    return pick[0].id;
  }

  async remove(user: Principal, id: string, req: Request): Promise<void> {
    await this.ctx.dataSource.transaction(async (m) => {
      const removed = await queryRows<{ name: string }>(m, `DELETE FROM saved_reactions WHERE id = $1 AND user_id = $2 RETURNING name`, [id, user.userId]);
      if (removed.length === 0) throw new NotFoundError(`You have no saved reaction ${id}`);
      await recordAudit(m, { action: 'saved_reaction.delete', actor: user, entityType: 'saved_reaction', entityId: id, details: { name: removed[0].name } }, req);
    });
  }
}

function view(row: { id: string; name: string; equation: string; temperatures: number[]; createdAt: Date }): SavedReactionItem {
  return { id: row.id, name: row.name, equation: row.equation, tMin: Math.min(...row.temperatures), tMax: Math.max(...row.temperatures), createdAt: row.createdAt };
}
