import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Extension and helper functions the later migrations build on: trigram search (pg_trgm from
 * postgresql-contrib; a trusted extension, so a database owner may create it), the CAS Registry
 * Number check digit, element-composition checks, heat-capacity-fit range checks and the generic
 * trigger functions (version bump, append-only refusal).
 *
 * Every object is prefixed `kx_` so that `down()` can name exactly what it drops.
 */
export class DatabaseFunctions1764800000000 implements MigrationInterface {
  name = 'DatabaseFunctions1764800000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE EXTENSION IF NOT EXISTS pg_trgm`);

    // CAS RN: 2–7 digits, 2 digits, 1 check digit; the check digit is the sum of the other digits
    // weighted 1, 2, 3 … from the right, modulo 10 (the registry's published rule).
    await q.query(`
      CREATE FUNCTION kx_cas_rn_is_valid(rn text) RETURNS boolean
      LANGUAGE plpgsql IMMUTABLE STRICT PARALLEL SAFE AS $$
      DECLARE
        digits text;
        n integer;
        total integer := 0;
      BEGIN
        IF rn !~ '^[1-9][0-9]{1,6}-[0-9]{2}-[0-9]$' THEN
          RETURN false;
        END IF;
        digits := replace(rn, '-', '');
        n := length(digits);
        FOR i IN 1 .. n - 1 LOOP
          total := total + (n - i) * substr(digits, i, 1)::integer;
        END LOOP;
        RETURN total % 10 = substr(digits, n, 1)::integer;
      END $$`);

    // Declared IMMUTABLE (array_to_string is only STABLE in general, but for text[] it is
    // immutable) so that the synonyms can carry a trigram expression index.
    await q.query(`
      CREATE FUNCTION kx_text_array_to_text(items text[]) RETURNS text
      LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$ SELECT array_to_string(items, ' ') $$`);

    // Composition: {"C": 1, "H": 4}; symbols look like element symbols, counts are positive
    // numbers (fractional counts are allowed for non-stoichiometric phases such as Fe0.947O).
    await q.query(`
      CREATE FUNCTION kx_composition_is_valid(composition jsonb) RETURNS boolean
      LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$
        SELECT jsonb_typeof(composition) = 'object'
           AND NOT EXISTS (
             SELECT 1 FROM jsonb_each(composition) AS e(symbol, count)
              WHERE e.symbol !~ '^[A-Z][a-z]{0,2}$'
                 OR CASE WHEN jsonb_typeof(e.count) = 'number' THEN (e.count #>> '{}')::numeric <= 0 ELSE true END)
      $$`);

    await q.query(`
      CREATE FUNCTION kx_composition_elements(composition jsonb) RETURNS text[]
      LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$
        SELECT CASE WHEN jsonb_typeof(composition) = 'object'
          THEN (SELECT coalesce(array_agg(k ORDER BY k), '{}'::text[]) FROM jsonb_object_keys(composition) AS k)
          ELSE '{}'::text[] END
      $$`);

