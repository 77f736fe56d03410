/** One exported row: a value or a fit version, with its species; column names as in the CSV. */
export interface ExportRow {
  record_kind: 'value' | 'fit';
  species_id: string;
  formula: string;
  hill_formula: string;
  name: string;
  charge: number;
  molar_mass_g_per_mol: number;
  cas_rn: string | null;
  inchikey: string | null;
  phase: string;
  polymorph: string | null;
  quantity: string;
  symbol: string;
  transition: string | null;
  recommended: boolean;
  value: number | null;
  uncertainty: number | null;
  uncertainty_kind: string | null;
  coverage_factor: number | null;
  unit: string;
  temperature_K: number | null;
  pressure_Pa: number;
  method: string;
  method_detail: string | null;
  fit_form: string | null;
  t_min_K: number | null;
  t_max_K: number | null;
  fit_ranges: unknown[] | null;
  source_key: string;
  doi: string | null;
  version_id: string;
  lineage_id: string;
  version_no: number;
}

/** The CSV columns, in order (documented in README). */
export const EXPORT_COLUMNS: (keyof ExportRow)[] = [
  'record_kind', 'species_id', 'formula', 'hill_formula', 'name', 'charge', 'molar_mass_g_per_mol', 'cas_rn', 'inchikey',
  'phase', 'polymorph', 'quantity', 'symbol', 'transition', 'recommended', 'value', 'uncertainty', 'uncertainty_kind',
  'coverage_factor', 'unit', 'temperature_K', 'pressure_Pa', 'method', 'method_detail', 'fit_form', 't_min_K', 't_max_K',
  'fit_ranges', 'source_key', 'doi', 'version_id', 'lineage_id', 'version_no',
];
