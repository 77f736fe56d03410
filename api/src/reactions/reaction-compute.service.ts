import type { DataSource } from 'typeorm';
import {
  adiabaticTemperatureRise,
  balanceReaction,
  checkBalance,
  compileReaction,
  deriveFormationEnthalpy,
  FormulaError,
  formatPhase,
  hillFormula,
  normaliseEquation,
  parseReaction,
  parseSpecies,
  ReactionError,
  samePhase,
  stoichiometricNumbers,
  T_REF,
  ThermoInputError,
  type FavouredBy,
  type ParsedReaction,
  type ParsedSpecies,
  type ReactionTerm,
} from '../thermo';
import type { ResolvedRelease } from '../releases/release-resolution';
import { BadRequestError, UnprocessableError } from '../shared/errors';
import { computable, loadPhaseThermo, type ComputableSpecies } from '../shared/release-thermo-data';
import { phaseLabel } from '../species/phase-code';
import { SOURCE_COLUMNS, sourceRef, type SourceRef } from '../species/species.service';
import { resolveSpecies, type Resolution } from './reaction-species';

export interface Measured {
  value: number | null;
  uncertainty: number | null;
  unit: string;
}

export interface ReactionResult {
  T: number;
  extrapolated: boolean;
  deltaH: Measured;
  deltaS: Measured;
  deltaG: Measured;
  deltaCp: Measured;
  log10K: { value: number; uncertainty: number | null };
  K: number | null;
  favouredBy: FavouredBy;
}

export interface EvaluatedReaction {
  equation: string;
  balanced: true;
  /** true when the server filled in coefficients that were not written */
  coefficientsFilledIn: boolean;
  release: string;
  species: { formula: string; phase: string; coefficient: number; side: 'reactant' | 'product'; speciesId: string; name: string }[];
  results: ReactionResult[];
  crossoverT: number | null;
  caution: string;
  notes: string[];
  sources: SourceRef[];
}

export const REACTION_CAUTION =
  'Standard-state values (p° = 1 bar, pure phases, ideal gases) for the reaction as written; real pressures, mixtures and ' +
  'kinetics can differ. Reaction heats used for safety decisions are screening estimates: defer to a qualified ' +
  'process-safety review and to local codes.';

const atReference = (t: number) => Math.abs(t - T_REF) < 1e-9;
const inRange = (t: number, s: ComputableSpecies) => t >= s.tMin - 1e-9 && t <= s.tMax + 1e-9;

/** An equation as the server evaluates it: balanced, with each written species. */
interface PreparedEquation {
  reaction: ParsedReaction;
  filledIn: boolean;
}

/** Reads an equation; a syntax error is a 400 naming the column. */
export function readEquation(equation: string): ParsedReaction {
  try {
    return parseReaction(equation);
  } catch (error) {
    if (error instanceof ReactionError) {
      throw new BadRequestError(`equation cannot be read: ${error.message}`, { parameter: 'equation', column: error.column, reason: error.reason });
    }
    throw error;
  }
}

/** The equation balanced as written, or with its unwritten coefficients filled in; else a 422 saying why. */
export function balancedEquation(reaction: ParsedReaction): PreparedEquation {
  const check = checkBalance(reaction);
  if (check.balanced) return { reaction, filledIn: false };
  const terms = [...reaction.reactants, ...reaction.products];
  if (terms.every((t) => t.coefficient !== null)) {
    throw new UnprocessableError(`The equation does not balance: ${check.message}`, {
      reason: check.message,
      elementExcess: Object.fromEntries(Object.entries(check.elementExcess).map(([k, v]) => [k, v.toNumber()])),
      chargeExcess: check.chargeExcess.toNumber(),
    });
  }
  const result = balanceReaction(reaction);
  if (result.status !== 'balanced') {
    throw new UnprocessableError(`The equation cannot be balanced: ${result.reason}`, {
      reason: result.reason,
      status: result.status,
      ...(result.status === 'not-unique' ? { degreesOfFreedom: result.degreesOfFreedom } : {}),
    });
  }
  return { reaction: result.reaction, filledIn: true };
}