    // Heat-capacity fit ranges: a JSON array of {tMin, tMax, coefficients} (or {tMin, tMax,
    // points: [[T, Cp], …]} for tabulated data), contiguous from the fit's Tmin to its Tmax.
    // The same rules are checked in TypeScript (api/src/values/fit-ranges.ts) with messages.
    await q.query(`
      CREATE FUNCTION kx_fit_ranges_are_valid(form text, ranges jsonb, t_min double precision, t_max double precision)
      RETURNS boolean LANGUAGE plpgsql IMMUTABLE PARALLEL SAFE AS $$
      DECLARE
        r jsonb;
        expected_count integer;
        previous_t_max double precision := NULL;
        lo double precision;
        hi double precision;
        point jsonb;
        previous_t double precision;
      BEGIN
        IF jsonb_typeof(ranges) IS DISTINCT FROM 'array' THEN RETURN false; END IF;
        IF jsonb_array_length(ranges) = 0 THEN RETURN false; END IF;
        expected_count := CASE form WHEN 'constant' THEN 1 WHEN 'shomate' THEN 8 WHEN 'nasa7' THEN 7 WHEN 'nasa9' THEN 9 ELSE NULL END;
        FOR r IN SELECT value FROM jsonb_array_elements(ranges) LOOP
          IF jsonb_typeof(r) <> 'object' THEN RETURN false; END IF;
          IF jsonb_typeof(r -> 'tMin') IS DISTINCT FROM 'number' OR jsonb_typeof(r -> 'tMax') IS DISTINCT FROM 'number' THEN
            RETURN false;
          END IF;
          lo := (r ->> 'tMin')::double precision;
          hi := (r ->> 'tMax')::double precision;
          IF lo <= 0 OR hi <= lo THEN RETURN false; END IF;
          IF previous_t_max IS NULL THEN
            IF lo <> t_min THEN RETURN false; END IF;
          ELSIF lo <> previous_t_max THEN
            RETURN false;
          END IF;
          previous_t_max := hi;
          IF form = 'tabulated' THEN
            IF jsonb_typeof(r -> 'points') IS DISTINCT FROM 'array' THEN RETURN false; END IF;
            IF jsonb_array_length(r -> 'points') < 2 THEN RETURN false; END IF;
            previous_t := NULL;
            FOR point IN SELECT value FROM jsonb_array_elements(r -> 'points') LOOP
              IF jsonb_typeof(point) <> 'array' OR jsonb_array_length(point) <> 2 THEN RETURN false; END IF;
              IF jsonb_typeof(point -> 0) <> 'number' OR jsonb_typeof(point -> 1) <> 'number' THEN RETURN false; END IF;
              IF (point ->> 0)::double precision < lo OR (point ->> 0)::double precision > hi
                 OR (point ->> 1)::double precision <= 0
                 OR (previous_t IS NOT NULL AND (point ->> 0)::double precision <= previous_t) THEN
                RETURN false;
              END IF;
              previous_t := (point ->> 0)::double precision;
            END LOOP;
          ELSE
            IF expected_count IS NULL OR jsonb_typeof(r -> 'coefficients') IS DISTINCT FROM 'array' THEN
              RETURN false;
            END IF;
            IF jsonb_array_length(r -> 'coefficients') <> expected_count
               OR EXISTS (SELECT 1 FROM jsonb_array_elements(r -> 'coefficients') c WHERE jsonb_typeof(c) <> 'number') THEN
              RETURN false;
            END IF;
          END IF;
        END LOOP;
        RETURN previous_t_max = t_max;
      END $$`);

    // Mutable rows: every UPDATE, by TypeORM or by hand, bumps the optimistic-locking version, so
    // a stale writer's "WHERE version = n" matches nothing. The modification time follows the
    // clock unless the statement sets it itself (imports keep their original times).
    await q.query(`
      CREATE FUNCTION kx_bump_version() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        NEW.version := OLD.version + 1;
        IF NEW.updated_at IS NOT DISTINCT FROM OLD.updated_at THEN
          NEW.updated_at := now();
        END IF;
        RETURN NEW;
      END $$`);

    await q.query(`
      CREATE FUNCTION kx_touch_updated_at() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF NEW.updated_at IS NOT DISTINCT FROM OLD.updated_at THEN
          NEW.updated_at := now();
        END IF;
        RETURN NEW;
      END $$`);

    // Append-only tables: refuses UPDATE, DELETE and TRUNCATE. TG_ARGV[0] says what to do instead.
    await q.query(`
      CREATE FUNCTION kx_refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        RAISE EXCEPTION '% on % is not allowed: %', TG_OP, TG_TABLE_NAME, TG_ARGV[0]
          USING HINT = 'This table keeps history; rows are only ever added.';
      END $$`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP FUNCTION kx_refuse_change()`);
    await q.query(`DROP FUNCTION kx_touch_updated_at()`);
    await q.query(`DROP FUNCTION kx_bump_version()`);
    await q.query(`DROP FUNCTION kx_fit_ranges_are_valid(text, jsonb, double precision, double precision)`);
    await q.query(`DROP FUNCTION kx_composition_elements(jsonb)`);
    await q.query(`DROP FUNCTION kx_composition_is_valid(jsonb)`);
    await q.query(`DROP FUNCTION kx_text_array_to_text(text[])`);
    await q.query(`DROP FUNCTION kx_cas_rn_is_valid(text)`);
    await q.query(`DROP EXTENSION IF EXISTS pg_trgm`);
  }
}
