/**
 * A sentence for every named CHECK and UNIQUE constraint of the schema and for every rule a
 * trigger enforces (triggers raise with `CONSTRAINT = '<name>'`), so that an error the database
 * raises can reach the caller as a 409/422 that says which rule was broken. A spec checks that
 * every constraint in the migrated database has an entry here.
 *
 * `field` names the request field (camelCase, as the API spells it) when one field is to blame.
 */
export interface ConstraintMessage {
  message: string;
  field?: string;
}

export const CONSTRAINT_MESSAGES: Readonly<Record<string, ConstraintMessage>> = {
  // accounts
  users_email_unique: { message: 'A user with this e-mail address already exists.', field: 'email' },
  users_email_format: { message: 'The e-mail address must be lower-case and look like name@domain.tld.', field: 'email' },
  users_display_name_present: { message: 'A user needs a name.', field: 'name' },
  users_roles_known: { message: 'Roles must be reader, steward, reviewer, editor or admin.', field: 'roles' },
  refresh_tokens_hash_unique: { message: 'This refresh token is already stored.' },
  refresh_tokens_hash_format: { message: 'A refresh token is stored as its SHA-256 in 64 lower-case hex digits.' },
  refresh_tokens_expiry_after_issue: { message: 'A refresh token must expire after it is issued.' },
  refresh_tokens_revocation_reason: { message: 'A revocation reason needs a revocation time.' },
  api_keys_prefix_unique: { message: 'An API key with this prefix already exists.' },
  api_keys_prefix_format: { message: 'An API key prefix is 6 to 32 letters, digits or underscores.' },
  api_keys_secret_hash_format: { message: 'An API key secret is stored as its SHA-256 in 64 lower-case hex digits.' },
  api_keys_name_present: { message: 'An API key needs a name of 1 to 100 characters.', field: 'name' },
  api_keys_scope_known: { message: 'An API key scope is read or write.', field: 'scope' },
  api_keys_active_name_unique: { message: 'You already have an active API key with this name.', field: 'name' },
  one_time_tokens_hash_unique: { message: 'This link token is already stored.' },
  one_time_tokens_hash_format: { message: 'A link token is stored as its SHA-256 in 64 lower-case hex digits.' },
  one_time_tokens_purpose_known: { message: 'A link token is for an invitation, a password reset or an e-mail verification.' },
  one_time_tokens_email_lower: { message: 'The e-mail address must be lower-case.', field: 'email' },
  one_time_tokens_user_for_purpose: { message: 'A password reset or verification link belongs to a user.' },
  one_time_tokens_roles_known: { message: 'Roles must be reader, steward, reviewer, editor or admin.', field: 'roles' },
  one_time_tokens_expiry_after_creation: { message: 'A link must expire after it is created.' },

  // species and phases
  species_formula_present: { message: 'A species needs its formula.', field: 'formula' },
  species_hill_formula_format: { message: 'The Hill formula must be element symbols with counts (and an optional charge suffix).', field: 'hillFormula' },
  species_charge_range: { message: 'The charge must be between −20 and +20.', field: 'charge' },
  species_composition_valid: { message: 'The composition maps element symbols to positive counts.', field: 'composition' },
  species_molar_mass_positive: { message: 'The molar mass must be a positive number.', field: 'molarMass' },
  species_name_present: { message: 'A species needs a name.', field: 'name' },
  species_synonyms_no_nulls: { message: 'Synonyms must not contain empty entries.', field: 'synonyms' },
  species_inchi_format: { message: 'An InChI starts with "InChI=1S/" or "InChI=1/".', field: 'inchi' },
  species_inchikey_format: { message: 'An InChIKey has the form XXXXXXXXXXXXXX-XXXXXXXXXX-X (27 upper-case letters and hyphens).', field: 'inchikey' },
  species_cas_rn_valid: { message: 'The CAS Registry Number is malformed or its check digit is wrong.', field: 'casRn' },
  species_inchikey_unique: { message: 'Another species already has this InChIKey.', field: 'inchikey' },
  species_cas_rn_unique: { message: 'Another species already has this CAS Registry Number.', field: 'casRn' },
  species_identity_unique: { message: 'A species with this formula, charge and name already exists.', field: 'name' },
  species_identity_frozen: { message: 'This species has data; its formula, charge and composition can no longer change.' },
  species_phases_phase_known: { message: 'The phase must be g, l, cr, am, aq or aq,inf.', field: 'phase' },
  species_phases_polymorph: { message: 'A polymorph label is only for cr, am or l phases and must not be blank.', field: 'polymorph' },
  species_phases_unique: { message: 'This species already has this phase and polymorph.', field: 'phase' },
  species_phases_identity_frozen: { message: 'This species phase has data; its species, phase and polymorph can no longer change.' },

  // sources and evidence
  sources_short_key_unique: { message: 'Another source already has this short key.', field: 'shortKey' },
  sources_short_key_format: { message: 'A short key is 2 to 64 letters, digits, ".", "_", ":" or "-", starting with a letter or digit.', field: 'shortKey' },
  sources_title_present: { message: 'A source needs a title.', field: 'title' },
  sources_year_range: { message: 'The year must be between 1500 and 2200.', field: 'year' },
  sources_doi_format: { message: 'A DOI has the form 10.NNNN/suffix and is stored in lower case.', field: 'doi' },
  sources_doi_unique: { message: 'A source with this DOI already exists.', field: 'doi' },
  sources_csl_object: { message: 'The CSL-JSON record must be one object.', field: 'csl' },
  evidence_files_object_key_unique: { message: 'An evidence file is already stored under this key.' },
  evidence_files_attached: { message: 'An evidence file belongs to a source or a proposal item.' },
  evidence_files_file_name: { message: 'A file name is 1 to 255 characters without slashes or control characters.', field: 'fileName' },
  evidence_files_media_type: { message: 'The media type must look like type/subtype.', field: 'mediaType' },
  evidence_files_size_nonnegative: { message: 'The file size cannot be negative.', field: 'sizeBytes' },
  evidence_files_sha256_format: { message: 'The SHA-256 must be 64 lower-case hex digits.', field: 'sha256' },

  // values
  thermo_values_supersedes_once: { message: 'This version has already been superseded; revise the latest version of the value.', field: 'supersedesId' },
  thermo_values_lineage_version_unique: { message: 'This version number already exists for the value.' },
  thermo_values_version_positive: { message: 'Version numbers start at 1.' },
  thermo_values_first_version: { message: 'Version 1 supersedes nothing; every later version supersedes its predecessor.' },
  thermo_values_first_version_lineage: { message: 'A first version starts its own lineage.' },
  thermo_values_version_chain: { message: 'A new version must continue the lineage of the value it supersedes, for the same species phase and quantity.' },
  thermo_values_quantity_known: { message: 'The quantity must be dfH, S, Cp, dfG or dtrsH.', field: 'quantity' },
  thermo_values_transition_kind: { message: 'A transition kind is given for ΔtrsH values and only for them.', field: 'transitionKind' },
  thermo_values_transition_kind_known: { message: 'The transition kind must be fus, vap, sub or trs.', field: 'transitionKind' },
  thermo_values_transition_label: { message: 'A transition label is only for ΔtrsH values.', field: 'transitionLabel' },
  thermo_values_value_finite: { message: 'The value must be a finite number.', field: 'value' },
  thermo_values_uncertainty_nonnegative: { message: 'The uncertainty must be zero or positive.', field: 'uncertainty' },
  thermo_values_uncertainty_kind_stated: { message: 'An uncertainty needs its kind (standard or expanded), and a kind needs an uncertainty.', field: 'uncertaintyKind' },
  thermo_values_uncertainty_kind_known: { message: 'The uncertainty kind must be standard or expanded.', field: 'uncertaintyKind' },
  thermo_values_coverage_factor: { message: 'An expanded uncertainty needs its coverage factor k, and only an expanded one has k.', field: 'coverageFactor' },
  thermo_values_coverage_factor_range: { message: 'The coverage factor k must be greater than 0 and at most 10.', field: 'coverageFactor' },
  thermo_values_temperature_positive: { message: 'The temperature must be above 0 K.', field: 'temperature' },
  thermo_values_standard_pressure: { message: 'The standard pressure must be 100000 Pa (1 bar) or 101325 Pa (1 atm).', field: 'pressure' },
  thermo_values_entropy_positive: { message: 'A standard molar entropy S° must be positive.', field: 'value' },
  thermo_values_heat_capacity_positive: { message: 'A heat capacity Cp° must be positive.', field: 'value' },
  thermo_values_transition_endothermic: { message: 'Enthalpies of fusion, vaporisation and sublimation are positive.', field: 'value' },
  thermo_values_method_known: { message: 'The method must be measured, evaluated, computed or estimated.', field: 'method' },
  thermo_values_level_of_theory: { message: 'A computed value needs its level of theory.', field: 'levelOfTheory' },
  thermo_values_entered_present: { message: 'The value and unit as entered are kept for provenance and must not be blank.', field: 'enteredValue' },
  thermo_values_retirement_reason: { message: 'A retirement needs a reason, and only a retirement has one.', field: 'retiredReason' },
  thermo_values_retirement_supersedes: { message: 'A retirement supersedes the version it retires.' },

  // heat-capacity fits
  heat_capacity_fits_supersedes_once: { message: 'This fit version has already been superseded; replace the latest version.', field: 'supersedesId' },
  heat_capacity_fits_lineage_version_unique: { message: 'This version number already exists for the fit.' },
  heat_capacity_fits_version_positive: { message: 'Version numbers start at 1.' },
  heat_capacity_fits_first_version: { message: 'Version 1 supersedes nothing; every later version supersedes its predecessor.' },
  heat_capacity_fits_first_version_lineage: { message: 'A first version starts its own lineage.' },
  heat_capacity_fits_version_chain: { message: 'A new fit version must continue the lineage of the fit it replaces, for the same species phase.' },
  heat_capacity_fits_form_known: { message: 'The form must be constant, shomate, nasa7, nasa9 or tabulated.', field: 'form' },
  heat_capacity_fits_temperature_range: { message: 'The temperature range must satisfy 0 K < Tmin < Tmax.', field: 'tMin' },
  heat_capacity_fits_ranges_array: { message: 'The ranges must be a non-empty list.', field: 'ranges' },
  heat_capacity_fits_ranges_valid: { message: 'The ranges must cover Tmin to Tmax without gaps, each with the right number of coefficients (or increasing [T, Cp] points).', field: 'ranges' },
  heat_capacity_fits_standard_pressure: { message: 'The standard pressure must be 100000 Pa (1 bar) or 101325 Pa (1 atm).', field: 'pressure' },
  heat_capacity_fits_method_known: { message: 'The method must be measured, evaluated, computed or estimated.', field: 'method' },
  heat_capacity_fits_level_of_theory: { message: 'A computed fit needs its level of theory.', field: 'levelOfTheory' },
  heat_capacity_fits_retirement_reason: { message: 'A retirement needs a reason, and only a retirement has one.', field: 'retiredReason' },
  heat_capacity_fits_retirement_supersedes: { message: 'A retirement supersedes the version it retires.' },

  // proposals
  proposals_title_present: { message: 'A proposal needs a title of at most 300 characters.', field: 'title' },
  proposals_state_known: { message: 'Unknown proposal state.', field: 'state' },
  proposals_submitted_at: { message: 'A proposal past the draft stage has a submission time.' },
  proposals_released_in_release: { message: 'A released proposal names its release.' },
  proposal_items_position_unique: { message: 'Two items of the proposal have the same position.', field: 'position' },
  proposal_items_id_proposal_unique: { message: 'This item already exists.' },
  proposal_items_position_positive: { message: 'Item positions start at 1.', field: 'position' },
  proposal_items_kind_known: { message: 'Unknown kind of proposal item.', field: 'kind' },
  proposal_items_payload_object: { message: 'An item payload must be an object.', field: 'payload' },
  proposal_items_source_required: { message: 'A value or fit item needs a source: no value without a source.', field: 'sourceId' },
  proposal_items_value_target: { message: 'Revising or retiring a value needs the value it applies to.', field: 'targetValueId' },
  proposal_items_fit_target: { message: 'Replacing a fit needs the fit it replaces.', field: 'targetFitId' },
  proposal_items_checks_array: { message: 'Stored check results must be a list.' },
  proposal_reviews_decision_known: { message: 'A review decision is approve, request_changes or reject.', field: 'decision' },
  proposal_reviews_justification_present: { message: 'A justification must not be blank.', field: 'justification' },
  proposal_reviews_four_eyes: { message: 'Nobody reviews their own proposal.' },
  proposal_comments_body_present: { message: 'A comment needs 1 to 20000 characters.', field: 'body' },

  // releases
  releases_label_unique: { message: 'A release with this label already exists.', field: 'label' },
  releases_label_format: { message: 'A release label is the year and a number, e.g. 2027.1.', field: 'label' },
  releases_status_known: { message: 'A release is preparing or published.', field: 'status' },
  releases_published_at: { message: 'A published release has a publication time, and only a published one.' },
  releases_change_log_object: { message: 'The change log must be an object.' },
  releases_published_immutable: { message: 'A published release cannot be changed or deleted; prepare a new release.' },
  releases_recommendation_complete: { message: 'Every species phase and quantity in the release needs exactly one recommended value before it is published.' },
  release_members_kind_known: { message: 'A release member is a value or a fit.' },
  release_members_one_target: { message: 'A release member is exactly one value or one fit.' },
  release_members_lineage_unique: { message: 'The release already holds a version of this value or fit.' },
  release_members_one_recommended: { message: 'Only one recommended value per species phase and quantity in a release.' },
  release_members_published_immutable: { message: 'The membership of a published release cannot change.' },
  release_members_not_retired: { message: 'A retired value is left out of a release, not added to it.' },
  release_members_value_id_fkey: { message: 'The value to put in the release does not exist.', field: 'valueId' },
  release_members_fit_id_fkey: { message: 'The heat-capacity fit to put in the release does not exist.', field: 'fitId' },

  // engineers' records, audit, imports
  watches_user_species_unique: { message: 'You already watch this species.', field: 'speciesId' },
  saved_reactions_user_name_unique: { message: 'You already have a saved reaction with this name.', field: 'name' },
  saved_reactions_name_present: { message: 'A saved reaction needs a name of at most 200 characters.', field: 'name' },
  saved_reactions_equation_present: { message: 'A saved reaction needs its equation.', field: 'equation' },
  saved_reactions_temperatures: { message: 'Give 1 to 500 temperatures, each above 0 K.', field: 'temperatures' },
  saved_reaction_terms_unique: { message: 'A species phase appears once per reaction.' },
  saved_reaction_terms_coefficient: { message: 'A stoichiometric number must be a finite non-zero number.' },
  audit_entries_action_format: { message: 'An audit action is a dotted lower-case name such as proposal.submit.' },
  audit_entries_details_object: { message: 'Audit details must be an object.' },
  audit_entries_entity: { message: 'An audit entry names both the type and the id of its record, or neither.' },
  import_jobs_format_known: { message: 'Imports read CSV or XML.', field: 'format' },
  import_jobs_status_known: { message: 'Unknown import status.' },
  import_jobs_counts: { message: 'Import progress counts must be consistent.' },
  import_jobs_errors_array: { message: 'Import problems must be a list.' },
  import_jobs_finished: { message: 'A finished import has a finishing time.' },
  import_jobs_dry_run_writes_nothing: { message: 'A dry run creates no proposal.' },

  // editorial workflow additions (migrations/1764800600000-workflow-additions.ts)
  users_preferences_object: { message: 'Preferences must be an object.', field: 'preferences' },
  sources_merged_into_other: { message: 'A source cannot be merged into itself.', field: 'intoId' },
};

/** The sentence for a constraint name from a PostgreSQL error, if it is one of ours. */
export function constraintMessage(constraint: string | undefined): ConstraintMessage | undefined {
  return constraint ? CONSTRAINT_MESSAGES[constraint] : undefined;
}
