import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * An index on species synonyms, case ignored, so that finding the species a list of names can
 * mean (bulk import, 5 000 rows at a time) looks up those names instead of reading every species
 * of the rows' formulas. `kx_lower_all` lowers each element, as `lower()` lowers one name.
 */
export class SpeciesSynonymIndex1764801200000 implements MigrationInterface {
  name = 'SpeciesSynonymIndex1764801200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE FUNCTION kx_lower_all(texts text[]) RETURNS text[]
        LANGUAGE sql IMMUTABLE STRICT PARALLEL SAFE
        AS $$ SELECT coalesce(array_agg(lower(t)), '{}') FROM unnest(texts) AS t $$`);
    await q.query(`CREATE INDEX species_synonyms_lower ON species USING gin (kx_lower_all(synonyms))`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX species_synonyms_lower`);
    await q.query(`DROP FUNCTION kx_lower_all(text[])`);
  }
}