function termsWithSide(reaction: ParsedReaction): { term: ReactionTerm; side: 'reactant' | 'product' }[] {
  return [
    ...reaction.reactants.map((term) => ({ term, side: 'reactant' as const })),
    ...reaction.products.map((term) => ({ term, side: 'product' as const })),
  ];
}

function unresolvedError(resolution: Resolution, extra: { missing?: string[]; reasons?: Map<string, string>; outOfRange?: OutOfRange[] } = {}): UnprocessableError {
  const missing = [...resolution.missing, ...(extra.missing ?? [])];
  const reasons = new Map([...resolution.reasons, ...(extra.reasons ?? new Map())]);
  const outOfRange = extra.outOfRange ?? [];
  const parts = [
    ...missing.map((m) => `${m}: ${reasons.get(m)}`),
    ...resolution.ambiguous.map((a) => `${a}: ${reasons.get(a)}`),
    ...outOfRange.map((o) => `${o.species}: ${o.reason}`),
  ];
  return new UnprocessableError(`Cannot evaluate the reaction: ${parts.join('; ')}`, {
    missing,
    ambiguous: resolution.ambiguous,
    outOfRange,
    suggestions: resolution.suggestions,
    reasons: Object.fromEntries(reasons),
  });
}

interface OutOfRange {
  species: string;
  tMin: number;
  tMax: number;
  temperatures: number[];
  reason: string;
}

