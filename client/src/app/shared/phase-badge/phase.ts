/** Broad family of a state of aggregation, used for the badge's colour. */
export type PhaseFamily = 'gas' | 'liquid' | 'solid' | 'solution' | 'other';

export interface PhaseDescription {
  /** IUPAC abbreviation as shown, e.g. `cr, graphite` or `aq, ∞`. */
  readonly abbreviation: string;
  /** Words for screen readers and tooltips, e.g. `crystalline solid, graphite`. */
  readonly label: string;
  readonly family: PhaseFamily;
}

interface KnownPhase {
  readonly label: string;
  readonly family: PhaseFamily;
}

/** IUPAC Green Book (3rd ed., 2.11) abbreviations for states of aggregation. */
const KNOWN_PHASES: Readonly<Record<string, KnownPhase>> = {
  g: { label: 'gas', family: 'gas' },
  l: { label: 'liquid', family: 'liquid' },
  s: { label: 'solid', family: 'solid' },
  cr: { label: 'crystalline solid', family: 'solid' },
  am: { label: 'amorphous solid', family: 'solid' },
  vit: { label: 'vitreous substance', family: 'solid' },
  aq: { label: 'aqueous solution', family: 'solution' },
  'aq,∞': { label: 'aqueous solution at infinite dilution', family: 'solution' },
  sln: { label: 'solution', family: 'solution' },
};

/** Other spellings of infinite dilution accepted from data files and the API. */
const INFINITE_DILUTION_SPELLINGS = new Set(['aq,inf', 'aq,infinity', 'aq,∞']);

/**
 * Describes a phase given as an IUPAC abbreviation, with an optional polymorph or
 * modification (`cr` + `graphite`, or `cr,graphite` in one string).
 */
export function describePhase(phase: string, polymorph?: string | null): PhaseDescription {
  const normalized = phase.trim().replace(/\s+/g, '');
  if (INFINITE_DILUTION_SPELLINGS.has(normalized.toLowerCase())) {
    return withPolymorph('aq, ∞', KNOWN_PHASES['aq,∞'], polymorph);
  }
  const [code, ...rest] = phase.split(',').map((part) => part.trim());
  const combinedPolymorph = polymorph?.trim() || rest.join(', ') || null;
  const known = KNOWN_PHASES[code];
  if (!known) {
    return withPolymorph(code, { label: `phase ${code}`, family: 'other' }, combinedPolymorph);
  }
  return withPolymorph(code, known, combinedPolymorph);
}

function withPolymorph(abbreviation: string, known: KnownPhase, polymorph: string | null | undefined): PhaseDescription {
  return polymorph
    ? { abbreviation: `${abbreviation}, ${polymorph}`, label: `${known.label}, ${polymorph}`, family: known.family }
    : { abbreviation, label: known.label, family: known.family };
}
