import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { User } from '../accounts/user.entity';
import { Source } from '../sources/source.entity';
import { SpeciesPhase } from '../species/species-phase.entity';
import { Species } from '../species/species.entity';
import { addValue, type NewValue } from '../values/value-versions';

/**
 * A small catalogue of the specs' own, created inside the spec's rolled-back transaction so that
 * no spec depends on the demo data. Names carry a random tag: the shared database also holds the
 * demo set, and unique keys must not collide with it.
 *
 * The numbers are arbitrary test inputs, not reference values.
 */
export async function catalogueFixture(manager: EntityManager) {
  const tag = randomUUID().slice(0, 8);
  const author = await manager.save(User, manager.create(User, { email: `author-${tag}@fixture.test`, displayName: 'Fixture Author', roles: ['steward'] }));
  const reviewer = await manager.save(User, manager.create(User, { email: `reviewer-${tag}@fixture.test`, displayName: 'Fixture Reviewer', roles: ['reviewer'] }));
  const source = await manager.save(Source, manager.create(Source, { shortKey: `fixture-${tag}`, title: 'Fixture source', year: 2026, csl: { type: 'report', title: 'Fixture source' } }));
  const species = await manager.save(Species, manager.create(Species, {
    formula: 'XeF2', hillFormula: 'F2Xe', composition: { F: 2, Xe: 1 }, molarMass: 169.29, name: `fixture species ${tag}`,
  }));
  const gas = await manager.save(SpeciesPhase, manager.create(SpeciesPhase, { speciesId: species.id, phase: 'g' }));
  const solid = await manager.save(SpeciesPhase, manager.create(SpeciesPhase, { speciesId: species.id, phase: 'cr' }));

  /** A value of the gas phase with sensible defaults; override what the spec is about. */
  const value = (overrides: Partial<NewValue> = {}) => addValue(manager, {
    speciesPhaseId: gas.id,
    quantity: 'dfH',
    transitionKind: null,
    transitionLabel: null,
    valueSi: -107000,
    uncertaintySi: 1000,
    uncertaintyKind: 'standard',
    coverageFactor: null,
    temperatureK: 298.15,
    pressurePa: 100000,
    method: 'measured',
    levelOfTheory: null,
    sourceId: source.id,
    sourceLocator: null,
    enteredValue: '-107.0 ± 1.0',
    enteredUnit: 'kJ/mol',
    enteredBy: author.id,
    approvedBy: reviewer.id,
    proposalItemId: null,
    notes: null,
    ...overrides,
  });

  return { tag, author, reviewer, source, species, gas, solid, value };
}

export type CatalogueFixture = Awaited<ReturnType<typeof catalogueFixture>>;