export class ReactionComputeService {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * ΔrH°, ΔrS°, ΔrG°, ΔrCp°, log10 K and K at each temperature from the release's recommended
   * values and fits (Hess's law and Kirchhoff's equation, through the engine). At 298.15 K only
   * ΔfH° and S° are needed; elsewhere every species needs a heat-capacity fit covering T.
   */
  async evaluate(release: ResolvedRelease, equation: string, temperatures: number[], extrapolate: boolean): Promise<EvaluatedReaction> {
    const { reaction, filledIn } = balancedEquation(readEquation(equation));
    const written = termsWithSide(reaction);
    const resolution = await resolveSpecies(this.dataSource.manager, release.id, written.map((w) => w.term.species));
    if (resolution.missing.length + resolution.ambiguous.length > 0) throw unresolvedError(resolution);

    const records = await loadPhaseThermo(this.dataSource.manager, release.id, [...resolution.resolved.values()].map((c) => c.speciesPhaseId));
    const byLabel = new Map<string, ComputableSpecies>();
    for (const [label, candidate] of resolution.resolved) byLabel.set(label, computable(records.get(candidate.speciesPhaseId)!));

    const entries = stoichiometricNumbers(reaction).map((e) => ({ ...e, species: byLabel.get(e.label)! }));
    const missing: string[] = [];
    const reasons = new Map<string, string>();
    const outOfRange: OutOfRange[] = [];
    for (const { label, species, nu } of entries) {
      if (nu === 0) continue;
      const lacking = [!species.hasFormationEnthalpy && 'ΔfH°(298.15 K)', !species.hasEntropy && 'S°(298.15 K)'].filter(Boolean);
      if (lacking.length > 0) {
        missing.push(label);
        reasons.set(label, `release ${release.label} holds no recommended ${lacking.join(' or ')} for ${species.label}`);
        continue;
      }
      const outside = temperatures.filter((t) => !inRange(t, species) && !(extrapolate && species.heatCapacitySource !== 'none'));
      if (outside.length > 0) {
        outOfRange.push({
          species: label,
          tMin: species.tMin,
          tMax: species.tMax,
          temperatures: outside,
          reason: species.heatCapacitySource === 'fit'
            ? `T = ${outside.join(', ')} K lies outside ${species.tMin}–${species.tMax} K, the valid range of its heat-capacity fit (pass extrapolate: true to extrapolate)`
            : `release ${release.label} holds no heat-capacity fit for ${species.label}, so it can be evaluated at 298.15 K only (asked for ${outside.join(', ')} K)`,
        });
      }
    }
    if (missing.length + outOfRange.length > 0) throw unresolvedError(resolution, { missing, reasons, outOfRange });

    const active = entries.filter((e) => e.nu !== 0);
    if (active.length === 0) throw new UnprocessableError('Nothing reacts: every species appears on both sides with the same coefficient', { reason: 'no net change' });
    const compiled = compileReaction(active.map((e) => ({ nu: e.nu, data: e.species.data })));
    const profile = compiled.evaluate(temperatures, { extrapolate: true });
    const known = {
      dfH: active.every((e) => e.species.uncertaintyKnown.formationEnthalpy),
      S: active.every((e) => e.species.uncertaintyKnown.entropy),
      Cp: active.every((e) => e.species.uncertaintyKnown.heatCapacity),
      cpData: active.every((e) => e.species.heatCapacitySource !== 'none'),
    };
    const notes = new Set(active.flatMap((e) => e.species.notes));
    this.noteGaps(active.map((e) => e.species), known, temperatures, notes);

    const results = temperatures.map((t, j): ReactionResult => {
      const reference = atReference(t);
      const hKnown = known.dfH && (reference || known.Cp);
      const sKnown = known.S && (reference || known.Cp);
      const k = profile.k[j];
      return {
        T: t,
        extrapolated: profile.extrapolated[j] === 1,
        deltaH: { value: profile.deltaH[j] / 1000, uncertainty: hKnown ? profile.deltaHUncertainty[j] / 1000 : null, unit: 'kJ/mol' },
        deltaS: { value: profile.deltaS[j], uncertainty: sKnown ? profile.deltaSUncertainty[j] : null, unit: 'J/(mol·K)' },
        deltaG: { value: profile.deltaG[j] / 1000, uncertainty: hKnown && sKnown ? profile.deltaGUncertainty[j] / 1000 : null, unit: 'kJ/mol' },
        deltaCp: {
          value: known.cpData ? profile.deltaCp[j] : null,
          uncertainty: known.cpData && known.Cp ? profile.deltaCpUncertainty[j] : null,
          unit: 'J/(mol·K)',
        },
        log10K: { value: profile.log10K[j], uncertainty: hKnown && sKnown ? profile.log10KUncertainty[j] : null },
        K: Number.isFinite(k) && k > 0 ? k : null,
        favouredBy: profile.favouredBy[j],
      };
    });
    if (results.some((r) => r.K === null)) notes.add('K is null where it overflows a double-precision number; log10 K is exact.');
    if (results.some((r) => r.extrapolated)) notes.add('Results flagged extrapolated use a heat-capacity function outside its valid range.');

    let crossoverT: number | null = null;
    if (compiled.tMax - compiled.tMin >= 1) {
      const crossover = compiled.crossover();
      if (crossover.found) crossoverT = crossover.temperature;
      else notes.add(`No crossover temperature: ${crossover.reason}.`);
    } else {
      notes.add('No crossover temperature: without heat-capacity fits for every species the reaction can be evaluated at 298.15 K only.');
    }

    return {
      equation: normaliseEquation(reaction),
      balanced: true,
      coefficientsFilledIn: filledIn,
      release: release.label,
      species: written.map(({ term, side }) => {
        const c = resolution.resolved.get(term.species.label)!;
        return { formula: term.species.formulaText, phase: phaseLabel(c.phase, c.polymorph), coefficient: (term.coefficient?.toNumber() ?? 1), side, speciesId: c.speciesId, name: c.name };
      }),
      results,
      crossoverT,
      caution: REACTION_CAUTION,
      notes: [...notes],
      sources: await this.sources(active.map((e) => e.species)),
    };
  }

