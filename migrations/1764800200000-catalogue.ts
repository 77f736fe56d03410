import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The catalogue: species, a species in a phase, sources, and the versioned data (thermochemical
 * values and heat-capacity fits).
 *
 * Values and fits are append-only. A revision is a new row that supersedes the previous version of
 * the same lineage (same species phase and quantity); retiring is a row too. A trigger fills and
 * checks the version chain on INSERT, another refuses every UPDATE and DELETE.
 *
 * Numbers are stored in SI as double precision (the engine computes in float64): J/mol for ΔfH°,
 * ΔfG° and ΔtrsH, J/(mol·K) for S° and Cp°, K, Pa. The value exactly as entered (text and unit)
 * is kept beside it for provenance.
 */
export class Catalogue1764800200000 implements MigrationInterface {
  name = 'Catalogue1764800200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE species (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        formula text NOT NULL,
        hill_formula text NOT NULL,
        charge integer NOT NULL DEFAULT 0,
        composition jsonb NOT NULL,
        element_symbols text[] NOT NULL GENERATED ALWAYS AS (kx_composition_elements(composition)) STORED,
        molar_mass double precision NOT NULL,
        name text NOT NULL,
        synonyms text[] NOT NULL DEFAULT '{}',
        inchi text,
        inchikey text,
        cas_rn text,
        smiles text,
        notes text,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1,
        CONSTRAINT species_formula_present CHECK (length(btrim(formula)) > 0),
        CONSTRAINT species_hill_formula_format CHECK (hill_formula ~ '^(e|([A-Z][a-z]{0,2}([0-9]+(\\.[0-9]+)?)?)+)([+-][0-9]*)?$'),
        CONSTRAINT species_charge_range CHECK (charge BETWEEN -20 AND 20),
        CONSTRAINT species_composition_valid CHECK (kx_composition_is_valid(composition)),
        CONSTRAINT species_molar_mass_positive CHECK (molar_mass > 0 AND molar_mass < 'Infinity'),
        CONSTRAINT species_name_present CHECK (length(btrim(name)) > 0),
        CONSTRAINT species_synonyms_no_nulls CHECK (array_position(synonyms, NULL) IS NULL),
        CONSTRAINT species_inchi_format CHECK (inchi ~ '^InChI=1S?/'),
        CONSTRAINT species_inchikey_format CHECK (inchikey ~ '^[A-Z]{14}-[A-Z]{8}[SN][A-Z]-[A-Z]$'),
        CONSTRAINT species_cas_rn_valid CHECK (kx_cas_rn_is_valid(cas_rn)),
        CONSTRAINT species_inchikey_unique UNIQUE (inchikey),
        CONSTRAINT species_cas_rn_unique UNIQUE (cas_rn)
      )`);
    await q.query(`CREATE UNIQUE INDEX species_identity_unique ON species (hill_formula, charge, lower(name))`);
    await q.query(`CREATE INDEX species_hill_formula ON species (hill_formula)`);
    await q.query(`CREATE INDEX species_element_symbols ON species USING gin (element_symbols)`);
    await q.query(`CREATE INDEX species_name_trgm ON species USING gin (name gin_trgm_ops)`);
    await q.query(`CREATE INDEX species_synonyms_trgm ON species USING gin (kx_text_array_to_text(synonyms) gin_trgm_ops)`);
    await q.query(`CREATE TRIGGER species_bump_version BEFORE UPDATE ON species FOR EACH ROW EXECUTE FUNCTION kx_bump_version()`);

    await q.query(`
      CREATE TABLE species_phases (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        species_id uuid NOT NULL REFERENCES species (id),
        phase text NOT NULL,
        polymorph text,
        is_reference_state boolean NOT NULL DEFAULT false,
        notes text,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT species_phases_phase_known CHECK (phase IN ('g', 'l', 'cr', 'am', 'aq', 'aq,inf')),
        CONSTRAINT species_phases_polymorph CHECK (polymorph IS NULL OR (phase IN ('cr', 'am', 'l') AND length(btrim(polymorph)) > 0)),
        CONSTRAINT species_phases_unique UNIQUE NULLS NOT DISTINCT (species_id, phase, polymorph)
      )`);
    await q.query(`CREATE INDEX species_phases_phase ON species_phases (phase)`);

    await q.query(`
      CREATE TABLE sources (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        short_key text NOT NULL,
        title text NOT NULL,
        year integer,
        doi text,
        csl jsonb NOT NULL DEFAULT '{}',
        notes text,
        created_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1,
        CONSTRAINT sources_short_key_unique UNIQUE (short_key),
        CONSTRAINT sources_short_key_format CHECK (short_key ~ '^[A-Za-z0-9][A-Za-z0-9_.:-]{1,63}$'),
        CONSTRAINT sources_title_present CHECK (length(btrim(title)) > 0),
        CONSTRAINT sources_year_range CHECK (year BETWEEN 1500 AND 2200),
        CONSTRAINT sources_doi_format CHECK (doi ~ '^10\\.[0-9]{4,9}/\\S+$' AND doi = lower(doi)),
        CONSTRAINT sources_doi_unique UNIQUE (doi),
        CONSTRAINT sources_csl_object CHECK (jsonb_typeof(csl) = 'object')
      )`);
    await q.query(`CREATE INDEX sources_title_trgm ON sources USING gin (title gin_trgm_ops)`);
    await q.query(`CREATE TRIGGER sources_bump_version BEFORE UPDATE ON sources FOR EACH ROW EXECUTE FUNCTION kx_bump_version()`);

    await q.query(`
      CREATE TABLE thermo_values (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        lineage_id uuid NOT NULL REFERENCES thermo_values (id),
        version_no integer NOT NULL,
        supersedes_id uuid REFERENCES thermo_values (id),
        species_phase_id uuid NOT NULL REFERENCES species_phases (id),
        quantity text NOT NULL,
        transition_kind text,
        transition_label text,
        value_si double precision NOT NULL,
        uncertainty_si double precision,
        uncertainty_kind text,
        coverage_factor double precision,
        temperature_k double precision NOT NULL,
        pressure_pa double precision NOT NULL,
        method text NOT NULL,
        level_of_theory text,
        source_id uuid NOT NULL REFERENCES sources (id),
        source_locator text,
        entered_value text NOT NULL,
        entered_unit text NOT NULL,
        entered_by uuid REFERENCES users (id),
        approved_by uuid REFERENCES users (id),
        proposal_item_id uuid,
        is_retired boolean NOT NULL DEFAULT false,
        retired_reason text,
        notes text,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT thermo_values_supersedes_once UNIQUE (supersedes_id),
        CONSTRAINT thermo_values_lineage_version_unique UNIQUE (lineage_id, version_no),
        CONSTRAINT thermo_values_version_positive CHECK (version_no >= 1),
        CONSTRAINT thermo_values_first_version CHECK ((supersedes_id IS NULL) = (version_no = 1)),
        CONSTRAINT thermo_values_first_version_lineage CHECK (supersedes_id IS NOT NULL OR lineage_id = id),
        CONSTRAINT thermo_values_quantity_known CHECK (quantity IN ('dfH', 'S', 'Cp', 'dfG', 'dtrsH')),
        CONSTRAINT thermo_values_transition_kind CHECK ((quantity = 'dtrsH') = (transition_kind IS NOT NULL)),
        CONSTRAINT thermo_values_transition_kind_known CHECK (transition_kind IN ('fus', 'vap', 'sub', 'trs')),
        CONSTRAINT thermo_values_transition_label CHECK (transition_label IS NULL OR quantity = 'dtrsH'),
        CONSTRAINT thermo_values_value_finite CHECK (value_si > '-Infinity' AND value_si < 'Infinity'),
        CONSTRAINT thermo_values_uncertainty_nonnegative CHECK (uncertainty_si >= 0 AND uncertainty_si < 'Infinity'),
        CONSTRAINT thermo_values_uncertainty_kind_stated CHECK ((uncertainty_si IS NULL) = (uncertainty_kind IS NULL)),
        CONSTRAINT thermo_values_uncertainty_kind_known CHECK (uncertainty_kind IN ('standard', 'expanded')),
        CONSTRAINT thermo_values_coverage_factor CHECK (coalesce(uncertainty_kind = 'expanded', false) = (coverage_factor IS NOT NULL)),
        CONSTRAINT thermo_values_coverage_factor_range CHECK (coverage_factor > 0 AND coverage_factor <= 10),
        CONSTRAINT thermo_values_temperature_positive CHECK (temperature_k > 0 AND temperature_k < 'Infinity'),
        CONSTRAINT thermo_values_standard_pressure CHECK (pressure_pa IN (100000, 101325)),
        CONSTRAINT thermo_values_entropy_positive CHECK (quantity <> 'S' OR value_si > 0),
        CONSTRAINT thermo_values_heat_capacity_positive CHECK (quantity <> 'Cp' OR value_si > 0),
        CONSTRAINT thermo_values_transition_endothermic CHECK (coalesce(transition_kind, 'trs') = 'trs' OR value_si > 0),
        CONSTRAINT thermo_values_method_known CHECK (method IN ('measured', 'evaluated', 'computed', 'estimated')),
        CONSTRAINT thermo_values_level_of_theory CHECK (method <> 'computed' OR coalesce(length(btrim(level_of_theory)), 0) > 0),
        CONSTRAINT thermo_values_entered_present CHECK (length(btrim(entered_value)) > 0 AND length(btrim(entered_unit)) > 0),
        CONSTRAINT thermo_values_retirement_reason CHECK (is_retired = (length(btrim(coalesce(retired_reason, ''))) > 0)),
        CONSTRAINT thermo_values_retirement_supersedes CHECK (NOT is_retired OR supersedes_id IS NOT NULL)
      )`);
    await q.query(`CREATE INDEX thermo_values_species_phase ON thermo_values (species_phase_id, quantity)`);
    await q.query(`CREATE INDEX thermo_values_source ON thermo_values (source_id)`);
    await q.query(`CREATE INDEX thermo_values_proposal_item ON thermo_values (proposal_item_id)`);

    await q.query(`
      CREATE TABLE heat_capacity_fits (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        lineage_id uuid NOT NULL REFERENCES heat_capacity_fits (id),
        version_no integer NOT NULL,
        supersedes_id uuid REFERENCES heat_capacity_fits (id),
        species_phase_id uuid NOT NULL REFERENCES species_phases (id),
        form text NOT NULL,
        t_min_k double precision NOT NULL,
        t_max_k double precision NOT NULL,
        ranges jsonb NOT NULL,
        pressure_pa double precision NOT NULL DEFAULT 100000,
        method text NOT NULL,
        level_of_theory text,
        source_id uuid NOT NULL REFERENCES sources (id),
        source_locator text,
        entered_by uuid REFERENCES users (id),
        approved_by uuid REFERENCES users (id),
        proposal_item_id uuid,
        is_retired boolean NOT NULL DEFAULT false,
        retired_reason text,
        notes text,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT heat_capacity_fits_supersedes_once UNIQUE (supersedes_id),
        CONSTRAINT heat_capacity_fits_lineage_version_unique UNIQUE (lineage_id, version_no),
        CONSTRAINT heat_capacity_fits_version_positive CHECK (version_no >= 1),
        CONSTRAINT heat_capacity_fits_first_version CHECK ((supersedes_id IS NULL) = (version_no = 1)),
        CONSTRAINT heat_capacity_fits_first_version_lineage CHECK (supersedes_id IS NOT NULL OR lineage_id = id),
        CONSTRAINT heat_capacity_fits_form_known CHECK (form IN ('constant', 'shomate', 'nasa7', 'nasa9', 'tabulated')),
        CONSTRAINT heat_capacity_fits_temperature_range CHECK (t_min_k > 0 AND t_max_k > t_min_k AND t_max_k < 'Infinity'),
        CONSTRAINT heat_capacity_fits_ranges_array CHECK (jsonb_typeof(ranges) = 'array' AND jsonb_array_length(ranges) >= 1),
        CONSTRAINT heat_capacity_fits_ranges_valid CHECK (kx_fit_ranges_are_valid(form, ranges, t_min_k, t_max_k)),
        CONSTRAINT heat_capacity_fits_standard_pressure CHECK (pressure_pa IN (100000, 101325)),
        CONSTRAINT heat_capacity_fits_method_known CHECK (method IN ('measured', 'evaluated', 'computed', 'estimated')),
        CONSTRAINT heat_capacity_fits_level_of_theory CHECK (method <> 'computed' OR coalesce(length(btrim(level_of_theory)), 0) > 0),
        CONSTRAINT heat_capacity_fits_retirement_reason CHECK (is_retired = (length(btrim(coalesce(retired_reason, ''))) > 0)),
        CONSTRAINT heat_capacity_fits_retirement_supersedes CHECK (NOT is_retired OR supersedes_id IS NOT NULL)
      )`);
    await q.query(`CREATE INDEX heat_capacity_fits_species_phase ON heat_capacity_fits (species_phase_id)`);
    await q.query(`CREATE INDEX heat_capacity_fits_source ON heat_capacity_fits (source_id)`);
    await q.query(`CREATE INDEX heat_capacity_fits_proposal_item ON heat_capacity_fits (proposal_item_id)`);

    // Version chain: a first version starts its own lineage; a later version continues the
    // lineage of the row it supersedes, with the next number and the same subject. Missing
    // lineage_id / version_no are filled in, wrong ones refused.
    await q.query(`
      CREATE FUNCTION kx_thermo_values_version_chain() RETURNS trigger LANGUAGE plpgsql AS $$
      DECLARE
        previous thermo_values%ROWTYPE;
      BEGIN
        IF NEW.supersedes_id IS NULL THEN
          NEW.lineage_id := coalesce(NEW.lineage_id, NEW.id);
          NEW.version_no := coalesce(NEW.version_no, 1);
          RETURN NEW;
        END IF;
        SELECT * INTO previous FROM thermo_values WHERE id = NEW.supersedes_id;
        IF NOT FOUND THEN
          RAISE EXCEPTION 'The value % that this version supersedes does not exist', NEW.supersedes_id
            USING CONSTRAINT = 'thermo_values_version_chain';
        END IF;
        NEW.lineage_id := coalesce(NEW.lineage_id, previous.lineage_id);
        NEW.version_no := coalesce(NEW.version_no, previous.version_no + 1);
        IF NEW.lineage_id <> previous.lineage_id OR NEW.version_no <> previous.version_no + 1 THEN
          RAISE EXCEPTION 'A new version must continue lineage % as version %', previous.lineage_id, previous.version_no + 1
            USING CONSTRAINT = 'thermo_values_version_chain';
        END IF;
        IF NEW.species_phase_id <> previous.species_phase_id OR NEW.quantity <> previous.quantity
           OR NEW.transition_kind IS DISTINCT FROM previous.transition_kind THEN
          RAISE EXCEPTION 'A new version keeps the species phase, quantity and transition of the value it supersedes'
            USING CONSTRAINT = 'thermo_values_version_chain';
        END IF;
        IF previous.is_retired AND NEW.is_retired THEN
          RAISE EXCEPTION 'Value lineage % is already retired', previous.lineage_id
            USING CONSTRAINT = 'thermo_values_version_chain';
        END IF;
        RETURN NEW;
      END $$`);
    await q.query(`CREATE TRIGGER thermo_values_version_chain BEFORE INSERT ON thermo_values FOR EACH ROW EXECUTE FUNCTION kx_thermo_values_version_chain()`);
    await q.query(`
      CREATE TRIGGER thermo_values_append_only BEFORE UPDATE OR DELETE ON thermo_values FOR EACH ROW
      EXECUTE FUNCTION kx_refuse_change('a value is never changed in place; insert a new version that supersedes it, or a retirement')`);

    await q.query(`
      CREATE FUNCTION kx_heat_capacity_fits_version_chain() RETURNS trigger LANGUAGE plpgsql AS $$
      DECLARE
        previous heat_capacity_fits%ROWTYPE;
      BEGIN
        IF NEW.supersedes_id IS NULL THEN
          NEW.lineage_id := coalesce(NEW.lineage_id, NEW.id);
          NEW.version_no := coalesce(NEW.version_no, 1);
          RETURN NEW;
        END IF;
        SELECT * INTO previous FROM heat_capacity_fits WHERE id = NEW.supersedes_id;
        IF NOT FOUND THEN
          RAISE EXCEPTION 'The fit % that this version supersedes does not exist', NEW.supersedes_id
            USING CONSTRAINT = 'heat_capacity_fits_version_chain';
        END IF;
        NEW.lineage_id := coalesce(NEW.lineage_id, previous.lineage_id);
        NEW.version_no := coalesce(NEW.version_no, previous.version_no + 1);
        IF NEW.lineage_id <> previous.lineage_id OR NEW.version_no <> previous.version_no + 1 THEN
          RAISE EXCEPTION 'A new version must continue fit lineage % as version %', previous.lineage_id, previous.version_no + 1
            USING CONSTRAINT = 'heat_capacity_fits_version_chain';
        END IF;
        IF NEW.species_phase_id <> previous.species_phase_id THEN
          RAISE EXCEPTION 'A new version of a fit keeps the species phase of the fit it supersedes'
            USING CONSTRAINT = 'heat_capacity_fits_version_chain';
        END IF;
        IF previous.is_retired AND NEW.is_retired THEN
          RAISE EXCEPTION 'Fit lineage % is already retired', previous.lineage_id
            USING CONSTRAINT = 'heat_capacity_fits_version_chain';
        END IF;
        RETURN NEW;
      END $$`);
    await q.query(`CREATE TRIGGER heat_capacity_fits_version_chain BEFORE INSERT ON heat_capacity_fits FOR EACH ROW EXECUTE FUNCTION kx_heat_capacity_fits_version_chain()`);
    await q.query(`
      CREATE TRIGGER heat_capacity_fits_append_only BEFORE UPDATE OR DELETE ON heat_capacity_fits FOR EACH ROW
      EXECUTE FUNCTION kx_refuse_change('a fit is never changed in place; insert a new version that supersedes it, or a retirement')`);

    // Once data hangs off a species or a phase, what it *is* (formula, charge, composition, phase,
    // polymorph) is frozen; names, synonyms, identifiers and notes stay editable.
    await q.query(`
      CREATE FUNCTION kx_species_identity_guard() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF (NEW.formula, NEW.hill_formula, NEW.charge, NEW.composition)
             IS DISTINCT FROM (OLD.formula, OLD.hill_formula, OLD.charge, OLD.composition)
           AND (EXISTS (SELECT 1 FROM thermo_values v JOIN species_phases p ON p.id = v.species_phase_id WHERE p.species_id = OLD.id)
             OR EXISTS (SELECT 1 FROM heat_capacity_fits f JOIN species_phases p ON p.id = f.species_phase_id WHERE p.species_id = OLD.id)) THEN
          RAISE EXCEPTION 'Species % has data; its formula, charge and composition can no longer change', OLD.hill_formula
            USING CONSTRAINT = 'species_identity_frozen',
                  HINT = 'Create a new species instead, and retire the values of the wrong one.';
        END IF;
        RETURN NEW;
      END $$`);
    await q.query(`CREATE TRIGGER species_identity_guard BEFORE UPDATE ON species FOR EACH ROW EXECUTE FUNCTION kx_species_identity_guard()`);

    await q.query(`
      CREATE FUNCTION kx_species_phases_identity_guard() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF (NEW.species_id, NEW.phase, NEW.polymorph) IS DISTINCT FROM (OLD.species_id, OLD.phase, OLD.polymorph)
           AND (EXISTS (SELECT 1 FROM thermo_values WHERE species_phase_id = OLD.id)
             OR EXISTS (SELECT 1 FROM heat_capacity_fits WHERE species_phase_id = OLD.id)) THEN
          RAISE EXCEPTION 'This species phase has data; its species, phase and polymorph can no longer change'
            USING CONSTRAINT = 'species_phases_identity_frozen';
        END IF;
        RETURN NEW;
      END $$`);
    await q.query(`CREATE TRIGGER species_phases_identity_guard BEFORE UPDATE ON species_phases FOR EACH ROW EXECUTE FUNCTION kx_species_phases_identity_guard()`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE heat_capacity_fits`);
    await q.query(`DROP TABLE thermo_values`);
    await q.query(`DROP TABLE sources`);
    await q.query(`DROP TABLE species_phases`);
    await q.query(`DROP TABLE species`);
    await q.query(`DROP FUNCTION kx_species_phases_identity_guard()`);
    await q.query(`DROP FUNCTION kx_species_identity_guard()`);
    await q.query(`DROP FUNCTION kx_heat_capacity_fits_version_chain()`);
    await q.query(`DROP FUNCTION kx_thermo_values_version_chain()`);
  }
}
