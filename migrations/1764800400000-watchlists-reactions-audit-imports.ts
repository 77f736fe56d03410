import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What engineers keep (watched species, saved reactions with their terms), the append-only audit
 * trail, and bulk-import jobs.
 */
export class WatchlistsReactionsAuditImports1764800400000 implements MigrationInterface {
  name = 'WatchlistsReactionsAuditImports1764800400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE watches (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        species_id uuid NOT NULL REFERENCES species (id) ON DELETE CASCADE,
        notify_by_email boolean NOT NULL DEFAULT true,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT watches_user_species_unique UNIQUE (user_id, species_id)
      )`);
    await q.query(`CREATE INDEX watches_species ON watches (species_id)`);

    await q.query(`
      CREATE TABLE saved_reactions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        name text NOT NULL,
        equation text NOT NULL,
        temperatures_k double precision[] NOT NULL DEFAULT '{298.15}',
        pinned_release_id uuid REFERENCES releases (id) ON DELETE SET NULL,
        notes text,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1,
        CONSTRAINT saved_reactions_user_name_unique UNIQUE (user_id, name),
        CONSTRAINT saved_reactions_name_present CHECK (length(btrim(name)) BETWEEN 1 AND 200),
        CONSTRAINT saved_reactions_equation_present CHECK (length(btrim(equation)) BETWEEN 1 AND 2000),
        CONSTRAINT saved_reactions_temperatures CHECK (cardinality(temperatures_k) BETWEEN 1 AND 500
                                                       AND array_position(temperatures_k, NULL) IS NULL
                                                       AND 0 < ALL (temperatures_k) AND 'Infinity' > ALL (temperatures_k))
      )`);
    await q.query(`CREATE TRIGGER saved_reactions_bump_version BEFORE UPDATE ON saved_reactions FOR EACH ROW EXECUTE FUNCTION kx_bump_version()`);

    // The species phases a saved reaction uses, with stoichiometric numbers (negative for
    // reactants), so that "which saved reactions does this revision touch" is a join.
    await q.query(`
      CREATE TABLE saved_reaction_terms (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        saved_reaction_id uuid NOT NULL REFERENCES saved_reactions (id) ON DELETE CASCADE,
        species_phase_id uuid NOT NULL REFERENCES species_phases (id) ON DELETE CASCADE,
        coefficient double precision NOT NULL,
        CONSTRAINT saved_reaction_terms_unique UNIQUE (saved_reaction_id, species_phase_id),
        CONSTRAINT saved_reaction_terms_coefficient CHECK (coefficient <> 0 AND coefficient > '-Infinity' AND coefficient < 'Infinity')
      )`);
    await q.query(`CREATE INDEX saved_reaction_terms_species_phase ON saved_reaction_terms (species_phase_id)`);

    // No foreign keys: the trail must outlive every record it mentions, and users are never
    // deleted through it. actor_label keeps the e-mail as it was at the time.
    await q.query(`
      CREATE TABLE audit_entries (
        id bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
        occurred_at timestamptz NOT NULL DEFAULT now(),
        actor_user_id uuid,
        actor_api_key_id uuid,
        actor_label text,
        action text NOT NULL,
        entity_type text,
        entity_id text,
        details jsonb NOT NULL DEFAULT '{}',
        ip_address inet,
        user_agent text,
        request_id text,
        CONSTRAINT audit_entries_action_format CHECK (action ~ '^[a-z][a-z0-9_]*(\\.[a-z][a-z0-9_]*)+$'),
        CONSTRAINT audit_entries_details_object CHECK (jsonb_typeof(details) = 'object'),
        CONSTRAINT audit_entries_entity CHECK ((entity_type IS NULL) = (entity_id IS NULL))
      )`);
    await q.query(`CREATE INDEX audit_entries_occurred ON audit_entries (occurred_at)`);
    await q.query(`CREATE INDEX audit_entries_entity ON audit_entries (entity_type, entity_id, occurred_at)`);
    await q.query(`CREATE INDEX audit_entries_actor ON audit_entries (actor_user_id, occurred_at)`);
    await q.query(`CREATE INDEX audit_entries_action ON audit_entries (action, occurred_at)`);
    await q.query(`
      CREATE TRIGGER audit_entries_append_only BEFORE UPDATE OR DELETE ON audit_entries FOR EACH ROW
      EXECUTE FUNCTION kx_refuse_change('the audit trail is append-only')`);
    await q.query(`
      CREATE TRIGGER audit_entries_no_truncate BEFORE TRUNCATE ON audit_entries FOR EACH STATEMENT
      EXECUTE FUNCTION kx_refuse_change('the audit trail is append-only')`);

    await q.query(`
      CREATE TABLE import_jobs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        created_by uuid NOT NULL REFERENCES users (id),
        file_name text NOT NULL,
        format text NOT NULL,
        dry_run boolean NOT NULL DEFAULT false,
        status text NOT NULL DEFAULT 'queued',
        total_rows integer,
        processed_rows integer NOT NULL DEFAULT 0,
        error_count integer NOT NULL DEFAULT 0,
        errors jsonb NOT NULL DEFAULT '[]',
        object_key text,
        proposal_id uuid REFERENCES proposals (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        started_at timestamptz,
        finished_at timestamptz,
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT import_jobs_format_known CHECK (format IN ('csv', 'xml')),
        CONSTRAINT import_jobs_status_known CHECK (status IN ('queued', 'running', 'succeeded', 'failed', 'cancelled')),
        CONSTRAINT import_jobs_counts CHECK (processed_rows >= 0 AND error_count >= 0 AND (total_rows IS NULL OR (total_rows >= 0 AND processed_rows <= total_rows))),
        CONSTRAINT import_jobs_errors_array CHECK (jsonb_typeof(errors) = 'array'),
        CONSTRAINT import_jobs_finished CHECK (status IN ('queued', 'running') OR finished_at IS NOT NULL),
        CONSTRAINT import_jobs_dry_run_writes_nothing CHECK (NOT dry_run OR proposal_id IS NULL)
      )`);
    await q.query(`CREATE INDEX import_jobs_creator ON import_jobs (created_by, created_at)`);
    await q.query(`CREATE TRIGGER import_jobs_touch BEFORE UPDATE ON import_jobs FOR EACH ROW EXECUTE FUNCTION kx_touch_updated_at()`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE import_jobs`);
    await q.query(`DROP TABLE audit_entries`);
    await q.query(`DROP TABLE saved_reaction_terms`);
    await q.query(`DROP TABLE saved_reactions`);
    await q.query(`DROP TABLE watches`);
  }
}
