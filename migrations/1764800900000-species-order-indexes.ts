import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Indexes for paging through species in the orders the search API offers (name, molar mass):
 * with them a page is an index range scan that stops after the page, instead of a sort of the
 * whole catalogue. The Hill-formula order uses species_hill_formula.
 */
export class SpeciesOrderIndexes1764800900000 implements MigrationInterface {
  name = 'SpeciesOrderIndexes1764800900000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE INDEX species_name_order ON species (lower(name), id)`);
    await q.query(`CREATE INDEX species_molar_mass_order ON species (molar_mass, id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX species_molar_mass_order`);
    await q.query(`DROP INDEX species_name_order`);
  }
}
