import { QUANTITIES } from '../values/value-vocabulary';
import { EXPORT_FORMATS } from '../exports/export-formats';
import { MAX_PAGE_SIZE, SORTS } from '../species/species-filter';
import { MAX_TEMPERATURES } from '../shared/temperatures';
import { enumOf, json, ref, str, type Schema } from './schema-helpers';

/**
 * Query parameters are described as text with patterns where they are numbers: the API reads
 * them itself (with messages naming the parameter), and the validator must not turn them into
 * numbers first.
 */
// allowReserved: lists (T=298.15,500, elements=C,H,O) and formulas (SO4^2-, CuSO4·5H2O) are sent as typed.
const query = (name: string, description: string, schema: Schema = str(), extra: Schema = {}) => ({ name, in: 'query', description, schema, allowReserved: true, ...extra });
const INTEGER = '^[0-9]+$';
const LABEL = '^[0-9]{4}\\.[1-9][0-9]*$';

export const catalogueParameters: Record<string, Schema> = {
  release: query('release', 'Release label (e.g. 2026.2); default: the latest published release. Answers for a release named here are cacheable for a year.', str(undefined, { pattern: LABEL })),
  q: query('q', 'Name or synonym (trigram-ranked), CAS RN, InChIKey, or a formula (matched on its Hill formula).', str(undefined, { maxLength: 200 }), { allowEmptyValue: true }),
  formula: query('formula', 'A formula as people type it (CH3CH2OH, C2H6O, SO4^2-, CuSO4·5H2O), optionally with a phase (H2O(g)); matched on Hill formula and charge.', str(), { allowEmptyValue: true }),
  elements: query('elements', 'Element symbols separated by commas, e.g. C,H,O.', str(), { allowEmptyValue: true }),
  elementsMode: query('elementsMode', '`contains` (default): every element listed, others allowed; `only`: no element outside the list.', enumOf(['contains', 'only'])),
  phase: query('phase', 'Phase code: g, l, cr, am, aq, aq,inf; a polymorph may follow ("cr, graphite").', str(), { allowEmptyValue: true }),
  quantity: query('quantity', 'Only species with a value of this quantity in the release (Cp includes heat-capacity fits).', enumOf(QUANTITIES)),
};

const p = (name: string) => ({ $ref: `#/components/parameters/${name}` });
const searchFilters = ['q', 'formula', 'elements', 'elementsMode', 'phase', 'quantity', 'release'].map(p);
const errors = { default: json(ref('Error'), 'Error: 400 malformed parameter, 401/403 access, 404 unknown release or record, 422 cannot be computed') };
const cached = 'Carries an ETag (answers 304 to If-None-Match). Cache-Control: `public, max-age=31536000, immutable` when a published release is named, a short max-age for the latest release, `no-store` for a release in preparation.';

const idParam = { name: 'id', in: 'path', required: true, description: 'species id', schema: str(undefined, { format: 'uuid' }) };
const labelParam = (name: string, description: string) => ({ name, in: 'path', required: true, description, schema: str(undefined, { pattern: LABEL }) });