  /** Coefficients that balance the equation, or a 422 saying why there are none or many. */
  balance(equation: string) {
    const reaction = readEquation(equation);
    const result = balanceReaction(reaction);
    if (result.status !== 'balanced') {
      throw new UnprocessableError(`No unique balance: ${result.reason}`, {
        reason: result.reason,
        status: result.status,
        ...(result.status === 'not-unique' ? { degreesOfFreedom: result.degreesOfFreedom } : {}),
      });
    }
    const terms = [...result.reaction.reactants, ...result.reaction.products];
    return {
      equation: result.equation,
      coefficients: result.coefficients.map((c) => c.toNumber()),
      species: terms.map((t, i) => ({
        formula: t.species.formulaText,
        phase: t.species.phase ? formatPhase(t.species.phase).slice(1, -1) : null,
        coefficient: result.coefficients[i].toNumber(),
        side: i < result.reaction.reactants.length ? 'reactant' : 'product',
      })),
      balanced: true as const,
    };
  }

  /**
   * ΔfH° of `target` from a measured reaction enthalpy and the other species' recommended ΔfH°
   * (Hess's law with GUM propagation, through the engine).
   * @param reactionEnthalpy ΔrH° / (J/mol) with its standard uncertainty, for the equation as written
   */
  async deriveFormation(release: ResolvedRelease, equation: string, target: string, reactionEnthalpy: { value: number; uncertainty: number }) {
    const { reaction, filledIn } = balancedEquation(readEquation(equation));
    let wanted: ParsedSpecies;
    try {
      wanted = parseSpecies(target);
    } catch (error) {
      if (error instanceof FormulaError) {
        throw new BadRequestError(`target "${target}" cannot be read: ${error.reason} at column ${error.column}`, { parameter: 'target', column: error.column, reason: error.reason });
      }
      throw error;
    }
    const entries = stoichiometricNumbers(reaction);
    const isTarget = (s: ParsedSpecies) =>
      hillFormula(s.formula) === hillFormula(wanted.formula) && (wanted.phase === null || samePhase(s.phase, wanted.phase));
    const targets = entries.filter((e) => isTarget(e.species));
    if (targets.length !== 1) {
      throw new UnprocessableError(
        targets.length === 0 ? `target ${target} does not appear in the equation` : `target ${target} matches several species of the equation; give its phase`,
        { parameter: 'target' },
      );
    }
    if (targets[0].nu === 0) throw new UnprocessableError(`target ${target} appears on both sides with the same coefficient`, { parameter: 'target' });
    const others = entries.filter((e) => e !== targets[0] && e.nu !== 0);
    const resolution = await resolveSpecies(this.dataSource.manager, release.id, others.map((e) => e.species));
    if (resolution.missing.length + resolution.ambiguous.length > 0) throw unresolvedError(resolution);
    const records = await loadPhaseThermo(this.dataSource.manager, release.id, [...resolution.resolved.values()].map((c) => c.speciesPhaseId));
    const species = new Map<string, ComputableSpecies>();
    const missing: string[] = [];
    const reasons = new Map<string, string>();
    for (const e of others) {
      const s = computable(records.get(resolution.resolved.get(e.label)!.speciesPhaseId)!);
      species.set(e.label, s);
      if (!s.hasFormationEnthalpy) {
        missing.push(e.label);
        reasons.set(e.label, `release ${release.label} holds no recommended ΔfH°(298.15 K) for ${s.label}`);
      }
    }
    if (missing.length > 0) throw unresolvedError(resolution, { missing, reasons });

    const derived = deriveFormationEnthalpy(reactionEnthalpy, [
      { label: targets[0].label, nu: targets[0].nu, formationEnthalpy: null },
      ...others.map((e) => ({ label: e.label, nu: e.nu, formationEnthalpy: species.get(e.label)!.data.formationEnthalpy })),
    ]);
    const uncertaintyKnown = others.every((e) => species.get(e.label)!.uncertaintyKnown.formationEnthalpy);
    const budget = new Map(derived.budget.map((b) => [b.source, b.contribution]));
    const sources = new Map((await this.sources([...species.values()])).map((s) => [s.id, s]));
    const notes = [...new Set([...species.values()].flatMap((s) => s.notes))];
    if (!uncertaintyKnown) {
      notes.push(`Some ΔfH° values used have no stated uncertainty (${others.filter((e) => !species.get(e.label)!.uncertaintyKnown.formationEnthalpy).map((e) => e.label).join(', ')}); the derived uncertainty is therefore not given.`);
    }
    notes.push('The reaction enthalpy is taken as ΔrH°(298.15 K) at 1 bar for the equation as written, its uncertainty as a standard uncertainty (k = 1).');
    return {
      target: targets[0].label,
      equation: normaliseEquation(reaction),
      coefficientsFilledIn: filledIn,
      release: release.label,
      deltaFH: {
        value: derived.formationEnthalpy.value / 1000,
        uncertainty: uncertaintyKnown ? derived.formationEnthalpy.uncertainty / 1000 : null,
        unit: 'kJ/mol',
      },
      contributions: [
        {
          species: 'measured ΔrH°',
          coefficient: null,
          deltaFH: null,
          source: null,
          uncertaintyContribution: (budget.get('measured ΔrH°') ?? 0) / 1000,
        },
        ...others.map((e) => {
          const s = species.get(e.label)!;
          const value = s.record.dfH;
          return {
            species: e.label,
            coefficient: e.nu,
            deltaFH: {
              value: s.data.formationEnthalpy.value / 1000,
              uncertainty: s.uncertaintyKnown.formationEnthalpy ? s.data.formationEnthalpy.uncertainty / 1000 : null,
              unit: 'kJ/mol',
            },
            source: value ? sources.get(value.sourceId) ?? null : null,
            uncertaintyContribution: s.uncertaintyKnown.formationEnthalpy ? (budget.get(e.label) ?? 0) / 1000 : null,
          };
        }),
      ],
      notes,
    };
  }

