import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The editorial workflow's records (proposals, their items, reviews, comments, evidence files)
 * and releases with their membership.
 *
 * A release lists every value and fit version it contains (a complete snapshot, not a delta), so
 * "as of release R" is one indexed lookup. Published releases are immutable in the database:
 * triggers refuse UPDATE/DELETE of a published release row and any INSERT/UPDATE/DELETE of its
 * membership, whoever sends the SQL.
 */
export class EditorialAndReleases1764800300000 implements MigrationInterface {
  name = 'EditorialAndReleases1764800300000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE releases (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        label text NOT NULL,
        notes text NOT NULL DEFAULT '',
        status text NOT NULL DEFAULT 'preparing',
        change_log jsonb,
        created_by uuid REFERENCES users (id) ON DELETE SET NULL,
        published_by uuid REFERENCES users (id),
        published_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1,
        CONSTRAINT releases_label_unique UNIQUE (label),
        CONSTRAINT releases_label_format CHECK (label ~ '^[0-9]{4}\\.[1-9][0-9]*$'),
        CONSTRAINT releases_status_known CHECK (status IN ('preparing', 'published')),
        CONSTRAINT releases_published_at CHECK ((status = 'published') = (published_at IS NOT NULL)),
        CONSTRAINT releases_change_log_object CHECK (change_log IS NULL OR jsonb_typeof(change_log) = 'object')
      )`);

    await q.query(`
      CREATE TABLE proposals (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        title text NOT NULL,
        summary text NOT NULL DEFAULT '',
        state text NOT NULL DEFAULT 'draft',
        author_id uuid NOT NULL REFERENCES users (id),
        release_id uuid REFERENCES releases (id) ON DELETE SET NULL,
        submitted_at timestamptz,
        decided_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1,
        CONSTRAINT proposals_title_present CHECK (length(btrim(title)) BETWEEN 1 AND 300),
        CONSTRAINT proposals_state_known CHECK (state IN ('draft', 'submitted', 'in_review', 'changes_requested', 'resubmitted',
                                                          'approved', 'released', 'rejected', 'withdrawn')),
        CONSTRAINT proposals_submitted_at CHECK (state IN ('draft', 'withdrawn') OR submitted_at IS NOT NULL),
        CONSTRAINT proposals_released_in_release CHECK (state <> 'released' OR release_id IS NOT NULL)
      )`);
    await q.query(`CREATE INDEX proposals_state ON proposals (state, updated_at)`);
    await q.query(`CREATE INDEX proposals_author ON proposals (author_id)`);
    await q.query(`CREATE INDEX proposals_release ON proposals (release_id)`);
    await q.query(`CREATE TRIGGER proposals_bump_version BEFORE UPDATE ON proposals FOR EACH ROW EXECUTE FUNCTION kx_bump_version()`);

    await q.query(`
      CREATE TABLE proposal_items (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        proposal_id uuid NOT NULL REFERENCES proposals (id) ON DELETE CASCADE,
        position integer NOT NULL,
        kind text NOT NULL,
        payload jsonb NOT NULL DEFAULT '{}',
        source_id uuid REFERENCES sources (id),
        species_id uuid REFERENCES species (id),
        species_phase_id uuid REFERENCES species_phases (id),
        target_value_id uuid REFERENCES thermo_values (id),
        target_fit_id uuid REFERENCES heat_capacity_fits (id),
        result_species_id uuid REFERENCES species (id),
        result_species_phase_id uuid REFERENCES species_phases (id),
        result_value_id uuid REFERENCES thermo_values (id),
        result_fit_id uuid REFERENCES heat_capacity_fits (id),
        checks jsonb,
        checks_ran_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT proposal_items_position_unique UNIQUE (proposal_id, position) DEFERRABLE INITIALLY IMMEDIATE,
        CONSTRAINT proposal_items_id_proposal_unique UNIQUE (id, proposal_id),
        CONSTRAINT proposal_items_position_positive CHECK (position >= 1),
        CONSTRAINT proposal_items_kind_known CHECK (kind IN ('add_species', 'add_phase', 'add_value', 'revise_value', 'retire_value',
                                                             'add_fit', 'replace_fit', 'recommend')),
        CONSTRAINT proposal_items_payload_object CHECK (jsonb_typeof(payload) = 'object'),
        CONSTRAINT proposal_items_source_required CHECK (kind NOT IN ('add_value', 'revise_value', 'add_fit', 'replace_fit') OR source_id IS NOT NULL),
        CONSTRAINT proposal_items_value_target CHECK (kind NOT IN ('revise_value', 'retire_value') OR target_value_id IS NOT NULL),
        CONSTRAINT proposal_items_fit_target CHECK (kind <> 'replace_fit' OR target_fit_id IS NOT NULL),
        CONSTRAINT proposal_items_checks_array CHECK (checks IS NULL OR jsonb_typeof(checks) = 'array')
      )`);
    await q.query(`CREATE INDEX proposal_items_target_value ON proposal_items (target_value_id)`);
    await q.query(`CREATE INDEX proposal_items_species_phase ON proposal_items (species_phase_id)`);
    await q.query(`CREATE TRIGGER proposal_items_touch BEFORE UPDATE ON proposal_items FOR EACH ROW EXECUTE FUNCTION kx_touch_updated_at()`);

    // Which proposal item brought a value or fit in (null for the reference set loaded in bulk).
    await q.query(`ALTER TABLE thermo_values ADD CONSTRAINT thermo_values_proposal_item_fk FOREIGN KEY (proposal_item_id) REFERENCES proposal_items (id)`);
    await q.query(`ALTER TABLE heat_capacity_fits ADD CONSTRAINT heat_capacity_fits_proposal_item_fk FOREIGN KEY (proposal_item_id) REFERENCES proposal_items (id)`);

    await q.query(`
      CREATE TABLE proposal_reviews (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        proposal_id uuid NOT NULL REFERENCES proposals (id),
        reviewer_id uuid NOT NULL REFERENCES users (id),
        decision text NOT NULL,
        comment text NOT NULL DEFAULT '',
        check_override_justification text,
        proposal_version integer,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT proposal_reviews_decision_known CHECK (decision IN ('approve', 'request_changes', 'reject')),
        CONSTRAINT proposal_reviews_justification_present CHECK (check_override_justification IS NULL OR length(btrim(check_override_justification)) > 0)
      )`);
    await q.query(`CREATE INDEX proposal_reviews_proposal ON proposal_reviews (proposal_id, created_at)`);
    await q.query(`CREATE INDEX proposal_reviews_reviewer ON proposal_reviews (reviewer_id)`);
    // Four-eyes rule, in the database as well as in the API.
    await q.query(`
      CREATE FUNCTION kx_proposal_reviews_four_eyes() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF EXISTS (SELECT 1 FROM proposals WHERE id = NEW.proposal_id AND author_id = NEW.reviewer_id) THEN
          RAISE EXCEPTION 'Nobody reviews their own proposal'
            USING CONSTRAINT = 'proposal_reviews_four_eyes';
        END IF;
        RETURN NEW;
      END $$`);
    await q.query(`CREATE TRIGGER proposal_reviews_four_eyes BEFORE INSERT OR UPDATE ON proposal_reviews FOR EACH ROW EXECUTE FUNCTION kx_proposal_reviews_four_eyes()`);

    await q.query(`
      CREATE TABLE proposal_comments (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        proposal_id uuid NOT NULL REFERENCES proposals (id) ON DELETE CASCADE,
        proposal_item_id uuid,
        author_id uuid NOT NULL REFERENCES users (id),
        body text NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        edited_at timestamptz,
        CONSTRAINT proposal_comments_item_of_proposal FOREIGN KEY (proposal_item_id, proposal_id)
          REFERENCES proposal_items (id, proposal_id) ON DELETE CASCADE,
        CONSTRAINT proposal_comments_body_present CHECK (length(btrim(body)) BETWEEN 1 AND 20000)
      )`);
    await q.query(`CREATE INDEX proposal_comments_proposal ON proposal_comments (proposal_id, created_at)`);

    await q.query(`
      CREATE TABLE evidence_files (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        source_id uuid REFERENCES sources (id),
        proposal_item_id uuid REFERENCES proposal_items (id),
        file_name text NOT NULL,
        media_type text NOT NULL,
        size_bytes bigint NOT NULL,
        sha256 text NOT NULL,
        object_key text NOT NULL,
        description text,
        uploaded_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT evidence_files_object_key_unique UNIQUE (object_key),
        CONSTRAINT evidence_files_attached CHECK (source_id IS NOT NULL OR proposal_item_id IS NOT NULL),
        CONSTRAINT evidence_files_file_name CHECK (length(file_name) BETWEEN 1 AND 255 AND file_name !~ '[/\\\\[:cntrl:]]'),
        CONSTRAINT evidence_files_media_type CHECK (media_type ~ '^[a-z0-9][a-z0-9!#$&^_.+-]*/[a-z0-9][a-z0-9!#$&^_.+-]*$'),
        CONSTRAINT evidence_files_size_nonnegative CHECK (size_bytes >= 0),
        CONSTRAINT evidence_files_sha256_format CHECK (sha256 ~ '^[0-9a-f]{64}$')
      )`);
    await q.query(`CREATE INDEX evidence_files_source ON evidence_files (source_id)`);
    await q.query(`CREATE INDEX evidence_files_proposal_item ON evidence_files (proposal_item_id)`);

    await q.query(`
      CREATE TABLE release_members (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        release_id uuid NOT NULL REFERENCES releases (id) ON DELETE CASCADE,
        member_kind text NOT NULL,
        value_id uuid REFERENCES thermo_values (id),
        fit_id uuid REFERENCES heat_capacity_fits (id),
        lineage_id uuid NOT NULL,
        species_phase_id uuid NOT NULL REFERENCES species_phases (id),
        quantity text NOT NULL,
        transition_kind text,
        is_recommended boolean NOT NULL DEFAULT false,
        proposal_id uuid REFERENCES proposals (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT release_members_kind_known CHECK (member_kind IN ('value', 'fit')),
        CONSTRAINT release_members_one_target CHECK (num_nonnulls(value_id, fit_id) = 1
                                                     AND (member_kind = 'value') = (value_id IS NOT NULL)),
        CONSTRAINT release_members_lineage_unique UNIQUE (release_id, lineage_id)
      )`);
    await q.query(`
      CREATE UNIQUE INDEX release_members_one_recommended ON release_members
        (release_id, species_phase_id, member_kind, quantity, coalesce(transition_kind, ''))
        WHERE is_recommended`);
    await q.query(`CREATE INDEX release_members_release_species_phase ON release_members (release_id, species_phase_id)`);
    await q.query(`CREATE INDEX release_members_value ON release_members (value_id)`);
    await q.query(`CREATE INDEX release_members_fit ON release_members (fit_id)`);

    // Releases: created in preparation, published by an UPDATE (which checks that every group of
    // alternatives has exactly one recommended member), then frozen.
    await q.query(`
      CREATE FUNCTION kx_releases_guard() RETURNS trigger LANGUAGE plpgsql AS $$
      DECLARE
        missing record;
      BEGIN
        IF TG_OP = 'INSERT' THEN
          IF NEW.status = 'published' THEN
            RAISE EXCEPTION 'A release is created in preparation and published afterwards'
              USING CONSTRAINT = 'releases_published_immutable';
          END IF;
          RETURN NEW;
        END IF;
        IF OLD.status = 'published' THEN
          RAISE EXCEPTION 'Release % is published and cannot be changed or deleted', OLD.label
            USING CONSTRAINT = 'releases_published_immutable',
                  HINT = 'Prepare a new release instead.';
        END IF;
        IF TG_OP = 'DELETE' THEN
          RETURN OLD;
        END IF;
        IF NEW.status = 'published' THEN
          SELECT m.species_phase_id, m.member_kind, m.quantity, m.transition_kind,
                 count(*) FILTER (WHERE m.is_recommended) AS recommended
            INTO missing
            FROM release_members m
           WHERE m.release_id = NEW.id
           GROUP BY m.species_phase_id, m.member_kind, m.quantity, m.transition_kind
          HAVING count(*) FILTER (WHERE m.is_recommended) <> 1
           LIMIT 1;
          IF FOUND THEN
            RAISE EXCEPTION 'Release % cannot be published: species phase % has no recommended % (%)', NEW.label,
                missing.species_phase_id, missing.member_kind, missing.quantity
              USING CONSTRAINT = 'releases_recommendation_complete',
                    HINT = 'Mark exactly one recommended member for every species phase and quantity.';
          END IF;
        END IF;
        RETURN NEW;
      END $$`);
    await q.query(`CREATE TRIGGER releases_guard BEFORE INSERT OR UPDATE OR DELETE ON releases FOR EACH ROW EXECUTE FUNCTION kx_releases_guard()`);
    await q.query(`CREATE TRIGGER releases_bump_version BEFORE UPDATE ON releases FOR EACH ROW EXECUTE FUNCTION kx_bump_version()`);

    // Membership: refused when the release is published (the row lock makes a concurrent publish
    // wait for this statement's transaction, so nothing slips in); the denormalised subject columns
    // are copied from the value or fit, so they cannot disagree with it.
    await q.query(`
      CREATE FUNCTION kx_release_members_guard() RETURNS trigger LANGUAGE plpgsql AS $$
      DECLARE
        release_row record;
        target record;
      BEGIN
        IF TG_OP IN ('UPDATE', 'DELETE') THEN
          SELECT label, status INTO release_row FROM releases WHERE id = OLD.release_id FOR SHARE;
          IF release_row.status = 'published' THEN
            RAISE EXCEPTION 'Release % is published; its membership cannot be changed', release_row.label
              USING CONSTRAINT = 'release_members_published_immutable';
          END IF;
        END IF;
        IF TG_OP = 'DELETE' THEN
          RETURN OLD;
        END IF;
        SELECT label, status INTO release_row FROM releases WHERE id = NEW.release_id FOR SHARE;
        IF release_row.status = 'published' THEN
          RAISE EXCEPTION 'Release % is published; its membership cannot be changed', release_row.label
            USING CONSTRAINT = 'release_members_published_immutable';
        END IF;
        IF num_nonnulls(NEW.value_id, NEW.fit_id) <> 1 THEN
          RETURN NEW; -- release_members_one_target reports it
        END IF;
        IF NEW.value_id IS NOT NULL THEN
          SELECT species_phase_id, quantity, transition_kind, lineage_id, is_retired INTO target FROM thermo_values WHERE id = NEW.value_id;
          IF NOT FOUND THEN
            RAISE EXCEPTION 'Value % does not exist', NEW.value_id USING CONSTRAINT = 'release_members_value_id_fkey';
          END IF;
          NEW.member_kind := 'value';
        ELSE
          SELECT species_phase_id, 'Cp'::text AS quantity, NULL::text AS transition_kind, lineage_id, is_retired INTO target
            FROM heat_capacity_fits WHERE id = NEW.fit_id;
          IF NOT FOUND THEN
            RAISE EXCEPTION 'Heat-capacity fit % does not exist', NEW.fit_id USING CONSTRAINT = 'release_members_fit_id_fkey';
          END IF;
          NEW.member_kind := 'fit';
        END IF;
        IF target.is_retired THEN
          RAISE EXCEPTION 'A retirement record cannot be a release member; leave the lineage out of the release instead'
            USING CONSTRAINT = 'release_members_not_retired';
        END IF;
        NEW.quantity := target.quantity;
        NEW.transition_kind := target.transition_kind;
        NEW.species_phase_id := target.species_phase_id;
        NEW.lineage_id := target.lineage_id;
        RETURN NEW;
      END $$`);
    await q.query(`CREATE TRIGGER release_members_guard BEFORE INSERT OR UPDATE OR DELETE ON release_members FOR EACH ROW EXECUTE FUNCTION kx_release_members_guard()`);
    await q.query(`
      CREATE FUNCTION kx_release_members_truncate_guard() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF EXISTS (SELECT 1 FROM releases WHERE status = 'published') THEN
          RAISE EXCEPTION 'TRUNCATE of release_members is not allowed while published releases exist'
            USING CONSTRAINT = 'release_members_published_immutable';
        END IF;
        RETURN NULL;
      END $$`);
    await q.query(`CREATE TRIGGER release_members_truncate_guard BEFORE TRUNCATE ON release_members FOR EACH STATEMENT EXECUTE FUNCTION kx_release_members_truncate_guard()`);
    await q.query(`CREATE TRIGGER releases_truncate_guard BEFORE TRUNCATE ON releases FOR EACH STATEMENT EXECUTE FUNCTION kx_release_members_truncate_guard()`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE release_members`);
    await q.query(`DROP TABLE evidence_files`);
    await q.query(`DROP TABLE proposal_comments`);
    await q.query(`DROP TABLE proposal_reviews`);
    await q.query(`ALTER TABLE heat_capacity_fits DROP CONSTRAINT heat_capacity_fits_proposal_item_fk`);
    await q.query(`ALTER TABLE thermo_values DROP CONSTRAINT thermo_values_proposal_item_fk`);
    await q.query(`DROP TABLE proposal_items`);
    await q.query(`DROP TABLE proposals`);
    await q.query(`DROP TABLE releases`);
    await q.query(`DROP FUNCTION kx_release_members_truncate_guard()`);
    await q.query(`DROP FUNCTION kx_release_members_guard()`);
    await q.query(`DROP FUNCTION kx_releases_guard()`);
    await q.query(`DROP FUNCTION kx_proposal_reviews_four_eyes()`);
  }
}
