import type { Phase } from '../thermo/phase';

/**
 * Phase codes the database stores (IUPAC abbreviations; `aq,inf` is aqueous at infinite
 * dilution). Matches the CHECK in migrations/1764800200000-catalogue.ts.
 */
export const PHASE_CODES = ['g', 'l', 'cr', 'am', 'aq', 'aq,inf'] as const;
export type PhaseCode = (typeof PHASE_CODES)[number];

/** Phases that may carry a polymorph / modification label (e.g. cr, graphite). */
export const PHASES_WITH_POLYMORPH: ReadonlySet<PhaseCode> = new Set<PhaseCode>(['cr', 'am', 'l']);

/**
 * The stored code and polymorph of a phase parsed by the engine, or undefined when the
 * catalogue does not keep data for that state (s, vit, sln, lc).
 */
export function toPhaseCode(phase: Phase): { phase: PhaseCode; polymorph: string | null } | undefined {
  if (phase.state === 'aq') return { phase: phase.infiniteDilution ? 'aq,inf' : 'aq', polymorph: null };
  if (!(PHASE_CODES as readonly string[]).includes(phase.state)) return undefined;
  return { phase: phase.state as PhaseCode, polymorph: phase.modification ?? null };
}

/** IUPAC label as the client shows it: "cr, graphite", "aq, ∞", "g". */
export function phaseLabel(phase: PhaseCode, polymorph: string | null): string {
  if (phase === 'aq,inf') return 'aq, ∞';
  return polymorph ? `${phase}, ${polymorph}` : phase;
}
