import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { HeatCapacityFit } from './heat-capacity-fit.entity';
import { ThermoValue } from './thermo-value.entity';

/**
 * Writing versioned data: values and fits are only ever inserted. A first version starts a
 * lineage; a revision is a new row superseding the latest version; a retirement is a row that
 * carries the retired version's numbers with a reason. The database checks the chain (trigger
 * `…_version_chain`) and refuses a second successor of the same version (unique supersedes_id),
 * so two concurrent revisions of one version cannot both succeed.
 */

/** Columns a caller supplies for a value; the chain columns are filled here. */
export type NewValue = Omit<ThermoValue, 'id' | 'lineageId' | 'versionNo' | 'supersedesId' | 'isRetired' | 'retiredReason' | 'createdAt' | 'speciesPhase' | 'source'> & {
  id?: string;
};
export type NewFit = Omit<HeatCapacityFit, 'id' | 'lineageId' | 'versionNo' | 'supersedesId' | 'isRetired' | 'retiredReason' | 'createdAt' | 'speciesPhase' | 'source'> & {
  id?: string;
};

/** What a revision may change; subject columns (species phase, quantity, transition) stay. */
export type ValueRevision = Partial<Omit<NewValue, 'speciesPhaseId' | 'quantity' | 'transitionKind'>>;
export type FitRevision = Partial<Omit<NewFit, 'speciesPhaseId'>>;

const CHAIN_AND_META = ['id', 'lineageId', 'versionNo', 'supersedesId', 'isRetired', 'retiredReason', 'createdAt', 'speciesPhase', 'source'] as const;

/**
 * What a new version takes over from the previous one: the data, not the chain, and not who
 * entered or approved it or through which proposal item (those belong to the new version).
 */
function carriedOver<T extends object>(previous: T): Partial<T> {
  const copy: Partial<T> = { ...previous };
  for (const key of CHAIN_AND_META) delete (copy as Record<string, unknown>)[key];
  return { ...copy, enteredBy: null, approvedBy: null, proposalItemId: null, notes: null };
}

/** Inserts the first version of a new value lineage (lineage id = its own id). */
export async function addValue(manager: EntityManager, value: NewValue): Promise<ThermoValue> {
  const id = value.id ?? randomUUID();
  return manager.save(ThermoValue, manager.create(ThermoValue, { ...value, id, lineageId: id, versionNo: 1, supersedesId: null, isRetired: false, retiredReason: null }));
}

/**
 * Inserts a new version of the value `previousId` (which must be the lineage's latest version),
 * copying everything not given in `changes`. The previous version stays as it was, queryable under
 * every release that holds it.
 */
export async function reviseValue(manager: EntityManager, previousId: string, changes: ValueRevision & { id?: string }): Promise<ThermoValue> {
  const previous = await manager.findOneByOrFail(ThermoValue, { id: previousId });
  return manager.save(ThermoValue, manager.create(ThermoValue, {
    ...carriedOver(previous),
    ...changes,
    id: changes.id ?? randomUUID(),
    lineageId: previous.lineageId,
    versionNo: previous.versionNo + 1,
    supersedesId: previous.id,
    isRetired: false,
    retiredReason: null,
  }));
}

/** Records that a value lineage is withdrawn from use (a release then leaves it out). */
export async function retireValue(
  manager: EntityManager,
  previousId: string,
  reason: string,
  by: { enteredBy?: string | null; approvedBy?: string | null; proposalItemId?: string | null; id?: string } = {},
): Promise<ThermoValue> {
  const previous = await manager.findOneByOrFail(ThermoValue, { id: previousId });
  return manager.save(ThermoValue, manager.create(ThermoValue, {
    ...carriedOver(previous),
    enteredBy: by.enteredBy ?? null,
    approvedBy: by.approvedBy ?? null,
    proposalItemId: by.proposalItemId ?? null,
    notes: null,
    id: by.id ?? randomUUID(),
    lineageId: previous.lineageId,
    versionNo: previous.versionNo + 1,
    supersedesId: previous.id,
    isRetired: true,
    retiredReason: reason,
  }));
}

/** Every version of a value lineage, oldest first. */
export function valueHistory(manager: EntityManager, lineageId: string): Promise<ThermoValue[]> {
  return manager.find(ThermoValue, { where: { lineageId }, order: { versionNo: 'ASC' } });
}

/** Inserts the first version of a new heat-capacity fit lineage. */
export async function addFit(manager: EntityManager, fit: NewFit): Promise<HeatCapacityFit> {
  const id = fit.id ?? randomUUID();
  return manager.save(HeatCapacityFit, manager.create(HeatCapacityFit, { ...fit, id, lineageId: id, versionNo: 1, supersedesId: null, isRetired: false, retiredReason: null }));
}

/** Inserts a new version of the fit `previousId` (a replacement fit, possibly of another form). */
export async function reviseFit(manager: EntityManager, previousId: string, changes: FitRevision & { id?: string }): Promise<HeatCapacityFit> {
  const previous = await manager.findOneByOrFail(HeatCapacityFit, { id: previousId });
  return manager.save(HeatCapacityFit, manager.create(HeatCapacityFit, {
    ...carriedOver(previous),
    ...changes,
    id: changes.id ?? randomUUID(),
    lineageId: previous.lineageId,
    versionNo: previous.versionNo + 1,
    supersedesId: previous.id,
    isRetired: false,
    retiredReason: null,
  }));
}

/** Every version of a fit lineage, oldest first. */
export function fitHistory(manager: EntityManager, lineageId: string): Promise<HeatCapacityFit[]> {
  return manager.find(HeatCapacityFit, { where: { lineageId }, order: { versionNo: 'ASC' } });
}
