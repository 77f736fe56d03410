import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { Source } from '../sources/source.entity';
import { SpeciesPhase } from '../species/species-phase.entity';
import type { Method, Quantity, TransitionKind, UncertaintyKind } from './value-vocabulary';

/**
 * One version of a thermochemical value of a species phase. Rows are never updated or deleted
 * (a database trigger refuses it): a revision is a new row that supersedes the previous version
 * of the same lineage, and retiring is a row with `isRetired` and a reason (it carries the
 * retired version's numbers). Release membership says which versions a release holds.
 *
 * Units: `valueSi` and `uncertaintySi` in SI — J/mol for dfH, dfG and dtrsH, J/(mol·K) for S
 * and Cp (see SI_UNITS); temperature in K, pressure in Pa. Stored as double precision (the
 * engine computes in float64); `enteredValue` + `enteredUnit` keep the number exactly as the
 * source printed it, for provenance.
 */
@Entity({ name: 'thermo_values' })
export class ThermoValue {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  /** id of the first version; stable across revisions (filled by the database when omitted) */
  @Column({ name: 'lineage_id', type: 'uuid' })
  lineageId: string;

  /** 1 for the first version, then +1 per revision (filled by the database when omitted) */
  @Column({ name: 'version_no', type: 'integer' })
  versionNo: number;

  @Column({ name: 'supersedes_id', type: 'uuid', nullable: true })
  supersedesId: string | null;

  @Column({ name: 'species_phase_id', type: 'uuid' })
  speciesPhaseId: string;

  @ManyToOne(() => SpeciesPhase)
  @JoinColumn({ name: 'species_phase_id' })
  speciesPhase: Relation<SpeciesPhase>;

  @Column({ type: 'text' })
  quantity: Quantity;

  /** only for dtrsH */
  @Column({ name: 'transition_kind', type: 'text', nullable: true })
  transitionKind: TransitionKind | null;

  /** free text for solid–solid transitions, e.g. "cr, II → cr, I" */
  @Column({ name: 'transition_label', type: 'text', nullable: true })
  transitionLabel: string | null;

  @Column({ name: 'value_si', type: 'double precision' })
  valueSi: number;

  /** ≥ 0; null when the source states none */
  @Column({ name: 'uncertainty_si', type: 'double precision', nullable: true })
  uncertaintySi: number | null;

  @Column({ name: 'uncertainty_kind', type: 'text', nullable: true })
  uncertaintyKind: UncertaintyKind | null;

  /** k of an expanded uncertainty */
  @Column({ name: 'coverage_factor', type: 'double precision', nullable: true })
  coverageFactor: number | null;

  /** K; for dtrsH the transition temperature */
  @Column({ name: 'temperature_k', type: 'double precision' })
  temperatureK: number;

  /** Pa: 100000 (1 bar) or 101325 (1 atm), as the source states it */
  @Column({ name: 'pressure_pa', type: 'double precision' })
  pressurePa: number;

  @Column({ type: 'text' })
  method: Method;

  /** required when method = computed */
  @Column({ name: 'level_of_theory', type: 'text', nullable: true })
  levelOfTheory: string | null;

  @Column({ name: 'source_id', type: 'uuid' })
  sourceId: string;

  @ManyToOne(() => Source)
  @JoinColumn({ name: 'source_id' })
  source: Relation<Source>;

  /** where in the source, e.g. "Table 2, p. 14" */
  @Column({ name: 'source_locator', type: 'text', nullable: true })
  sourceLocator: string | null;

  /** the number as entered, e.g. "-285.830 ± 0.040" */
  @Column({ name: 'entered_value', type: 'text' })
  enteredValue: string;

  /** the unit as entered, e.g. "kJ/mol" */
  @Column({ name: 'entered_unit', type: 'text' })
  enteredUnit: string;

  /** null for the reference set loaded in bulk */
  @Column({ name: 'entered_by', type: 'uuid', nullable: true })
  enteredBy: string | null;

  @Column({ name: 'approved_by', type: 'uuid', nullable: true })
  approvedBy: string | null;

  @Column({ name: 'proposal_item_id', type: 'uuid', nullable: true })
  proposalItemId: string | null;

  @Column({ name: 'is_retired', type: 'boolean', default: false })
  isRetired: boolean;

  @Column({ name: 'retired_reason', type: 'text', nullable: true })
  retiredReason: string | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