export const cataloguePaths: Record<string, Record<string, Schema>> = {
  '/releases': {
    get: {
      tags: ['Releases'],
      summary: 'List releases',
      description: 'Newest first. Releases in preparation are listed for editors and admins only.',
      responses: { 200: json(ref('ReleaseList')), ...errors },
    },
  },
  '/releases/{label}': {
    get: {
      tags: ['Releases'],
      summary: 'One release with its counts and change log',
      description: 'The change log compares the release with the published release before it.',
      parameters: [labelParam('label', 'release label')],
      responses: { 200: json(ref('ReleaseDetail')), ...errors },
    },
  },
  '/releases/{a}/diff/{b}': {
    get: {
      tags: ['Releases'],
      summary: 'Changes between two releases',
      description: '`added` = in b only, `retired` = in a only, `revised` = another version or recommendation in b.',
      parameters: [labelParam('a', 'older release'), labelParam('b', 'newer release')],
      responses: { 200: json(ref('ReleaseDiff')), ...errors },
    },
  },
  '/species': {
    get: {
      tags: ['Species'],
      summary: 'Search species',
      description: `Species holding data in the release that match every filter given. ${cached}`,
      parameters: [
        ...searchFilters,
        query('sort', 'Sort order; default: relevance when q is given, else name.', enumOf(SORTS)),
        query('page', 'Page number from 1 (default 1).', str(undefined, { pattern: INTEGER })),
        query('pageSize', `Items per page, 1–${MAX_PAGE_SIZE} (default 25).`, str(undefined, { pattern: INTEGER })),
      ],
      responses: { 200: json(ref('SpeciesSearchResult')), ...errors },
    },
  },
  '/species/{id}': {
    get: {
      tags: ['Species'],
      summary: 'Everything a release holds about a species',
      description: `Per phase: each quantity's recommended value and the alternatives, with uncertainty, conditions, method, source and version history (as of the release); the heat-capacity fits. ${cached}`,
      parameters: [idParam, p('release')],
      responses: { 200: json(ref('SpeciesDetail')), ...errors },
    },
  },
  '/species/{id}/properties': {
    get: {
      tags: ['Species'],
      summary: 'Property table at temperatures',
      description:
        'Cp°, S°, H° − H°(298.15 K), −(G° − H°(298.15 K))/T from the recommended fit; ΔfH°, ΔfG° and log10 Kf from the recommended ΔfH° and the ' +
        `elements' reference states in the same release (null, with a note, when a reference state lacks data). Out-of-range T is a 422 naming T and the range, unless extrapolate=true. ${cached}`,
      parameters: [
        idParam,
        query('phase', 'Phase code (required when the species holds data in several phases).', str()),
        query('polymorph', 'Polymorph, when the phase has several.', str()),
        query('T', `Temperatures / K, comma-separated (at most ${MAX_TEMPERATURES}); default 298.15.`, str()),
        query('Tmin', 'Grid start / K (with Tmax and Tstep).', str()),
        query('Tmax', 'Grid end / K.', str()),
        query('Tstep', 'Grid step / K.', str()),
        query('units', 'kJ (default): kJ/mol and J/(mol·K); kcal: kcal/mol and cal/(mol·K) (thermochemical calorie, 4.184 J).', enumOf(['kJ', 'kcal'])),
        query('extrapolate', 'true: evaluate outside the valid range and flag the rows.', enumOf(['true', 'false'])),
        p('release'),
      ],
      responses: { 200: json(ref('PropertyTable')), ...errors },
    },
  },
  '/reactions/evaluate': {
    post: {
      tags: ['Reactions'],
      summary: 'Reaction thermochemistry at temperatures',
      description:
        'ΔrH°, ΔrS°, ΔrG°, ΔrCp°, log10 K and K from the recommended values and fits of one release. At 298.15 K only ΔfH° and S° are needed; ' +
        'elsewhere every species needs a heat-capacity fit covering T. A 422 names the species that are missing, ambiguous or out of range ' +
        '(`details.missing`, `details.ambiguous`: species labels; `details.outOfRange`: {species, tMin, tMax, temperatures, reason}; ' +
        '`details.suggestions`: {label: [{id, name, formula, phase}]}; `details.reasons`: {label: why}). An unbalanced equation is a 422 with the reason.',
      requestBody: { required: true, content: { 'application/json': { schema: ref('EvaluateReactionRequest') } } },
      responses: { 200: json(ref('ReactionEvaluation')), ...errors },
    },
  },
  '/reactions/balance': {
    post: {
      tags: ['Reactions'],
      summary: 'Balance an equation',
      description: 'Coefficients by exact rational arithmetic; coefficients written in the equation are kept. A 422 says why no balance or no unique balance exists.',
      requestBody: { required: true, content: { 'application/json': { schema: ref('BalanceRequest') } } },
      responses: { 200: json(ref('BalanceResult')), ...errors },
    },
  },
  '/reactions/derive-formation': {
    post: {
      tags: ['Reactions'],
      summary: 'Derive ΔfH° from a measured reaction enthalpy',
      description: "Hess's law with GUM propagation, from the other species' recommended ΔfH° in the release.",
      requestBody: { required: true, content: { 'application/json': { schema: ref('DeriveFormationRequest') } } },
      responses: { 200: json(ref('DerivedFormation')), ...errors },
    },
  },
  '/reactions/adiabatic-rise': {
    post: {
      tags: ['Reactions'],
      summary: 'Adiabatic temperature rise (screening estimate)',
      description: 'ΔT_ad = −ΔrH·n/(m·c_p). Always returned with a caution: a screening estimate; defer to a qualified process-safety review and to local codes.',
      requestBody: { required: true, content: { 'application/json': { schema: ref('AdiabaticRiseRequest') } } },
      responses: { 200: json(ref('AdiabaticRise')), ...errors },
    },
  },
  '/export': {
    get: {
      tags: ['Export'],
      summary: 'Export what a release holds',
      description:
        'Streamed from a database cursor. Every export states its release and cites its sources: CSV `#` comment lines before the header row; ' +
        'JSON a `kelvindex` header object before `species`; XML attributes of `kelvindexExport` and a `sources` element; NASA-7 `!` comment lines. ' +
        'nasa7 writes each species phase\'s recommended NASA 7-coefficient fit in the 80-column, four-line layout of NASA TM-4513.',
      parameters: [
        query('format', 'csv (default), json, xml or nasa7.', enumOf(EXPORT_FORMATS)),
        ...searchFilters,
        query('recommendedOnly', 'true: only the recommended value of each species phase and quantity.', enumOf(['true', 'false'])),
      ],
      responses: {
        200: {
          description: 'The export, as an attachment',
          content: {
            'text/csv': { schema: str() },
            'application/json': { schema: { type: 'object' } },
            'application/xml': { schema: str() },
            'text/plain': { schema: str('NASA-7 polynomials, TM-4513 fixed columns') },
          },
        },
        304: { description: 'Not modified (If-None-Match)' },
        ...errors,
      },
    },
  },
};