  /** ΔT_ad = −ΔrH·n/(m·c_p), with the engine's screening caution. */
  adiabaticRise(input: { deltaH: number; amount: number; mass: number; specificHeat: number }) {
    try {
      const { deltaT, caution } = adiabaticTemperatureRise({
        reactionEnthalpy: input.deltaH,
        extent: input.amount,
        mass: input.mass,
        specificHeatCapacity: input.specificHeat,
      });
      return { deltaT, unit: 'K' as const, caution };
    } catch (error) {
      if (error instanceof ThermoInputError) {
        const field = { reactionEnthalpy: 'deltaH', extent: 'amount', specificHeatCapacity: 'specificHeat' }[error.field] ?? error.field;
        throw new UnprocessableError(`${field}: ${error.reason}`, { parameter: field });
      }
      throw error;
    }
  }

  private noteGaps(species: ComputableSpecies[], known: { dfH: boolean; S: boolean; Cp: boolean; cpData: boolean }, temperatures: number[], notes: Set<string>): void {
    const lacking = (pick: (s: ComputableSpecies) => boolean) => species.filter((s) => !pick(s)).map((s) => s.label).join(', ');
    if (!known.dfH) notes.add(`ΔfH° of ${lacking((s) => s.uncertaintyKnown.formationEnthalpy)} has no stated uncertainty: u(ΔrH°), u(ΔrG°) and u(log10 K) are not given.`);
    if (!known.S) notes.add(`S° of ${lacking((s) => s.uncertaintyKnown.entropy)} has no stated uncertainty: u(ΔrS°), u(ΔrG°) and u(log10 K) are not given.`);
    if (!known.cpData) notes.add(`No Cp° data for ${lacking((s) => s.heatCapacitySource !== 'none')}: ΔrCp° is not given.`);
    else if (!known.Cp && temperatures.some((t) => !atReference(t))) {
      notes.add('Some heat capacities have no stated uncertainty: uncertainties away from 298.15 K are not given.');
    }
  }

  private async sources(species: ComputableSpecies[]): Promise<SourceRef[]> {
    const ids = new Set<string>();
    for (const s of species) for (const v of [s.record.dfH, s.record.S, s.record.Cp, s.record.fit]) if (v) ids.add(v.sourceId);
    if (ids.size === 0) return [];
    const rows = await this.dataSource.query(`SELECT ${SOURCE_COLUMNS} FROM sources src WHERE src.id = ANY($1::uuid[]) ORDER BY src.short_key`, [[...ids]]);
    return rows.map(sourceRef);
  }
}

